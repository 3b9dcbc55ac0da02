import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

/** The signed-out frame: the product's name, one card with the form, and a footer line. */
export function AuthFrame({
  title,
  intro,
  children,
  footer,
}: {
  title: string;
  intro?: string;
  children: ReactNode;
  footer?: ReactNode;
}) {
  const insets = useSafeAreaInsets();
  return (
    <ScrollView
      style={styles.page}
      contentContainerStyle={[
        styles.content,
        { paddingTop: insets.top + spacing.xxl, paddingBottom: insets.bottom + spacing.xxl },
      ]}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column}>
        <View style={styles.brand}>
          <View style={styles.mark} />
          <AppText variant="title" style={styles.brandName}>
            Soundframe
          </AppText>
        </View>
        <AppText variant="caption" muted>
          Surveys of timber-framed vehicle bodies, member by member.
        </AppText>
        <View style={styles.card}>
          <AppText variant="heading" accessibilityRole="header">
            {title}
          </AppText>
          {intro ? <AppText muted>{intro}</AppText> : null}
          {children}
        </View>
        {footer}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, alignItems: 'center', paddingHorizontal: spacing.lg },
  column: { width: '100%', maxWidth: 440, gap: spacing.md },
  brand: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  // A short timber member in section: the product's mark.
  mark: {
    width: 14,
    height: 28,
    borderRadius: 3,
    backgroundColor: colors.timber,
    borderWidth: 2,
    borderColor: colors.timberDark,
  },
  brandName: { color: colors.timberDark },
  card: {
    gap: spacing.lg,
    padding: spacing.xl,
    borderRadius: radius.lg,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
  },
});
