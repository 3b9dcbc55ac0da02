import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { moveRecheckRequest, type RecheckResponse } from '@/shared/schemas/recheck';
import { useMoveRecheck } from '@/src/api/rechecks';
import { Button, FormMessage, TextField, useFormSubmit, useToast } from '@/src/components/ui';
import { spacing } from '@/src/theme';

/** A new due date for a re-check, with the reason kept on the record. */
export function RecheckMoveForm({
  wid,
  recheck,
  onDone,
}: {
  wid: string;
  recheck: RecheckResponse;
  onDone(): void;
}) {
  const toast = useToast();
  const move = useMoveRecheck(wid, recheck.id);
  const [dueDate, setDueDate] = useState(recheck.dueDate);
  const [reason, setReason] = useState('');
  const { errors, message, busy, submit } = useFormSubmit(moveRecheckRequest, (body) =>
    move.mutateAsync(body),
  );
  async function save() {
    if (await submit({ version: recheck.version, dueDate: dueDate.trim(), reason })) {
      toast.show('Re-check moved', { kind: 'success' });
      onDone();
    }
  }
  return (
    <View style={styles.form} testID="recheck-move-form">
      <TextField
        label="New due date"
        hint="YYYY-MM-DD"
        value={dueDate}
        onChangeText={setDueDate}
        error={errors.dueDate}
        testID="recheck-move-date"
      />
      <TextField
        label="Reason"
        value={reason}
        onChangeText={setReason}
        error={errors.reason}
        testID="recheck-move-reason"
      />
      <FormMessage message={message} />
      <Button
        label="Move the re-check"
        variant="secondary"
        onPress={save}
        loading={busy}
        testID="recheck-move-save"
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: spacing.md } });
