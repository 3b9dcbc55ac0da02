import { useState } from 'react';
import { signUpRequest } from '@/shared/schemas';
import { AuthFrame, AuthSwitch } from '@/src/components/nav/auth-frame';
import { Button, EmailField, FormMessage, TextField, useFormSubmit } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';

export default function SignUp() {
  const session = useSession();
  const [workshopName, setWorkshopName] = useState('');
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const form = useFormSubmit(signUpRequest, session.signUp);
  const submit = () => form.submit({ workshopName, name, email: email.trim(), password });

  return (
    <AuthFrame
      title="Create a workshop"
      intro="You become its owner and can invite inspectors, applicators and clients afterwards."
      footer={<AuthSwitch prompt="Already have an account?" href="/sign-in" label="Sign in" />}
    >
      <FormMessage message={form.message} />
      <TextField
        label="Workshop name"
        value={workshopName}
        onChangeText={setWorkshopName}
        error={form.errors.workshopName}
        autoComplete="organization"
        testID="sign-up-workshop"
      />
      <TextField
        label="Your name"
        value={name}
        onChangeText={setName}
        error={form.errors.name}
        autoComplete="name"
        testID="sign-up-name"
      />
      <EmailField
        value={email}
        onChangeText={setEmail}
        error={form.errors.email}
        testID="sign-up-email"
      />
      <TextField
        label="Password"
        hint="8 to 128 characters. A short sentence is easy to remember."
        value={password}
        onChangeText={setPassword}
        error={form.errors.password}
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
        testID="sign-up-password"
      />
      <Button
        label="Create workshop"
        onPress={submit}
        loading={form.busy}
        testID="sign-up-submit"
      />
    </AuthFrame>
  );
}
