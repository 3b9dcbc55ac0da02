import { StyleSheet, View } from 'react-native';
import { zoneLabel, type BodyPlan } from '@/shared/body-plans';
import {
  TREATMENT_METHOD_LABELS,
  TREATMENT_TARGET_LABELS,
  type TreatmentResponse,
} from '@/shared/schemas/treatment';
import { AppText, Card } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { formatDay, formatMoment } from '@/src/format/dates';

/** What was applied, where and under which label; earlier versions listed with their reasons. */
export function TreatmentDetails({
  treatment: t,
  plan,
}: {
  treatment: TreatmentResponse;
  plan?: BodyPlan;
}) {
  const zones = t.zoneKeys.map((k) => zoneLabel(plan, k)).join(', ');
  const rows: [string, string][] = [
    ['Applied', formatMoment(t.appliedAt)],
    ['Applied by', t.applicatorName + (t.licenceNumber ? ` (licence ${t.licenceNumber})` : '')],
    ['Zones', zones],
    ['Product', t.productName],
    ['Registration number', t.registrationNumber],
    ['Active ingredient', `${t.activeIngredient}, ${t.concentration}`],
    ['Formulation', t.formulation || '—'],
    ['Dilution as mixed', t.dilution || '—'],
    ['Method', TREATMENT_METHOD_LABELS[t.method]],
    ['Aimed at', TREATMENT_TARGET_LABELS[t.targetAgent]],
    ['Quantity used', `${t.quantity.amount} ${t.quantity.unit}`],
    ['Area or length', t.areaTreated || '—'],
    ['Ventilation', t.ventilation || '—'],
    ['Re-entry time', `${t.reentryHours} h`],
    ['Protective equipment', t.ppe.join(', ')],
    [
      'Conditions',
      [
        t.conditions.airTempC !== null ? `air ${t.conditions.airTempC} °C` : null,
        t.conditions.woodMoisturePercent !== null
          ? `wood ${t.conditions.woodMoisturePercent} %`
          : null,
      ]
        .filter(Boolean)
        .join(', ') || '—',
    ],
    ['Notes', t.notes || '—'],
    ['Recorded by', `${t.recordedByName ?? 'Unknown'}, version ${t.version}`],
  ];
  return (
    <View style={styles.wrap} testID="treatment-details">
      <Card>
        {rows.map(([label, value]) => (
          <View key={label} style={styles.row}>
            <AppText variant="caption" muted style={styles.label}>
              {label}
            </AppText>
            <AppText style={styles.value}>{value}</AppText>
          </View>
        ))}
      </Card>
      {t.versions.length ? (
        <View style={styles.wrap} testID="treatment-versions">
          <AppText variant="title" accessibilityRole="header">
            Earlier versions
          </AppText>
          {t.versions.map((v) => (
            <Card key={v.version}>
              <AppText variant="label">
                Version {v.version}, replaced {formatDay(v.changedAt)} by{' '}
                {v.changedByName ?? 'unknown'}
              </AppText>
              <AppText variant="caption">Reason: {v.reason}</AppText>
              <AppText variant="caption" muted>
                {v.data.productName} ({v.data.registrationNumber}), {v.data.activeIngredient}{' '}
                {v.data.concentration}
              </AppText>
            </Card>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: spacing.md,
    paddingVertical: spacing.xs,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  label: { width: 150 },
  value: { flex: 1, minWidth: 160 },
});
