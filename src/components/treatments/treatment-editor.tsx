import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BodyPlan } from '@/shared/body-plans';
import {
  correctTreatmentRequest,
  createTreatmentRequest,
  type TreatmentResponse,
} from '@/shared/schemas/treatment';
import { newId } from '@/src/api/ids';
import { useCorrectTreatment, useCreateTreatment } from '@/src/api/treatments';
import type { ZoneStateCue } from '@/src/components/body-diagram';
import {
  Button,
  FieldErrorsNotice,
  FIELDS_NEED_ATTENTION,
  FormMessage,
  saveFailure,
  serverFieldErrors,
  TextField,
  useToast,
  zodFieldErrors,
} from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { TreatmentForm } from './treatment-form';
import {
  emptyTreatmentValues,
  toTreatmentBody,
  valuesFromTreatment,
  type TreatmentFieldErrors,
  type TreatmentFormValues,
} from './treatment-values';

type Mode =
  | { kind: 'new'; vehicleId: string; applicatorName: string; zoneKeys: string[] }
  | { kind: 'correct'; treatment: TreatmentResponse };

/** A new treatment record, or a correction of one (a new version with a reason). */
export function TreatmentEditor({
  wid,
  plan,
  mode,
  regulatoryNotes,
  region,
  zoneStates,
  onDone,
}: {
  wid: string;
  plan: BodyPlan;
  mode: Mode;
  regulatoryNotes: string;
  region?: string;
  zoneStates?: Record<string, ZoneStateCue>;
  onDone(treatment: TreatmentResponse): void;
}) {
  const toast = useToast();
  const [values, setValues] = useState<TreatmentFormValues>(() =>
    mode.kind === 'new'
      ? emptyTreatmentValues(new Date(), mode.applicatorName, mode.zoneKeys)
      : valuesFromTreatment(mode.treatment),
  );
  const [reason, setReason] = useState('');
  const [errors, setErrors] = useState<TreatmentFieldErrors>({});
  const [message, setMessage] = useState<string | null>(null);
  // Made once per form so a retried save stays one treatment.
  const id = useMemo(() => newId(), []);
  const create = useCreateTreatment(wid, mode.kind === 'new' ? mode.vehicleId : '');
  const correct = useCorrectTreatment(wid, mode.kind === 'correct' ? mode.treatment.id : '');
  const busy = create.isPending || correct.isPending;

  async function save() {
    setMessage(null);
    const read = toTreatmentBody(values);
    const parsed =
      mode.kind === 'new'
        ? createTreatmentRequest.safeParse({ ...read.body, id })
        : correctTreatmentRequest.safeParse({
            ...read.body,
            version: mode.treatment.version,
            reason,
          });
    // Every field that needs attention is named at once; the form's own words win.
    const all = { ...(parsed.success ? {} : zodFieldErrors(parsed.error)), ...read.errors };
    if (!parsed.success || Object.keys(all).length) {
      setErrors(all);
      toast.show('Some fields need attention. See the messages beside them.', { kind: 'error' });
      return;
    }
    setErrors({});
    try {
      const saved =
        mode.kind === 'new'
          ? await create.mutateAsync(parsed.data as Parameters<typeof create.mutateAsync>[0])
          : await correct.mutateAsync(parsed.data as Parameters<typeof correct.mutateAsync>[0]);
      toast.show(
        mode.kind === 'new' ? 'Treatment recorded; re-checks scheduled' : 'Correction saved',
        {
          kind: 'success',
        },
      );
      onDone(saved);
    } catch (e) {
      setErrors(serverFieldErrors(e));
      const { message } = saveFailure(e);
      setMessage(message);
      toast.show(message ?? FIELDS_NEED_ATTENTION, { kind: 'error' });
    }
  }

  return (
    <View style={styles.wrap}>
      <TreatmentForm
        plan={plan}
        values={values}
        onChange={(patch) => setValues((v) => ({ ...v, ...patch }))}
        errors={errors}
        regulatoryNotes={regulatoryNotes}
        region={region}
        zoneStates={zoneStates}
      />
      {mode.kind === 'correct' ? (
        <TextField
          label="Reason for the correction"
          hint="Kept with the earlier version, which stays on record."
          value={reason}
          onChangeText={setReason}
          error={errors.reason}
          multiline
          testID="treatment-reason"
        />
      ) : null}
      <FieldErrorsNotice errors={errors} />
      <FormMessage message={message} testID="treatment-message" />
      <Button
        label={mode.kind === 'new' ? 'Save the treatment' : 'Save the correction'}
        onPress={save}
        loading={busy}
        testID="treatment-save"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});
