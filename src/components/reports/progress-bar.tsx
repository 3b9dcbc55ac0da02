import { StyleSheet, View } from 'react-native';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

/** Progress of a report being prepared: a bar, the percent in words and what is being done. */
export function ProgressBar({
  progress,
  stage,
  testID,
}: {
  progress: number;
  stage: string;
  testID?: string;
}) {
  const value = Math.max(0, Math.min(100, Math.round(progress)));
  return (
    <View style={styles.wrap} testID={testID}>
      <View
        style={styles.track}
        accessibilityRole="progressbar"
        accessibilityLabel={stage || 'Preparing the report'}
        accessibilityValue={{ min: 0, max: 100, now: value }}
      >
        <View style={[styles.fill, { width: `${value}%` }]} />
      </View>
      <AppText variant="caption" testID={testID ? `${testID}-stage` : undefined}>
        {value} % · {stage || 'Waiting to start'}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  track: {
    height: 12,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
    overflow: 'hidden',
  },
  fill: { height: '100%', backgroundColor: colors.accent },
});
