import { usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { useOutboxAvailable } from '@/src/api/outbox';
import { ToastProvider } from '@/src/components/ui';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useRole } from '@/src/hooks/use-session';
import { colors } from '@/src/theme';
import { BottomBar } from './bottom-bar';
import { activeNavKey, navItemsFor } from './nav-items';
import { SideNav } from './side-nav';

/** Signed-in frame: side navigation from the wide breakpoint, a bottom bar below it. */
export function AppShell({ children }: { children: ReactNode }) {
  const { wide } = useBreakpoint();
  const role = useRole();
  const outbox = useOutboxAvailable();
  const pathname = usePathname();
  const items = navItemsFor(role, outbox);
  const active = activeNavKey(pathname);
  return (
    <View style={[styles.frame, wide && styles.row]}>
      {wide ? <SideNav items={items} active={active} /> : null}
      {/* Toasts sit over the content column, clear of the navigation. */}
      <View style={styles.content}>
        <ToastProvider>{children}</ToastProvider>
      </View>
      {wide ? null : <BottomBar items={items} active={active} />}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, backgroundColor: colors.paper },
  row: { flexDirection: 'row' },
  content: { flex: 1, minWidth: 0 },
});
