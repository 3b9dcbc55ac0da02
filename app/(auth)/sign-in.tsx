import { useState } from 'react';
import { signInRequest } from '@/shared/schemas';
import { ApiRequestError } from '@/src/api/client';
import { AuthFrame, AuthSwitch } from '@/src/components/nav/auth-frame';
import { Button, EmailField, FormMessage, TextField, useFormSubmit } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';

export default function SignIn() {
  const session = useSession();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  // The group layout moves a signed-in person on to the vehicles.
  const form = useFormSubmit(signInRequest, session.signIn, (e) =>
    // Here 401 means the e-mail and password do not match; the server says so in plain words.
    e instanceof ApiRequestError && e.status === 401 ? e.message : null,
  );
  const submit = () => form.submit({ email: email.trim(), password });

  return (
    <AuthFrame
      title="Sign in"
      footer={
        <AuthSwitch
          prompt="Running a workshop and new here?"
          href="/sign-up"
          label="Create a workshop"
          testID="to-sign-up"
        />
      }
    >
      <FormMessage message={form.message} />
      <EmailField
        value={email}
        onChangeText={setEmail}
        error={form.errors.email}
        testID="sign-in-email"
      />
      <TextField
        label="Password"
        value={password}
        onChangeText={setPassword}
        error={form.errors.password}
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={submit}
        testID="sign-in-password"
      />
      <Button label="Sign in" onPress={submit} loading={form.busy} testID="sign-in-submit" />
    </AuthFrame>
  );
}
