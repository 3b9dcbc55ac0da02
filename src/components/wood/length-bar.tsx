import { StyleSheet, View } from 'react-native';
import { formatLength, percent } from '@/shared/wood';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import type { Units } from './labels';

type Props = {
  affectedLengthMm: number;
  memberLengthMm: number;
  /** The workshop's splice limit as a share of the member length (0–1), marked on the bar. */
  spliceLimitRatio: number;
  units: Units;
};

/**
 * The damaged length against the whole member, as a bar: the affected part is striped (not
 * colour alone) and the workshop's splice limit is a labelled tick.
 */
export function LengthBar({ affectedLengthMm, memberLengthMm, spliceLimitRatio, units }: Props) {
  const ratio = memberLengthMm > 0 ? Math.min(1, affectedLengthMm / memberLengthMm) : 0;
  const limit = Math.min(1, Math.max(0, spliceLimitRatio));
  return (
    <View style={styles.wrap} testID="length-bar">
      <AppText testID="length-bar-text">
        Affected {formatLength(affectedLengthMm, units)} of {formatLength(memberLengthMm, units)} (
        {percent(ratio)} of the member)
      </AppText>
      <View style={styles.trackWrap}>
        <View style={styles.track} accessibilityElementsHidden importantForAccessibility="no">
          <View style={[styles.affected, { width: `${ratio * 100}%` }]}>
            {Array.from({ length: 24 }, (_, i) => (
              <View key={i} style={styles.stripe} />
            ))}
          </View>
        </View>
        <View style={[styles.tick, { left: `${limit * 100}%` }]} />
      </View>
      <AppText variant="caption" muted>
        Tick: your splice limit, {percent(limit)} of the member length.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  trackWrap: { height: 26, justifyContent: 'center' },
  track: {
    height: 18,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.ink,
    backgroundColor: colors.timber,
    overflow: 'hidden',
  },
  affected: {
    height: '100%',
    flexDirection: 'row',
    gap: 5,
    overflow: 'hidden',
    backgroundColor: colors.timberDark,
  },
  stripe: { width: 3, height: '100%', backgroundColor: colors.paper, opacity: 0.7 },
  tick: {
    position: 'absolute',
    top: 0,
    bottom: 0,
    width: 3,
    marginLeft: -1.5,
    backgroundColor: colors.ink,
  },
});
