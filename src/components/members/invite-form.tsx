import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Role } from '@/shared/roles';
import { createInvitationRequest } from '@/shared/schemas';
import { useCreateInvitation } from '@/src/api/invitations';
import {
  AppText,
  Button,
  Card,
  EmailField,
  FormMessage,
  Select,
  useFormSubmit,
  useToast,
} from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { ROLE_OPTIONS } from './role-options';

/** Owner only: send an invitation e-mail; the person sets their own name and password. */
export function InviteForm({ workshopId }: { workshopId: string }) {
  const toast = useToast();
  const create = useCreateInvitation(workshopId);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('inspector');
  const form = useFormSubmit(createInvitationRequest, async (body) => {
    await create.mutateAsync(body);
    toast.show(`Invitation sent to ${body.email}.`, { kind: 'success' });
    setEmail('');
  });

  return (
    <Card testID="invite-form">
      <AppText variant="title" accessibilityRole="header">
        Invite someone
      </AppText>
      <View style={styles.fields}>
        <FormMessage message={form.message} />
        <EmailField
          value={email}
          onChangeText={setEmail}
          error={form.errors.email}
          testID="invite-email"
        />
        <Select
          label="Role"
          options={ROLE_OPTIONS}
          value={role}
          onChange={setRole}
          error={form.errors.role}
          testID="invite-role"
        />
        <View style={styles.actions}>
          <Button
            label="Send invitation"
            onPress={() => form.submit({ email: email.trim(), role })}
            loading={form.busy}
            testID="invite-send"
          />
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
  actions: { flexDirection: 'row', justifyContent: 'flex-end' },
});
