import { StyleSheet, View } from 'react-native';
import { formatLength } from '@/shared/wood';
import type { SpliceGeometry } from '@/shared/wood/types';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import type { Units } from './labels';

/** Scarf length at the workshop's slope, and how far apart splices must stay. */
export function SpliceCard({ splice, units }: { splice: SpliceGeometry; units: Units }) {
  return (
    <View style={styles.card} testID="splice-card">
      <AppText variant="label">Scarf joint</AppText>
      <AppText testID="splice-length">
        Scarf length {formatLength(splice.scarfLengthMm, units)} at a 1:{splice.slope} slope (the
        member&apos;s depth times {splice.slope}).
      </AppText>
      <AppText testID="splice-spacing">
        Keep two splices, or a splice and a reinforcing plate, at least{' '}
        {formatLength(splice.minSpacingMm, units)} apart: three times the longer splice.
      </AppText>
      <AppText variant="caption" muted>
        Both from aircraft wood-structure practice (FAA AC 43.13-1B, §1-39 and §1-40), the strictest
        published guide; used here as a conservative default, not a rule for vehicles.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
});
