import type { ComponentProps } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BodyPlan } from '@/shared/body-plans';
import {
  TREATMENT_METHOD_LABELS,
  TREATMENT_METHODS,
  TREATMENT_TARGET_LABELS,
  TREATMENT_TARGETS,
} from '@/shared/schemas/treatment';
import type { ZoneStateCue } from '@/src/components/body-diagram';
import {
  AppText,
  Checkbox,
  ChipToggle,
  FormSection,
  NUMERIC_INPUT,
  TextField,
} from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { CautionsPanel } from './cautions-panel';
import { TreatmentZonePicker } from './treatment-zone-picker';
import {
  PPE_OPTIONS,
  type TreatmentFieldErrors,
  type TreatmentFormValues,
} from './treatment-values';

type Props = {
  plan: BodyPlan;
  values: TreatmentFormValues;
  onChange(patch: Partial<TreatmentFormValues>): void;
  errors: TreatmentFieldErrors;
  regulatoryNotes: string;
  region?: string;
  zoneStates?: Record<string, ZoneStateCue>;
};

/** Every field of a treatment record, copied from the label and the day's work, then the cautions. */
export function TreatmentForm({
  plan,
  values,
  onChange,
  errors,
  regulatoryNotes,
  region,
  zoneStates,
}: Props) {
  const text = (
    key: keyof TreatmentFormValues & keyof typeof FIELD_LABELS,
    testID: string,
    extra: Partial<ComponentProps<typeof TextField>> = {},
  ) => (
    <TextField
      label={FIELD_LABELS[key]}
      value={values[key] as string}
      onChangeText={(v) => onChange({ [key]: v })}
      error={errors[key]}
      testID={testID}
      {...extra}
    />
  );
  return (
    <View style={styles.form}>
      <FormSection title="Where">
        <TreatmentZonePicker
          plan={plan}
          value={values.zoneKeys}
          onChange={(zoneKeys) => onChange({ zoneKeys })}
          error={errors.zoneKeys}
          zoneStates={zoneStates}
        />
        {text('areaTreated', 'treatment-area', {
          hint: 'In your words, e.g. both sills, 2 × 1.6 m',
        })}
      </FormSection>

      <FormSection title="When and by whom">
        {errors.appliedAt ? (
          <FieldError id="treatment-applied-at-error" message={errors.appliedAt} />
        ) : null}
        <View style={styles.pair}>
          <View style={styles.half}>
            <TextField
              label="Date"
              hint="YYYY-MM-DD"
              value={values.date}
              onChangeText={(date) => onChange({ date })}
              testID="treatment-date"
            />
          </View>
          <View style={styles.half}>
            <TextField
              label="Time"
              hint="HH:MM, 24-hour"
              value={values.time}
              onChangeText={(time) => onChange({ time })}
              testID="treatment-time"
            />
          </View>
        </View>
        {text('applicatorName', 'treatment-applicator')}
        {text('licenceNumber', 'treatment-licence', {
          hint: 'Optional; shown on reports where the law asks for it.',
        })}
      </FormSection>

      <FormSection title="From the label">
        <AppText variant="caption" muted>
          Copy these exactly as printed on the product label.
        </AppText>
        {text('productName', 'treatment-product')}
        {text('registrationNumber', 'treatment-registration')}
        {text('activeIngredient', 'treatment-ingredient')}
        {text('concentration', 'treatment-concentration', { hint: 'As the label states it' })}
        {text('formulation', 'treatment-formulation')}
        {text('dilution', 'treatment-dilution', { hint: 'As you mixed it, in the label’s terms' })}
      </FormSection>

      <FormSection title="How">
        <ChipChoice
          label="Method"
          testID="treatment-method"
          options={TREATMENT_METHODS.map((m) => ({ value: m, label: TREATMENT_METHOD_LABELS[m] }))}
          value={values.method}
          onChange={(method) => onChange({ method })}
          error={errors.method}
        />
        {values.method === 'fumigation' ? (
          <View style={styles.warning} testID="fumigation-caution" accessibilityRole="alert">
            <AppText variant="label">Licensed fumigators only</AppText>
            <AppText variant="caption">
              Fumigation is done only by a licensed fumigator. Nobody goes back into the vehicle or
              the enclosure until clearance testing shows it is safe to re-enter.
            </AppText>
          </View>
        ) : null}
        <ChipChoice
          label="Aimed at"
          testID="treatment-target"
          options={TREATMENT_TARGETS.map((t) => ({ value: t, label: TREATMENT_TARGET_LABELS[t] }))}
          value={values.targetAgent}
          onChange={(targetAgent) => onChange({ targetAgent })}
          error={errors.targetAgent}
        />
        {errors.quantity ? (
          <FieldError id="treatment-quantity-error" message={errors.quantity} />
        ) : null}
        <View style={styles.pair}>
          <View style={styles.half}>
            <TextField
              label="Quantity used"
              value={values.quantityAmount}
              onChangeText={(quantityAmount) => onChange({ quantityAmount })}
              testID="treatment-amount"
              {...NUMERIC_INPUT}
            />
          </View>
          <View style={styles.half}>
            <TextField
              label="Unit"
              placeholder="L, ml, kg"
              value={values.quantityUnit}
              onChangeText={(quantityUnit) => onChange({ quantityUnit })}
              testID="treatment-unit"
            />
          </View>
        </View>
        {text('ventilation', 'treatment-ventilation', { multiline: true })}
        {text('reentryHours', 'treatment-reentry', {
          hint: 'From the label; 0 if it gives none.',
          suffix: 'h',
          ...NUMERIC_INPUT,
        })}
      </FormSection>

      <FormSection title="Protective equipment worn">
        <AppText variant="caption" muted>
          What the label asks for, and what you wore.
        </AppText>
        {errors.ppe ? <FieldError id="treatment-ppe-error" message={errors.ppe} /> : null}
        <View style={styles.chips}>
          {PPE_OPTIONS.map((p, i) => (
            <ChipToggle
              key={p}
              label={p}
              testID={`treatment-ppe-${i}`}
              checked={values.ppe.includes(p)}
              onChange={(on) =>
                onChange({ ppe: on ? [...values.ppe, p] : values.ppe.filter((x) => x !== p) })
              }
            />
          ))}
        </View>
      </FormSection>

      <FormSection title="Conditions and notes">
        {errors.conditions ? (
          <FieldError id="treatment-conditions-error" message={errors.conditions} />
        ) : null}
        <View style={styles.pair}>
          <View style={styles.half}>
            <TextField
              label="Air temperature"
              suffix="°C"
              value={values.airTempC}
              onChangeText={(airTempC) => onChange({ airTempC })}
              testID="treatment-air-temp"
              {...NUMERIC_INPUT}
            />
          </View>
          <View style={styles.half}>
            <TextField
              label="Wood moisture"
              suffix="%"
              value={values.woodMoisturePercent}
              onChangeText={(woodMoisturePercent) => onChange({ woodMoisturePercent })}
              testID="treatment-wood-moisture"
              {...NUMERIC_INPUT}
            />
          </View>
        </View>
        {text('notes', 'treatment-notes', { multiline: true })}
      </FormSection>

      <CautionsPanel method={values.method} regulatoryNotes={regulatoryNotes} region={region} />

      <View style={styles.confirm}>
        {errors.labelConfirmed ? (
          <FieldError id="treatment-label-confirm-error" message={errors.labelConfirmed} />
        ) : null}
        <Checkbox
          label="I read the product label and applied it as it directs"
          description="Required. The record keeps what the label says; Soundframe adds nothing of its own."
          checked={values.labelConfirmed}
          onChange={(labelConfirmed) => onChange({ labelConfirmed })}
          testID="treatment-label-confirm"
        />
      </View>
    </View>
  );
}

const FIELD_LABELS = {
  applicatorName: 'Applied by',
  licenceNumber: 'Licence or certificate number',
  productName: 'Product name',
  registrationNumber: 'Registration number',
  activeIngredient: 'Active ingredient',
  concentration: 'Concentration',
  formulation: 'Formulation',
  dilution: 'Dilution as mixed',
  areaTreated: 'Area or length treated',
  ventilation: 'Ventilation',
  reentryHours: 'Re-entry time',
  notes: 'Notes',
} as const;

function ChipChoice<T extends string>({
  label,
  options,
  value,
  onChange,
  error,
  testID,
}: {
  label: string;
  options: { value: T; label: string }[];
  value: T | null;
  onChange(v: T): void;
  error?: string;
  testID: string;
}) {
  return (
    <View style={styles.group} accessibilityLabel={label}>
      <AppText variant="label">{label}</AppText>
      {error ? <FieldError id={`${testID}-error`} message={error} /> : null}
      <View style={styles.chips}>
        {options.map((o) => (
          <ChipToggle
            key={o.value}
            label={o.label}
            testID={`${testID}-${o.value}`}
            checked={o.value === value}
            onChange={() => onChange(o.value)}
          />
        ))}
      </View>
    </View>
  );
}

function FieldError({ id, message }: { id: string; message: string }) {
  return (
    <AppText variant="caption" style={styles.error} accessibilityRole="alert" testID={id}>
      {message}
    </AppText>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.xl },
  group: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  half: { flexGrow: 1, flexBasis: 160 },
  error: { color: colors.danger, fontWeight: 'bold' },
  warning: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radius.md,
    borderLeftWidth: 6,
    borderLeftColor: colors.danger,
    backgroundColor: colors.dangerSoft,
  },
  confirm: { gap: spacing.sm },
});
