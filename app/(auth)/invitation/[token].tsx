import { useQuery } from '@tanstack/react-query';
import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { acceptInvitationRequest } from '@/shared/schemas';
import { ROLE_LABELS } from '@/shared/roles';
import { authQueries } from '@/src/api/auth';
import { AuthFrame } from '@/src/components/nav/auth-frame';
import {
  AppText,
  Button,
  ErrorView,
  FormMessage,
  LoadingView,
  TextField,
  useFormSubmit,
} from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';
import { formatDay } from '@/src/format/dates';

export default function AcceptInvitation() {
  const { token } = useLocalSearchParams<{ token: string }>();
  const session = useSession();
  const preview = useQuery(authQueries.invitation(token));
  const [name, setName] = useState('');
  const [password, setPassword] = useState('');
  const form = useFormSubmit(acceptInvitationRequest, async (body) => {
    await session.acceptInvitation(token, body);
    router.replace('/vehicles');
  });
  const submit = () => form.submit({ name, password });

  if (preview.isPending) return <LoadingView label="Reading the invitation…" />;
  if (preview.isError)
    return (
      <AuthFrame title="Invitation">
        <ErrorView
          error={preview.error}
          title="This invitation cannot be used"
          onRetry={() => preview.refetch()}
        />
        <AppText muted>
          Invitations expire, and each can be accepted once. Ask the workshop owner for a new one.
        </AppText>
      </AuthFrame>
    );

  const inv = preview.data;
  const expires = formatDay(inv.expiresAt);
  return (
    <AuthFrame
      title={`Join ${inv.workshopName}`}
      intro={`${inv.invitedBy} invited ${inv.email} as ${ROLE_LABELS[inv.role].toLowerCase()}. The invitation is valid until ${expires}.`}
    >
      <FormMessage message={form.message} />
      <TextField
        label="Your name"
        value={name}
        onChangeText={setName}
        error={form.errors.name}
        autoComplete="name"
        testID="invite-name"
      />
      <TextField
        label="Choose a password"
        hint="8 to 128 characters."
        value={password}
        onChangeText={setPassword}
        error={form.errors.password}
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
        testID="invite-password"
      />
      <Button
        label="Accept and sign in"
        onPress={submit}
        loading={form.busy}
        testID="invite-accept"
      />
    </AuthFrame>
  );
}
