import { Pressable, StyleSheet, View } from 'react-native';
import {
  STRUCTURAL_CLASS_LABELS,
  TRADE_NAME_LABELS,
  type BodyPlan,
  type StructuralClass,
} from '@/shared/body-plans';
import type { DecisionResponse, FindingResponse } from '@/shared/schemas';
import { FLAGGED_LABEL, ZONE_STATE_LABELS, type ZoneStateCue } from '@/src/components/body-diagram';
import { DecisionSummary } from '@/src/components/decisions/decision-summary';
import { speciesLabel } from '@/src/components/findings/labels';
import { FindingCard } from '@/src/components/findings/finding-card';
import { AppText, Badge, Button, SeverityBadge, type BadgeTone } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

const CLASS_TONES: Record<StructuralClass, BadgeTone> = {
  primary: 'danger',
  secondary: 'caution',
  'non-structural': 'neutral',
};
const STATE_TONES: Record<ZoneStateCue['state'], BadgeTone> = {
  'no-evidence': 'neutral',
  active: 'danger',
  'treated-watching': 'caution',
  cleared: 'ok',
  'old-damage': 'neutral',
};
const SIDE_LABELS = { left: 'Left side', right: 'Right side', centre: 'Centre line' } as const;

type Props = {
  plan: BodyPlan;
  zoneKey: string;
  /** This zone's open findings (already limited to the chosen survey, when one is chosen). */
  findings: FindingResponse[];
  /** Shown instead of "Log a finding" for roles that may not write. */
  canLog: boolean;
  canEdit: boolean;
  /** The zone's repair decision (null: none yet, or not loaded). */
  decision?: DecisionResponse | null;
  /** Workshop currency, for the decision's cost. */
  currency?: string;
  /** Shows "Decide the repair" to roles that make member decisions. */
  canDecide: boolean;
  onDecide(): void;
  /** The zone's treatment state, derived on the server from the records. */
  zoneState?: ZoneStateCue;
  /** Shown as "Record a treatment" to roles that may record one. */
  onRecordTreatment?: () => void;
  onLogFinding(): void;
  onEditFinding(finding: FindingResponse): void;
  onOpenHistory(): void;
  onClose(): void;
};

/** Everything about one zone: what the member is, its findings, and what to do next. */
export function ZoneSheet({
  plan,
  zoneKey,
  findings,
  canLog,
  canEdit,
  decision,
  currency,
  canDecide,
  onDecide,
  zoneState,
  onRecordTreatment,
  onLogFinding,
  onEditFinding,
  onOpenHistory,
  onClose,
}: Props) {
  const zone = plan.zones.find((z) => z.key === zoneKey);
  if (!zone) return null;
  const worst = findings.length ? Math.max(...findings.map((f) => f.severity)) : null;
  const sorted = [...findings].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <View style={styles.sheet} testID="zone-sheet" accessibilityLabel={`${zone.label} details`}>
      <View style={styles.head}>
        <View style={styles.titles}>
          <AppText variant="title" accessibilityRole="header" testID="zone-sheet-title">
            {zone.label}
          </AppText>
          <AppText muted>
            {TRADE_NAME_LABELS[zone.tradeName]} · {SIDE_LABELS[zone.side]}
          </AppText>
        </View>
        <Pressable
          onPress={onClose}
          accessibilityRole="button"
          accessibilityLabel="Close zone details"
          testID="zone-sheet-close"
          style={styles.close}
        >
          <AppText variant="label" style={styles.closeText}>
            Close
          </AppText>
        </Pressable>
      </View>

      <View style={styles.facts}>
        <Badge
          label={STRUCTURAL_CLASS_LABELS[zone.structuralClass]}
          tone={CLASS_TONES[zone.structuralClass]}
        />
        <AppText variant="caption">
          Usually {speciesLabel(zone.defaultSpecies).toLowerCase()}, {zone.nominalSection.widthMm} ×{' '}
          {zone.nominalSection.depthMm} mm section (face × depth), about {Math.round(zone.lengthMm)}{' '}
          mm long
        </AppText>
      </View>

      <View style={styles.status}>
        <SeverityBadge severity={worst} testID="zone-sheet-severity" />
        <AppText variant="caption" muted>
          {findings.length === 0
            ? 'Nothing logged here yet'
            : findings.length === 1
              ? '1 open finding'
              : `${findings.length} open findings`}
        </AppText>
      </View>

      {zoneState && zoneState.state !== 'no-evidence' ? (
        <View
          style={[styles.state, zoneState.flagged && styles.stateFlagged]}
          testID="zone-sheet-state"
        >
          <Badge
            label={ZONE_STATE_LABELS[zoneState.state]}
            tone={STATE_TONES[zoneState.state]}
            testID="zone-sheet-state-label"
          />
          {zoneState.flagged ? (
            <AppText variant="label" style={styles.flagText} testID="zone-sheet-flagged">
              {FLAGGED_LABEL}
            </AppText>
          ) : null}
          {zoneState.reason ? <AppText variant="caption">{zoneState.reason}</AppText> : null}
        </View>
      ) : null}

      {decision ? <DecisionSummary decision={decision} currency={currency} /> : null}

      <View style={styles.actions}>
        {canLog ? (
          <Button label="Log a finding" onPress={onLogFinding} testID="zone-log-finding" />
        ) : null}
        {onRecordTreatment ? (
          <Button
            label="Record a treatment"
            variant="secondary"
            onPress={onRecordTreatment}
            testID="zone-record-treatment"
          />
        ) : null}
        {canDecide ? (
          <Button
            label={decision ? 'Review the repair' : 'Decide the repair'}
            variant="secondary"
            onPress={onDecide}
            testID="zone-decide"
          />
        ) : null}
        <Button
          label="Zone history"
          variant="secondary"
          onPress={onOpenHistory}
          testID="zone-history"
        />
      </View>

      {sorted.map((f) => (
        <FindingCard key={f.id} finding={f} onEdit={canEdit ? () => onEditFinding(f) : undefined} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  sheet: {
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surfaceSunken,
  },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.md },
  titles: { flex: 1, gap: 2 },
  close: {
    minHeight: 44,
    minWidth: 44,
    justifyContent: 'center',
    alignItems: 'center',
    paddingHorizontal: spacing.sm,
  },
  closeText: { color: colors.accent },
  facts: { gap: spacing.xs },
  status: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  state: {
    gap: spacing.xs,
    padding: spacing.sm,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  stateFlagged: { borderWidth: 2, borderColor: colors.danger, borderLeftWidth: 6 },
  flagText: { color: colors.danger },
});
