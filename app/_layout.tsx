import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { useEffect, useState } from 'react';
import { createQueryClient } from '@/src/api/query-client';
import { installFocusStyle } from '@/src/components/ui';
import { SessionProvider } from '@/src/hooks/use-session';
import { fonts } from '@/src/theme';

/** Fonts, the query client and the session; who may see what is decided by the group layouts. */
export default function RootLayout() {
  const [queryClient] = useState(createQueryClient);
  const [fontsLoaded, fontError] = useFonts({
    [fonts.regular]: require('../assets/fonts/AtkinsonHyperlegible_400Regular.ttf'),
    [fonts.bold]: require('../assets/fonts/AtkinsonHyperlegible_700Bold.ttf'),
  });
  useEffect(installFocusStyle, []);

  // A font that fails to load falls back to the system face rather than blocking the app.
  if (!fontsLoaded && !fontError) return null;
  return (
    <QueryClientProvider client={queryClient}>
      <SessionProvider>
        <Slot />
      </SessionProvider>
    </QueryClientProvider>
  );
}
