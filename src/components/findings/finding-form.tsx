import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { SPECIES_KEYS, type BodyPlan } from '@/shared/body-plans';
import { ACTIVITY, DECAY_TYPES, PICK_TEST, PICK_TEST_LABELS } from '@/shared/schemas';
import {
  AppText,
  Checkbox,
  FormSection,
  NUMERIC_INPUT,
  SegmentedControl,
  Select,
  TextField,
} from '@/src/components/ui';
import { AgentsPanel, hasAgentEvidence } from '@/src/components/wood/agents-panel';
import type { Units } from '@/src/components/wood/labels';
import { readMoisture, type ShopClimate } from '@/src/components/wood/moisture';
import { MoisturePanel } from '@/src/components/wood/moisture-panel';
import { spacing } from '@/src/theme';
import { EvidenceChips } from './evidence-chips';
import {
  FACES,
  fieldError,
  parseNumber,
  type FindingFieldErrors,
  type FindingFormValues,
} from './form-values';
import { ACTIVITY_LABELS, DECAY_TYPE_LABELS, SPECIES_LABELS } from './labels';
import { SeverityPicker } from './severity-picker';
import { ZonePicker } from './zone-picker';

const decayOptions = DECAY_TYPES.map((v) => ({ value: v, ...DECAY_TYPE_LABELS[v] }));
const activityOptions = ACTIVITY.map((v) => ({ value: v, label: ACTIVITY_LABELS[v] }));
const pickOptions = PICK_TEST.map((v) => ({ value: v, label: PICK_TEST_LABELS[v] }));
const speciesOptions = SPECIES_KEYS.map((v) => ({ value: v as string, label: SPECIES_LABELS[v] }));
const FACE_LABELS = {
  top: 'Top face',
  bottom: 'Bottom face',
  left: 'Left face',
  right: 'Right face',
};

type Props = {
  plan: BodyPlan;
  values: FindingFormValues;
  onChange(patch: Partial<FindingFormValues>): void;
  errors: FindingFieldErrors;
  /** The photo section (picker, queued and saved photos). */
  photos: ReactNode;
  /** The survey's shop climate, for the equilibrium moisture content (null: not known). */
  climate: ShopClimate | null;
  units: Units;
};

/** Every field of a finding, grouped in the order an inspector works a member. */
export function FindingForm({ plan, values, onChange, errors, photos, climate, units }: Props) {
  const err = (path: string) => fieldError(errors, path);
  const hole = parseNumber(values.holeDiameterMm);
  const holeDiameterMm = hole === null || Number.isNaN(hole) ? null : hole;
  const moisture = readMoisture({ ...values, climate }).reading;
  return (
    <View style={styles.form}>
      <FormSection title="Where">
        <ZonePicker
          plan={plan}
          value={values.zoneKey}
          onChange={(zoneKey) => onChange({ zoneKey })}
          error={err('zoneKey')}
        />
        <Checkbox
          label="At a joint or fitting"
          description="Hinges, lock plates, seat or belt mountings, or where members meet."
          checked={values.atJointOrFitting}
          onChange={(atJointOrFitting) => onChange({ atJointOrFitting })}
          testID="finding-joint"
        />
      </FormSection>

      <FormSection title="Condition">
        <SeverityPicker
          value={values.severity}
          onChange={(severity) => onChange({ severity })}
          error={err('severity')}
        />
        <Select
          label="Decay type"
          options={decayOptions}
          value={values.decayType}
          onChange={(decayType) => onChange({ decayType })}
          error={err('decayType')}
          testID="decay"
        />
      </FormSection>

      <FormSection title="Insects">
        <EvidenceChips
          value={values.insectEvidence}
          onChange={(insectEvidence) => onChange({ insectEvidence })}
          error={err('insectEvidence')}
        />
        <TextField
          label="Largest exit hole"
          hint="Diameter across the widest hole you found."
          suffix="mm"
          value={values.holeDiameterMm}
          onChangeText={(holeDiameterMm) => onChange({ holeDiameterMm })}
          error={err('holeDiameterMm')}
          testID="finding-hole"
          {...NUMERIC_INPUT}
        />
        <SegmentedControl
          label="Activity"
          options={activityOptions}
          value={values.activity}
          onChange={(activity) => onChange({ activity })}
          testID="activity"
        />
        {hasAgentEvidence({ ...values, holeDiameterMm }) ? (
          <AgentsPanel
            insectEvidence={values.insectEvidence}
            holeDiameterMm={holeDiameterMm}
            decayType={values.decayType}
            moisturePercent={moisture?.corrected ?? null}
            species={values.species}
          />
        ) : null}
      </FormSection>

      <FormSection title="Moisture">
        <View style={styles.pair}>
          <View style={styles.half}>
            <TextField
              label="Meter reading"
              suffix="%"
              value={values.meterReading}
              onChangeText={(meterReading) => onChange({ meterReading })}
              error={err('moisture.meterReading')}
              testID="finding-meter"
              {...NUMERIC_INPUT}
            />
          </View>
          <View style={styles.half}>
            <TextField
              label="Wood temperature"
              suffix="°C"
              value={values.woodTempC}
              onChangeText={(woodTempC) => onChange({ woodTempC })}
              error={err('moisture.woodTempC')}
              testID="finding-wood-temp"
              {...NUMERIC_INPUT}
            />
          </View>
        </View>
        <MoisturePanel
          meterReading={values.meterReading}
          woodTempC={values.woodTempC}
          species={values.species}
          climate={climate}
          units={units}
        />
        <Select
          label="Species the meter is set for"
          options={speciesOptions}
          value={values.species}
          onChange={(species) => onChange({ species })}
          error={err('moisture.species')}
          testID="species"
        />
      </FormSection>

      <FormSection title="Probe and measure">
        <Select
          label="Pick test"
          options={pickOptions}
          value={values.pickTest}
          onChange={(pickTest) => onChange({ pickTest })}
          error={err('pickTest')}
          testID="pick-test"
        />
        <AppText variant="label">Decay depth from each face</AppText>
        <View style={styles.grid}>
          {FACES.map((face) => (
            <View key={face} style={styles.half}>
              <TextField
                label={FACE_LABELS[face]}
                suffix="mm"
                value={values.decayDepthMm[face]}
                onChangeText={(v) =>
                  onChange({ decayDepthMm: { ...values.decayDepthMm, [face]: v } })
                }
                error={err(`decayDepthMm.${face}`)}
                testID={'finding-depth-' + face}
                {...NUMERIC_INPUT}
              />
            </View>
          ))}
        </View>
        <TextField
          label="Affected length"
          hint="Along the member."
          suffix="mm"
          value={values.affectedLengthMm}
          onChangeText={(affectedLengthMm) => onChange({ affectedLengthMm })}
          error={err('affectedLengthMm')}
          testID="finding-length"
          {...NUMERIC_INPUT}
        />
      </FormSection>

      <FormSection title="Notes and photos">
        <TextField
          label="Notes"
          multiline
          value={values.notes}
          onChangeText={(notes) => onChange({ notes })}
          error={err('notes')}
          placeholder="What you saw, where exactly, what could not be reached"
          testID="finding-notes"
        />
        {photos}
      </FormSection>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.xl },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  // Wide enough that two inputs with a unit sit side by side only where they fit.
  half: { flexGrow: 1, flexBasis: 220 },
});
