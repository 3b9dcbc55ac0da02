import { Redirect, Stack, useSegments } from 'expo-router';
import { LoadingView } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';
import { colors } from '@/src/theme';

/** Signed-out group. A signed-in person is sent to the app, except to accept an invitation. */
export default function AuthLayout() {
  const { status } = useSession();
  const segments = useSegments() as string[];
  if (status === 'loading') return <LoadingView label="Opening Soundframe…" />;
  if (status === 'signed-in' && !segments.includes('invitation'))
    return <Redirect href="/vehicles" />;
  return (
    <Stack
      screenOptions={{ headerShown: false, contentStyle: { backgroundColor: colors.paper } }}
    />
  );
}
