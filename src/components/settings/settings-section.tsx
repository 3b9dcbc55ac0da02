import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { AppText } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';

/** One titled part of the owner's settings form. */
export function Section({
  title,
  subtitle,
  children,
  testID,
}: {
  title: string;
  subtitle?: string;
  children: ReactNode;
  testID?: string;
}) {
  return (
    <View style={styles.section} testID={testID}>
      <AppText variant="title" accessibilityRole="header">
        {title}
      </AppText>
      {subtitle ? <AppText muted>{subtitle}</AppText> : null}
      {children}
    </View>
  );
}

/** A field in a wrapping grid of fields. */
export function Cell({ children }: { children: ReactNode }) {
  return <View style={styles.cell}>{children}</View>;
}

const styles = StyleSheet.create({
  section: {
    gap: spacing.md,
    paddingTop: spacing.lg,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  cell: { flexGrow: 1, flexBasis: 200, minWidth: 0 },
});
