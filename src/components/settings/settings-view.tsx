import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { SPECIES_KEYS } from '@/shared/body-plans';
import { PLAN_GROUP_LABELS, PLAN_GROUPS } from '@/shared/treatments';
import type { WorkshopSettings } from '@/shared/schemas';
import { percent, VERDICT_OPTIONS } from '@/shared/wood';
import { SPECIES_LABELS } from '@/src/components/findings/labels';
import { AppText, Card } from '@/src/components/ui';
import { hours, money, OPTION_LABELS } from '@/src/components/wood/labels';
import { fonts, spacing } from '@/src/theme';

/** The workshop's settings as a reader sees them (only the owner changes them). */
export function SettingsView({ settings: s }: { settings: WorkshopSettings }) {
  const r = s.wood.verdictRules;
  const t = s.treatments;
  return (
    <View style={styles.wrap} testID="settings-view">
      <Group title="Units and rates">
        <Row label="Units" value={s.units === 'metric' ? 'Metric (mm, °C)' : 'Imperial (in, °F)'} />
        <Row label="Report paper" value={s.paperSize === 'A4' ? 'A4' : 'US Letter'} />
        <Row label="Labour rate" value={`${money(s.labourRatePerHour, s.currency)} an hour`} />
      </Group>
      <Group title="Verdict thresholds" note="Common practice defaults, yours to change.">
        <Row
          label="Keep when strength left is at least"
          value={percent(r.keepMinSectionModulusRatio)}
        />
        <Row
          label="Consolidate when at least"
          value={percent(r.consolidateMinSectionModulusRatio)}
        />
        <Row
          label="Splice when damage covers at most"
          value={`${percent(r.spliceMaxAffectedLengthRatio)} of the member`}
        />
        <Row
          label="Joint or fitting damage rules out consolidation"
          value={r.jointDamageRulesOutConsolidation ? 'Yes' : 'No'}
        />
        <Row
          label="Replace the assembly from"
          value={`${r.replaceAssemblyMinMembers} members needing replacement`}
        />
        <Row label="Scarf slope" value={`1:${s.wood.scarfSlope}`} />
      </Group>
      <Group title="Hours per operation">
        {VERDICT_OPTIONS.map((o) => (
          <Row key={o} label={OPTION_LABELS[o].label} value={hours(s.wood.hoursPerOperation[o])} />
        ))}
      </Group>
      <Group title="Timber">
        <Row label="Waste factor" value={`${s.wood.wasteFactorPercent} %`} />
        {SPECIES_KEYS.map((k) => (
          <Row
            key={k}
            label={`${SPECIES_LABELS[k]}, per board foot`}
            value={money(s.wood.timberPricePerBoardFoot[k], s.currency)}
          />
        ))}
      </Group>
      <Group title="Treatments and re-checks">
        <Row label="Region" value={s.region || 'Not set'} />
        <Row label="Local regulatory notes" value={t.regulatoryNotes || 'None'} />
        <Row label="Workshop time zone" value={t.timeZone} />
        <Row
          label="Cleared after (common practice default)"
          value={`${t.clearance.cleanChecksRequired} clean re-checks over at least ${t.clearance.minSpanDays} days`}
        />
        {PLAN_GROUPS.map((g) => (
          <Row
            key={g}
            label={`${PLAN_GROUP_LABELS[g]}, re-check on day`}
            value={t.recheckPlans[g].join(', ')}
          />
        ))}
      </Group>
    </View>
  );
}

function Group({ title, note, children }: { title: string; note?: string; children: ReactNode }) {
  return (
    <Card>
      <AppText variant="title" accessibilityRole="header">
        {title}
      </AppText>
      {note ? <AppText muted>{note}</AppText> : null}
      {children}
    </Card>
  );
}

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.row}>
      <AppText style={styles.label}>{label}</AppText>
      <AppText style={styles.value}>{value}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, paddingVertical: 2 },
  label: { flex: 1, minWidth: 180 },
  value: { fontFamily: fonts.bold },
});
