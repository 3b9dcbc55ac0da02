import { StyleSheet, View } from 'react-native';
import type { BodyPlan } from '@/shared/body-plans';
import {
  SEVERITIES,
  SEVERITY_LABELS,
  type FindingResponse,
  type VehicleResponse,
} from '@/shared/schemas';
import { AppText, Badge } from '@/src/components/ui';
import { STAGE_LABELS, STAGE_TONES } from '@/src/components/vehicles/vehicle-labels';
import { colors, radius, severityFill, severityInk, spacing } from '@/src/theme';
import { formatDay } from '@/src/format/dates';

/** Plan, stage and client under the title, then open findings counted by severity. */
export function VehicleFacts({
  vehicle,
  plan,
  findings,
}: {
  vehicle: VehicleResponse;
  plan: BodyPlan | undefined;
  findings: FindingResponse[];
}) {
  const open = findings.filter((f) => !f.deletedAt);
  const bySeverity = SEVERITIES.map((s) => ({ s, n: open.filter((f) => f.severity === s).length }));
  const { summary } = vehicle;
  return (
    <View style={styles.wrap} testID="vehicle-facts">
      <View style={styles.row}>
        <Badge label={STAGE_LABELS[vehicle.stage]} tone={STAGE_TONES[vehicle.stage]} />
        <AppText variant="caption">{plan?.name ?? vehicle.bodyPlanKey}</AppText>
        {vehicle.clientName ? (
          <AppText variant="caption">· For {vehicle.clientName}</AppText>
        ) : null}
      </View>
      <View style={styles.row}>
        <AppText variant="label" testID="vehicle-finding-count">
          {open.length === 1 ? '1 open finding' : `${open.length} open findings`}
        </AppText>
        <AppText variant="caption" muted>
          {summary.surveys === 1 ? '1 survey' : `${summary.surveys} surveys`}
          {summary.lastSurveyDate ? `, last on ${formatDay(summary.lastSurveyDate)}` : ''}
        </AppText>
      </View>
      {open.length ? (
        <View style={styles.row} accessibilityLabel="Open findings by severity">
          {bySeverity.map(({ s, n }) => (
            <View
              key={s}
              style={styles.count}
              accessibilityLabel={`${n} at severity ${s}, ${SEVERITY_LABELS[s].title}`}
              testID={'severity-count-' + s}
            >
              <View style={[styles.swatch, { backgroundColor: severityFill[s] }]}>
                <AppText variant="label" style={{ color: severityInk[s] }}>
                  {s}
                </AppText>
              </View>
              <AppText variant="caption">
                {SEVERITY_LABELS[s].title} <AppText variant="label">{n}</AppText>
              </AppText>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  count: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, paddingRight: spacing.sm },
  swatch: {
    width: 26,
    height: 26,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.ink,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
