import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BodyPlan, Zone } from '@/shared/body-plans';
import type { DecisionResponse, FindingResponse, WorkshopSettings } from '@/shared/schemas';
import {
  AppText,
  Button,
  ConfirmDialog,
  FormMessage,
  Section,
  TextField,
} from '@/src/components/ui';
import { CrossSection } from '@/src/components/wood/cross-section';
import { LengthBar } from '@/src/components/wood/length-bar';
import { RecommendationCard } from '@/src/components/wood/recommendation-card';
import { StructuralCaution } from '@/src/components/wood/structural-caution';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { colors, radius, spacing } from '@/src/theme';
import { assemblyReplacements, worstFinding, type ZoneContext } from './decision-values';
import { EstimatePanel } from './estimate-panel';
import { Measurements } from './measurements';
import { OptionChoice } from './option-choice';
import { useDecisionForm } from './use-decision-form';
import { formatMoment } from '@/src/format/dates';

type Props = {
  wid: string;
  vehicleId: string;
  plan: BodyPlan;
  zone: Zone;
  /** The zone's open findings. */
  findings: FindingResponse[];
  /** Every decision of the vehicle (for the assembly rule). */
  decisions: DecisionResponse[];
  settings: WorkshopSettings;
};

/** Fields the form shows messages beside; anything else the server names goes in one message. */
const SHOWN = /^(inputs\.|overrideReason$|chosenOption$|notes$)/;

/** Measure the member, see what is left of it and what to do, choose, and save. */
export function DecisionEditor({
  wid,
  vehicleId,
  plan,
  zone,
  findings,
  decisions,
  settings,
}: Props) {
  const { wide } = useBreakpoint();
  const [confirming, setConfirming] = useState(false);
  const decision = decisions.find((d) => d.zoneKey === zone.key) ?? null;
  const ctx: ZoneContext = useMemo(
    () => ({ zone, findings, assemblyReplacements: assemblyReplacements(plan, zone, decisions) }),
    [plan, zone, findings, decisions],
  );
  const form = useDecisionForm({ wid, vehicleId, ctx, decision, settings });
  const { values, errors, model, saved } = form;
  const units = settings.units;
  const worst = worstFinding(findings);
  const source = saved
    ? 'The measurements saved with this decision.'
    : worst
      ? 'Prefilled from the zone’s nominal section and its worst open finding; check them against the member.'
      : 'Prefilled from the zone’s nominal section; no findings are logged here yet.';
  const other = Object.entries(errors)
    .filter(([k]) => !SHOWN.test(k))
    .map(([, m]) => m);

  const measure = (
    <Section gap="md" title="Measurements">
      <Measurements
        values={values}
        onChange={form.change}
        errors={errors}
        units={units}
        source={source}
      />
    </Section>
  );
  const section = model ? (
    <Section gap="md" title="What is left of the member">
      <CrossSection
        widthMm={model.inputs.widthMm}
        depthMm={model.inputs.depthMm}
        decay={model.inputs.decayMm}
        section={model.section}
        units={units}
      />
      <LengthBar
        affectedLengthMm={model.inputs.affectedLengthMm}
        memberLengthMm={model.inputs.memberLengthMm}
        spliceLimitRatio={settings.wood.verdictRules.spliceMaxAffectedLengthRatio}
        units={units}
      />
    </Section>
  ) : (
    <View style={styles.waiting} testID="decision-incomplete">
      <AppText muted>
        Complete the measurements to see the section, the recommendation and the estimate.
      </AppText>
    </View>
  );
  const recommend = model ? <RecommendationCard verdict={model.verdict} /> : null;
  const choice = model ? (
    <Section gap="md" title="Your decision">
      <OptionChoice
        recommended={model.verdict.option}
        value={model.option}
        onChange={(chosen) => form.change({ chosen })}
        reason={values.overrideReason}
        onReasonChange={(overrideReason) => form.change({ overrideReason })}
        errors={errors}
      />
    </Section>
  ) : null;
  const estimate = model ? (
    <EstimatePanel
      option={model.option}
      estimate={model.estimate}
      wastePercent={settings.wood.wasteFactorPercent}
      labourRatePerHour={settings.labourRatePerHour}
      currency={settings.currency}
      units={units}
    />
  ) : null;
  const notes = (
    <TextField
      label="Notes"
      multiline
      value={values.notes}
      onChangeText={(n) => form.change({ notes: n })}
      error={errors.notes}
      placeholder="Anything the restorer should know: access, fittings to transfer, original marks"
      testID="decision-notes"
    />
  );
  const footer = (
    <View style={styles.footer}>
      {form.conflict ? (
        <View style={styles.conflict} accessibilityRole="alert" testID="decision-conflict">
          <AppText>
            Someone else saved a decision for this member while you were working. Reload to see
            theirs, then make your changes again.
          </AppText>
          <Button
            label="Reload the saved decision"
            variant="secondary"
            onPress={form.reload}
            testID="decision-reload"
          />
        </View>
      ) : null}
      <FormMessage message={other.length ? other.join(' ') : null} testID="decision-message" />
      {saved ? (
        <AppText variant="caption" muted testID="decision-saved-at">
          Saved{saved.decidedByName ? ` by ${saved.decidedByName}` : ''},{' '}
          {formatMoment(saved.updatedAt)}
          {form.dirty ? ' · unsaved changes' : ''}
        </AppText>
      ) : null}
      <View style={styles.actions}>
        <Button
          label={saved ? 'Save changes' : 'Save decision'}
          onPress={form.submit}
          loading={form.busy}
          disabled={!!saved && !form.dirty}
          testID="decision-save"
        />
        {saved ? (
          <Button
            label="Withdraw decision"
            variant="ghost"
            onPress={() => setConfirming(true)}
            testID="decision-withdraw"
          />
        ) : null}
      </View>
    </View>
  );

  return (
    <View style={styles.wrap}>
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.column}>
            {measure}
            {choice}
            {notes}
            {footer}
          </View>
          <View style={styles.column}>
            {section}
            {recommend}
            {estimate}
            <StructuralCaution />
          </View>
        </View>
      ) : (
        <>
          {measure}
          {section}
          {recommend}
          {choice}
          {estimate}
          {notes}
          <StructuralCaution />
          {footer}
        </>
      )}
      <ConfirmDialog
        visible={confirming}
        title="Withdraw this decision?"
        message="The member goes back to undecided; the audit log keeps what was decided."
        confirmLabel="Withdraw"
        busy={form.withdrawing}
        onCancel={() => setConfirming(false)}
        onConfirm={async () => {
          await form.withdraw();
          setConfirming(false);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xl },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  column: { flex: 1, minWidth: 0, gap: spacing.xl },
  waiting: {
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.line,
  },
  footer: {
    gap: spacing.md,
    paddingTop: spacing.lg,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  conflict: {
    gap: spacing.sm,
    padding: spacing.lg,
    borderRadius: radius.md,
    backgroundColor: colors.dangerSoft,
    borderLeftWidth: 6,
    borderLeftColor: colors.danger,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
