import type { ReactNode } from 'react';
import { Link, type Href } from 'expo-router';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { AppText } from '@/src/components/ui';
import { colors, fonts, radius, spacing } from '@/src/theme';

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

/** The line under the card that switches between signing in and creating a workshop. */
export function AuthSwitch({
  prompt,
  href,
  label,
  testID,
}: {
  prompt: string;
  href: Href;
  label: string;
  testID?: string;
}) {
  return (
    <View style={styles.footer}>
      <AppText muted>{prompt}</AppText>
      <Link href={href} style={styles.link} testID={testID}>
        {label}
      </Link>
    </View>
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
