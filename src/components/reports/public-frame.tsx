import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { AppText } from '@/src/components/ui';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { colors, spacing } from '@/src/theme';

/** Pages anyone may open without an account: the product's name and the content, no app chrome. */
export function PublicFrame({ children, testID }: { children: ReactNode; testID?: string }) {
  const insets = useSafeAreaInsets();
  const { wide } = useBreakpoint();
  return (
    <ScrollView
      style={styles.page}
      contentContainerStyle={[
        styles.content,
        {
          paddingTop: insets.top + (wide ? spacing.xxl : spacing.lg),
          paddingBottom: insets.bottom + spacing.xxl,
        },
      ]}
      keyboardShouldPersistTaps="handled"
      testID={testID}
    >
      <View style={[styles.column, { maxWidth: wide ? 760 : 560 }]}>
        <View style={styles.brand}>
          <View style={styles.mark} />
          <AppText variant="label" style={styles.brandName}>
            Soundframe
          </AppText>
        </View>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, alignItems: 'center', paddingHorizontal: spacing.lg },
  column: { width: '100%', gap: spacing.lg },
  brand: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  // The same short timber member in section as on the sign-in page.
  mark: {
    width: 10,
    height: 20,
    borderRadius: 2,
    backgroundColor: colors.timber,
    borderWidth: 2,
    borderColor: colors.timberDark,
  },
  brandName: { color: colors.timberDark },
});
