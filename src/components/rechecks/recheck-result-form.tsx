import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { zoneLabel, type BodyPlan } from '@/shared/body-plans';
import { recordRecheckRequest, type RecheckResponse } from '@/shared/schemas/recheck';
import { useRecordRecheck } from '@/src/api/rechecks';
import { EvidenceChips } from '@/src/components/findings/evidence-chips';
import type { InsectEvidence } from '@/src/components/findings/form-values';
import { SeverityPicker } from '@/src/components/findings/severity-picker';
import {
  AppText,
  Button,
  Checkbox,
  ChipToggle,
  FieldErrorsNotice,
  FormMessage,
  SegmentedControl,
  TextField,
  useFormSubmit,
  useToast,
} from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';

type Result = 'clean' | 'fresh-evidence';
const RESULT_OPTIONS: { value: Result; label: string }[] = [
  { value: 'clean', label: 'Clean' },
  { value: 'fresh-evidence', label: 'Fresh evidence' },
];

/** Record what the re-check found: clean, or fresh evidence described as a finding. */
export function RecheckResultForm({
  wid,
  plan,
  recheck,
  onDone,
}: {
  wid: string;
  plan: BodyPlan;
  recheck: RecheckResponse;
  onDone(): void;
}) {
  const toast = useToast();
  const record = useRecordRecheck(wid, recheck.id);
  const [result, setResult] = useState<Result>('clean');
  const [frassCleaned, setFrassCleaned] = useState(false);
  const [notes, setNotes] = useState('');
  const [zoneKey, setZoneKey] = useState(recheck.zoneKeys[0] ?? '');
  const [severity, setSeverity] = useState<number | null>(null);
  const [evidence, setEvidence] = useState<InsectEvidence[]>([]);
  const [findingNotes, setFindingNotes] = useState('');
  const { errors, message, busy, submit } = useFormSubmit(recordRecheckRequest, (body) =>
    record.mutateAsync(body),
  );
  const findingError = errors.finding;

  async function save() {
    const ok = await submit({
      version: recheck.version,
      result,
      frassCleaned,
      notes,
      ...(result === 'fresh-evidence'
        ? {
            finding:
              severity === null
                ? undefined
                : {
                    zoneKey,
                    severity,
                    insectEvidence: evidence,
                    activity: 'active',
                    notes: findingNotes,
                  },
          }
        : {}),
    });
    if (ok) {
      toast.show(result === 'clean' ? 'Clean re-check recorded' : 'Fresh evidence recorded', {
        kind: 'success',
      });
      onDone();
    }
  }

  return (
    <View style={styles.form} testID="recheck-result-form">
      <SegmentedControl
        label="What did you find?"
        options={RESULT_OPTIONS}
        value={result}
        onChange={setResult}
        testID="recheck-result"
      />
      <Checkbox
        label="Old frass was cleaned away at or before this check"
        description="So any frass seen next time is new. Common practice after treating boring insects."
        checked={frassCleaned}
        onChange={setFrassCleaned}
        testID="recheck-frass-cleaned"
      />
      {result === 'fresh-evidence' ? (
        <View style={styles.finding} testID="recheck-finding">
          <AppText variant="label">The fresh evidence</AppText>
          <AppText variant="caption" muted>
            Saved as a finding in the vehicle’s latest survey. Fresh evidence after a treatment may
            mean it failed: call a licensed operator.
          </AppText>
          {findingError ? (
            <AppText variant="caption" style={styles.error} testID="recheck-finding-error">
              {severity === null ? 'Choose the severity of the fresh evidence' : findingError}
            </AppText>
          ) : null}
          {recheck.zoneKeys.length > 1 ? (
            <View style={styles.chips} accessibilityLabel="Zone">
              {recheck.zoneKeys.map((k) => (
                <ChipToggle
                  key={k}
                  label={zoneLabel(plan, k)}
                  checked={zoneKey === k}
                  onChange={() => setZoneKey(k)}
                  testID={`recheck-zone-${k}`}
                />
              ))}
            </View>
          ) : null}
          <SeverityPicker value={severity} onChange={setSeverity} />
          <EvidenceChips value={evidence} onChange={setEvidence} />
          <TextField
            label="What you saw"
            multiline
            value={findingNotes}
            onChangeText={setFindingNotes}
            testID="recheck-finding-notes"
          />
        </View>
      ) : null}
      <TextField
        label="Notes"
        multiline
        value={notes}
        onChangeText={setNotes}
        error={errors.notes}
        testID="recheck-notes"
      />
      <FieldErrorsNotice errors={errors} />
      <FormMessage message={message} testID="recheck-message" />
      <Button label="Save the re-check" onPress={save} loading={busy} testID="recheck-save" />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  finding: {
    gap: spacing.md,
    padding: spacing.md,
    borderLeftWidth: 4,
    borderLeftColor: colors.danger,
    backgroundColor: colors.surface,
  },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  error: { color: colors.danger },
});
