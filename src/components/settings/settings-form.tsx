import { StyleSheet, View } from 'react-native';
import { SPECIES_KEYS } from '@/shared/body-plans';
import { VERDICT_OPTIONS } from '@/shared/wood';
import { SPECIES_LABELS } from '@/src/components/findings/labels';
import { AppText, Checkbox, NUMERIC_INPUT, SegmentedControl, TextField } from '@/src/components/ui';
import { OPTION_LABELS } from '@/src/components/wood/labels';
import { spacing } from '@/src/theme';
import { Cell, Section } from './settings-section';
import { TreatmentSettingsSection } from './treatment-settings-section';
import type { SettingsErrors, SettingsFormValues } from './settings-values';

const unitOptions = [
  { value: 'metric' as const, label: 'Metric (mm, °C)' },
  { value: 'imperial' as const, label: 'Imperial (in, °F)' },
];
const paperOptions = [
  { value: 'A4' as const, label: 'A4' },
  { value: 'Letter' as const, label: 'US Letter' },
];
const RULES = 'settings.wood.verdictRules';

type Props = {
  values: SettingsFormValues;
  onChange(patch: Partial<SettingsFormValues>): void;
  errors: SettingsErrors;
};

/** The owner's settings: units and rates, the wood verdicts and costs, treatments and re-checks. */
export function SettingsForm({ values, onChange, errors }: Props) {
  const money = values.currency || '¤';
  return (
    <View style={styles.form}>
      <Section title="Units and rates">
        <SegmentedControl
          label="Units"
          options={unitOptions}
          value={values.units}
          onChange={(units) => onChange({ units })}
          testID="settings-units"
        />
        <SegmentedControl
          label="Paper size for printed reports"
          options={paperOptions}
          value={values.paperSize}
          onChange={(paperSize) => onChange({ paperSize })}
          testID="settings-paper"
        />
        <View style={styles.grid}>
          <Cell>
            <TextField
              label="Labour rate"
              suffix={`${money}/h`}
              value={values.labourRatePerHour}
              onChangeText={(labourRatePerHour) => onChange({ labourRatePerHour })}
              error={errors['settings.labourRatePerHour']}
              testID="settings-labour-rate"
              {...NUMERIC_INPUT}
            />
          </Cell>
          <Cell>
            <TextField
              label="Currency"
              placeholder="Code, e.g. EUR, GBP, USD"
              autoCapitalize="characters"
              value={values.currency}
              onChangeText={(currency) => onChange({ currency: currency.toUpperCase() })}
              error={errors['settings.currency']}
              testID="settings-currency"
            />
          </Cell>
        </View>
      </Section>

      <Section
        title="Verdict thresholds"
        subtitle="Common practice defaults, yours to change. They are rules of thumb of the trade, not published rules."
        testID="settings-thresholds"
      >
        <TextField
          label="Keep the member when at least this much strength remains"
          hint="Share of the section modulus left after decay."
          suffix="%"
          value={values.keepPercent}
          onChangeText={(keepPercent) => onChange({ keepPercent })}
          error={errors[`${RULES}.keepMinSectionModulusRatio`]}
          testID="settings-keep"
          {...NUMERIC_INPUT}
        />
        <TextField
          label="Consolidate when at least this much remains"
          hint="Below it, the decayed wood is cut out and new wood let in."
          suffix="%"
          value={values.consolidatePercent}
          onChangeText={(consolidatePercent) => onChange({ consolidatePercent })}
          error={errors[`${RULES}.consolidateMinSectionModulusRatio`]}
          testID="settings-consolidate"
          {...NUMERIC_INPUT}
        />
        <TextField
          label="Splice when the damage covers at most this much of the member"
          hint="Longer damage means replacing the member."
          suffix="%"
          value={values.splicePercent}
          onChangeText={(splicePercent) => onChange({ splicePercent })}
          error={errors[`${RULES}.spliceMaxAffectedLengthRatio`]}
          testID="settings-splice"
          {...NUMERIC_INPUT}
        />
        <Checkbox
          label="Damage at a joint or fitting rules out consolidation"
          description="On structural members: filler cannot carry a hinge, lock or mounting."
          checked={values.jointRulesOutConsolidation}
          onChange={(jointRulesOutConsolidation) => onChange({ jointRulesOutConsolidation })}
          testID="settings-joint"
        />
        <TextField
          label="Replace the whole assembly when this many of its members need replacing"
          value={values.replaceAssemblyMinMembers}
          onChangeText={(replaceAssemblyMinMembers) => onChange({ replaceAssemblyMinMembers })}
          error={errors[`${RULES}.replaceAssemblyMinMembers`]}
          testID="settings-assembly"
          keyboardType="number-pad"
          inputMode="numeric"
        />
      </Section>

      <Section title="Splices">
        <TextField
          label="Scarf slope, as 1:N"
          hint="Enter N: 1:10 makes a scarf ten times the member's depth. Aircraft practice (FAA AC 43.13-1B) uses about 1:10 to 1:12 for solid wood."
          value={values.scarfSlope}
          onChangeText={(scarfSlope) => onChange({ scarfSlope })}
          error={errors['settings.wood.scarfSlope']}
          testID="settings-scarf-slope"
          {...NUMERIC_INPUT}
        />
      </Section>

      <Section title="Hours per operation" subtitle="For one typical member of your work.">
        <View style={styles.grid}>
          {VERDICT_OPTIONS.map((o) => (
            <Cell key={o}>
              <TextField
                label={OPTION_LABELS[o].label}
                suffix="h"
                value={values.hours[o]}
                onChangeText={(v) => onChange({ hours: { ...values.hours, [o]: v } })}
                error={errors[`settings.wood.hoursPerOperation.${o}`]}
                testID={`settings-hours-${o}`}
                {...NUMERIC_INPUT}
              />
            </Cell>
          ))}
        </View>
      </Section>

      <Section title="Timber">
        <TextField
          label="Waste factor"
          hint="Extra timber bought for defects, checks and saw kerf."
          suffix="%"
          value={values.wastePercent}
          onChangeText={(wastePercent) => onChange({ wastePercent })}
          error={errors['settings.wood.wasteFactorPercent']}
          testID="settings-waste"
          {...NUMERIC_INPUT}
        />
        <AppText variant="label">Price per board foot, rough stock</AppText>
        <View style={styles.grid}>
          {SPECIES_KEYS.map((k) => (
            <Cell key={k}>
              <TextField
                label={SPECIES_LABELS[k]}
                suffix={money}
                value={values.prices[k]}
                onChangeText={(v) => onChange({ prices: { ...values.prices, [k]: v } })}
                error={errors[`settings.wood.timberPricePerBoardFoot.${k}`]}
                testID={`settings-price-${k}`}
                {...NUMERIC_INPUT}
              />
            </Cell>
          ))}
        </View>
      </Section>

      <TreatmentSettingsSection values={values} onChange={onChange} errors={errors} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.xl },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
