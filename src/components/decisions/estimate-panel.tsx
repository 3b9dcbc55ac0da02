import { StyleSheet, View } from 'react-native';
import type { RepairEstimate, VerdictOption } from '@/shared/wood/types';
import { AppText, Card } from '@/src/components/ui';
import { CutListLine } from '@/src/components/wood/cut-list-line';
import { hours, money, OPTION_LABELS, type Units } from '@/src/components/wood/labels';
import { SpliceCard } from '@/src/components/wood/splice-card';
import { colors, fonts, spacing } from '@/src/theme';

type Props = {
  option: VerdictOption;
  estimate: RepairEstimate;
  wastePercent: number;
  labourRatePerHour: number;
  currency: string;
  units: Units;
};

/** Hours, timber and cost of the chosen option at the workshop's rates and prices. */
export function EstimatePanel({
  option,
  estimate,
  wastePercent,
  labourRatePerHour,
  currency,
  units,
}: Props) {
  return (
    <Card testID="decision-estimate">
      <AppText variant="label">Estimate: {OPTION_LABELS[option].label.toLowerCase()}</AppText>
      {estimate.splice ? <SpliceCard splice={estimate.splice} units={units} /> : null}
      {estimate.cutList.length ? (
        <View testID="cut-list">
          <AppText variant="caption" muted>
            Timber to order
          </AppText>
          {estimate.cutList.map((line, i) => (
            <CutListLine
              key={i}
              line={line}
              wastePercent={wastePercent}
              currency={currency}
              units={units}
              testID={`cut-list-line-${i}`}
            />
          ))}
        </View>
      ) : (
        <AppText variant="caption" muted>
          No new timber for this option.
        </AppText>
      )}
      <View style={styles.totals}>
        <Row
          label={`Labour, ${hours(estimate.hours)} at ${money(labourRatePerHour, currency)} an hour`}
          value={money(estimate.labourCost, currency)}
          testID="estimate-labour"
        />
        <Row
          label="Timber"
          value={money(estimate.materialCost, currency)}
          testID="estimate-material"
        />
        <Row
          label="Total"
          value={money(estimate.totalCost, currency)}
          strong
          testID="estimate-total"
        />
      </View>
      {estimate.notes?.length ? (
        <View style={styles.notes}>
          <AppText variant="caption" muted>
            How this was figured
          </AppText>
          {estimate.notes.map((n) => (
            <AppText key={n} variant="caption">
              • {n}
            </AppText>
          ))}
        </View>
      ) : null}
    </Card>
  );
}

function Row({
  label,
  value,
  strong,
  testID,
}: {
  label: string;
  value: string;
  strong?: boolean;
  testID: string;
}) {
  return (
    <View style={styles.row}>
      <AppText style={[styles.rowLabel, strong && styles.strong]}>{label}</AppText>
      <AppText style={strong && styles.strong} testID={testID}>
        {value}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  totals: {
    gap: spacing.xs,
    paddingTop: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'baseline' },
  rowLabel: { flex: 1 },
  strong: { fontFamily: fonts.bold },
  notes: { gap: 2 },
});
