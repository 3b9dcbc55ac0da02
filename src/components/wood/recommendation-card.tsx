import { StyleSheet, View } from 'react-native';
import type { Verdict } from '@/shared/wood/types';
import { AppText, Badge } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { CLASS_LABELS, OPTION_LABELS } from './labels';

/** The computed recommendation: the option, its class and every reason that led to it. */
export function RecommendationCard({ verdict }: { verdict: Verdict }) {
  const option = OPTION_LABELS[verdict.option];
  const cls = CLASS_LABELS[verdict.decisionClass];
  return (
    <View style={styles.card} testID="recommendation">
      <AppText variant="caption" muted>
        Recommended
      </AppText>
      <AppText variant="title" testID="recommendation-option">
        {option.label}
      </AppText>
      <AppText variant="caption" muted>
        {option.description}
      </AppText>
      <Badge label={cls.label} tone={cls.tone} testID="recommendation-class" />
      <View style={styles.reasons} accessibilityRole="list" testID="recommendation-reasons">
        {verdict.reasons.map((r) => (
          <View key={r} style={styles.reason} accessibilityRole="text">
            <AppText>•</AppText>
            <AppText style={styles.reasonText}>{r}</AppText>
          </View>
        ))}
      </View>
      <AppText variant="caption" muted>
        Worked out from your measurements with the workshop&apos;s thresholds (common practice
        defaults unless the owner changed them). Soundframe works it out again when you save.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: spacing.sm,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 2,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
  },
  reasons: { gap: spacing.xs },
  reason: { flexDirection: 'row', gap: spacing.sm },
  reasonText: { flex: 1 },
});
