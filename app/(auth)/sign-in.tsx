import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { signInRequest } from '@/shared/schemas';
import { ApiRequestError } from '@/src/api/client';
import { AuthFrame } from '@/src/components/nav/auth-frame';
import { AppText, Button, FormMessage, TextField, useFormSubmit } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';
import { colors, fonts, spacing } from '@/src/theme';

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
        <View style={styles.footer}>
          <AppText muted>Running a workshop and new here?</AppText>
          <Link href="/sign-up" style={styles.link} testID="to-sign-up">
            Create a workshop
          </Link>
        </View>
      }
    >
      <FormMessage message={form.message} />
      <TextField
        label="E-mail"
        value={email}
        onChangeText={setEmail}
        error={form.errors.email}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        inputMode="email"
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

const styles = StyleSheet.create({
  footer: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, alignItems: 'center' },
  link: {
    color: colors.accent,
    textDecorationLine: 'underline',
    fontFamily: fonts.bold,
    fontSize: 16,
    paddingVertical: spacing.md,
  },
});
