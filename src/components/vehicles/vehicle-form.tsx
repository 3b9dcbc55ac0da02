import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { BODY_PLANS, type BodyPlan } from '@/shared/body-plans';
import {
  STORAGE_PLACES,
  VEHICLE_STAGES,
  type VehicleResponse,
  type VehicleStage,
} from '@/shared/schemas';
import type { FieldErrors } from '@/src/components/ui';
import {
  Button,
  FieldErrorsNotice,
  FormMessage,
  SegmentedControl,
  Select,
  TextField,
} from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { BodyPlanPicker } from './body-plan-picker';
import { STAGE_LABELS, STORAGE_LABELS } from './vehicle-labels';

type Storage = (typeof STORAGE_PLACES)[number];

export type VehicleFormValues = {
  year: string;
  make: string;
  model: string;
  bodyPlanKey: string;
  chassisNumber: string;
  bodyNumber: string;
  clientName: string;
  storage: Storage;
  stage: VehicleStage;
  notes: string;
};

export function vehicleToForm(v?: VehicleResponse): VehicleFormValues {
  return {
    year: v ? String(v.year) : '',
    make: v?.make ?? '',
    model: v?.model ?? '',
    bodyPlanKey: v?.bodyPlanKey ?? '',
    chassisNumber: v?.chassisNumber ?? '',
    bodyNumber: v?.bodyNumber ?? '',
    clientName: v?.clientName ?? '',
    storage: v?.storage ?? 'indoors',
    stage: v?.stage ?? 'intake',
    notes: v?.notes ?? '',
  };
}

/** Form text → request body; the shared schema then checks it (ranges, required fields). */
export function formToRequest(values: VehicleFormValues) {
  const year = values.year.trim();
  return { ...values, year: /^\d{1,4}$/.test(year) ? Number(year) : undefined };
}

type Props = {
  initial: VehicleFormValues;
  submitLabel: string;
  onSubmit: (body: ReturnType<typeof formToRequest>) => void;
  onCancel?: () => void;
  errors: FieldErrors;
  message: string | null;
  busy: boolean;
  plans?: readonly BodyPlan[];
};

export function VehicleForm({
  initial,
  submitLabel,
  onSubmit,
  onCancel,
  errors,
  message,
  busy,
  plans = BODY_PLANS,
}: Props) {
  const [values, setValues] = useState(initial);
  const set =
    <K extends keyof VehicleFormValues>(key: K) =>
    (value: VehicleFormValues[K]) =>
      setValues((prev) => ({ ...prev, [key]: value }));
  // A year that is not a number never reaches the schema, so say it here in plain words.
  const yearError =
    errors.year && !/^\d{1,4}$/.test(values.year.trim())
      ? 'Enter the year as four digits, e.g. 1931'
      : errors.year;

  return (
    <View style={styles.form} testID="vehicle-form">
      <FormMessage message={message} />
      <View style={styles.row}>
        <View style={styles.year}>
          <TextField
            label="Year"
            value={values.year}
            onChangeText={set('year')}
            error={yearError}
            keyboardType="number-pad"
            inputMode="numeric"
            maxLength={4}
            testID="vehicle-year"
          />
        </View>
        <View style={styles.grow}>
          <TextField
            label="Make"
            value={values.make}
            onChangeText={set('make')}
            error={errors.make}
            testID="vehicle-make"
          />
        </View>
      </View>
      <TextField
        label="Model"
        value={values.model}
        onChangeText={set('model')}
        error={errors.model}
        testID="vehicle-model"
      />
      <BodyPlanPicker
        plans={plans}
        value={values.bodyPlanKey}
        onChange={set('bodyPlanKey')}
        error={errors.bodyPlanKey}
      />
      <TextField
        label="Client"
        hint="Who the vehicle belongs to or who ordered the survey"
        value={values.clientName}
        onChangeText={set('clientName')}
        error={errors.clientName}
        testID="vehicle-client"
      />
      <View style={styles.row}>
        <View style={styles.grow}>
          <TextField
            label="Chassis number"
            value={values.chassisNumber}
            onChangeText={set('chassisNumber')}
            error={errors.chassisNumber}
            autoCapitalize="characters"
            testID="vehicle-chassis"
          />
        </View>
        <View style={styles.grow}>
          <TextField
            label="Body number"
            value={values.bodyNumber}
            onChangeText={set('bodyNumber')}
            error={errors.bodyNumber}
            autoCapitalize="characters"
            testID="vehicle-body-number"
          />
        </View>
      </View>
      <SegmentedControl
        label="Kept"
        options={STORAGE_PLACES.map((s) => ({ value: s, label: STORAGE_LABELS[s] }))}
        value={values.storage}
        onChange={set('storage')}
        testID="vehicle-storage"
      />
      <Select
        label="Stage"
        options={VEHICLE_STAGES.map((s) => ({ value: s, label: STAGE_LABELS[s] }))}
        value={values.stage}
        onChange={set('stage')}
        error={errors.stage}
        testID="vehicle-stage"
      />
      <TextField
        label="Notes"
        value={values.notes}
        onChangeText={set('notes')}
        error={errors.notes}
        multiline
        testID="vehicle-notes"
      />
      <FieldErrorsNotice errors={errors} />
      <View style={styles.actions}>
        {onCancel ? <Button label="Cancel" variant="secondary" onPress={onCancel} /> : null}
        <Button
          label={submitLabel}
          onPress={() => onSubmit(formToRequest(values))}
          loading={busy}
          testID="vehicle-submit"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  year: { width: 110 },
  grow: { flexGrow: 1, flexBasis: 180 },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', flexWrap: 'wrap', gap: spacing.sm },
});
