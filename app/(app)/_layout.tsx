import { Redirect, Stack } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { AppShell } from '@/src/components/nav/app-shell';
import { AppText, Button, ErrorView, LoadingView } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';
import { colors, spacing } from '@/src/theme';

/** Signed-in group: waits for the session, sends the signed-out to sign-in, else the shell. */
export default function AppLayout() {
  const session = useSession();
  if (session.status === 'loading') return <LoadingView label="Opening Soundframe…" />;
  if (session.status === 'signed-out') {
    // A server that cannot be reached is not the same as being signed out.
    if (session.loadError)
      return (
        <View style={styles.page}>
          <ErrorView
            error={session.loadError}
            onRetry={session.refresh}
            title="Soundframe is not reachable"
          />
        </View>
      );
    return <Redirect href="/sign-in" />;
  }
  if (!session.active)
    return (
      <View style={styles.page}>
        <AppText variant="title">You are not a member of any workshop</AppText>
        <AppText muted>
          Ask a workshop owner for an invitation, then open the link in its e-mail.
        </AppText>
        <Button label="Sign out" variant="secondary" onPress={session.signOut} />
      </View>
    );
  return (
    <AppShell>
      <Stack
        screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.paper } }}
      />
    </AppShell>
  );
}

const styles = StyleSheet.create({
  page: {
    flex: 1,
    justifyContent: 'center',
    gap: spacing.md,
    padding: spacing.xl,
    backgroundColor: colors.paper,
  },
});
