import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { colors, spacing } from '@/src/theme';
import { AppText } from './app-text';

type Props = {
  title: string;
  subtitle?: string;
  /** Buttons beside the title (wrap under it on a phone). */
  actions?: ReactNode;
  children: ReactNode;
  /** Pages that manage their own scrolling (split panes, long lists) pass false. */
  scroll?: boolean;
  /** Wider pages (diagram + sheet) lift the reading-width cap. */
  maxWidth?: number;
  testID?: string;
};

/** A page: heading, optional actions, content with safe padding, capped to a readable width. */
export function Screen({
  title,
  subtitle,
  actions,
  children,
  scroll = true,
  maxWidth = 880,
  testID,
}: Props) {
  const insets = useSafeAreaInsets();
  const { wide } = useBreakpoint();
  const pad = wide ? spacing.xxl : spacing.lg;
  const inner = (
    <View style={[styles.inner, { maxWidth, paddingHorizontal: pad }]}>
      <View style={styles.header}>
        <View style={styles.titles}>
          <AppText variant="heading" accessibilityRole="header">
            {title}
          </AppText>
          {subtitle ? <AppText muted>{subtitle}</AppText> : null}
        </View>
        {actions ? <View style={styles.actions}>{actions}</View> : null}
      </View>
      {children}
    </View>
  );
  if (!scroll)
    return (
      <View style={[styles.page, { paddingTop: insets.top + pad }]} testID={testID}>
        {inner}
      </View>
    );
  return (
    <ScrollView
      style={styles.page}
      contentContainerStyle={{
        paddingTop: insets.top + pad,
        paddingBottom: insets.bottom + spacing.xxl * 2,
      }}
      keyboardShouldPersistTaps="handled"
      testID={testID}
    >
      {inner}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper },
  inner: { width: '100%', alignSelf: 'center', gap: spacing.lg, flexGrow: 1 },
  header: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  titles: { flexShrink: 1, minWidth: 200, gap: spacing.xs },
  // Shrinks to the page so its buttons wrap on a phone instead of running off the edge.
  actions: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: spacing.sm,
    flexShrink: 1,
    maxWidth: '100%',
  },
});
