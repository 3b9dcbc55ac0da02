import { StyleSheet, View } from 'react-native';
import type { DecisionResponse } from '@/shared/schemas';
import { AppText, Badge } from '@/src/components/ui';
import { CLASS_LABELS, hours, money, OPTION_LABELS } from '@/src/components/wood/labels';
import { colors, radius, spacing } from '@/src/theme';
import { formatMoment } from '@/src/format/dates';

type Props = {
  decision: DecisionResponse;
  /** Costs show only when the workshop's currency is known. */
  currency?: string;
  /** The zone sheet shows the essentials; the read-only screen shows the reasons too. */
  detail?: 'brief' | 'full';
};

/** A saved member decision: what will be done, its class, effort and cost, and who decided. */
export function DecisionSummary({ decision: d, currency, detail = 'brief' }: Props) {
  const cls = CLASS_LABELS[d.decisionClass];
  const overridden = d.chosenOption !== d.recommendedOption;
  return (
    <View style={styles.box} testID="decision-summary">
      <AppText variant="caption" muted>
        Repair decision
      </AppText>
      <View style={styles.head}>
        <AppText variant="label" testID="decision-summary-option">
          {OPTION_LABELS[d.chosenOption].label}
        </AppText>
        <Badge label={cls.label} tone={cls.tone} />
      </View>
      {overridden ? (
        <AppText variant="caption" testID="decision-summary-override">
          Recommended: {OPTION_LABELS[d.recommendedOption].label.toLowerCase()}. Chosen instead
          because: {d.overrideReason}
        </AppText>
      ) : null}
      <AppText variant="caption">
        About {hours(d.estimatedHours)}
        {currency ? `, ${money(d.totalCost, currency)} with timber` : ''}
      </AppText>
      {detail === 'full' ? (
        <>
          {d.recommendationReasons.map((r) => (
            <AppText key={r} variant="caption">
              • {r}
            </AppText>
          ))}
          {d.notes ? <AppText style={styles.notes}>{d.notes}</AppText> : null}
        </>
      ) : null}
      <AppText variant="caption" muted>
        {d.decidedByName ? `Decided by ${d.decidedByName}, ` : 'Decided '}
        {formatMoment(d.updatedAt)}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  head: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  notes: { fontStyle: 'italic' },
});
