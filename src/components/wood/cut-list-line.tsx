import { StyleSheet, View } from 'react-native';
import { formatLength } from '@/shared/wood';
import type { CutListLine as Line } from '@/shared/wood/types';
import { AppText } from '@/src/components/ui';
import { speciesLabel } from '@/src/components/findings/labels';
import { colors, spacing } from '@/src/theme';
import { money, type Units } from './labels';

const bf = (n: number) => (Math.round(n * 100) / 100).toFixed(2);

/** One line of the timber order: species, rough thickness in quarters, board feet, cost. */
export function CutListLine({
  line,
  wastePercent,
  currency,
  units,
  testID,
}: {
  line: Line;
  wastePercent: number;
  currency: string;
  units: Units;
  testID?: string;
}) {
  return (
    <View style={styles.row} testID={testID}>
      <View style={styles.main}>
        <AppText variant="label">
          {speciesLabel(line.species)}, {line.roughQuarters}/4 rough
        </AppText>
        <AppText variant="caption">
          Finished {formatLength(line.finishedThicknessMm, units)} ×{' '}
          {formatLength(line.finishedWidthMm, units)} × {formatLength(line.finishedLengthMm, units)}
        </AppText>
        <AppText variant="caption">
          {bf(line.boardFeetWithWaste)} board feet with {wastePercent} % waste ({bf(line.boardFeet)}{' '}
          net)
        </AppText>
      </View>
      <AppText variant="label" style={styles.cost}>
        {money(line.cost, currency)}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.md,
    paddingVertical: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  main: { flex: 1, gap: 2 },
  cost: { minWidth: 72, textAlign: 'right' },
});
