import { StyleSheet, View } from 'react-native';
import type { RecheckResponse } from '@/shared/schemas/recheck';
import { cleanError } from '@/src/api/client';
import { useMembers } from '@/src/api/members';
import { useAssignRecheck } from '@/src/api/rechecks';
import { AppText, ChipToggle, useToast } from '@/src/components/ui';
import { spacing } from '@/src/theme';

/** Who does the re-check: any member but a client, or nobody yet. */
export function RecheckAssignee({ wid, recheck }: { wid: string; recheck: RecheckResponse }) {
  const toast = useToast();
  const members = useMembers(wid);
  const assign = useAssignRecheck(wid, recheck.id);
  const people = (members.data ?? []).filter((m) => m.role !== 'client');
  const choose = (assigneeId: string | null) =>
    assign.mutate(
      { version: recheck.version, assigneeId },
      {
        onSuccess: () => toast.show('Re-check assigned', { kind: 'success' }),
        onError: (e) => toast.show(cleanError(e), { kind: 'error' }),
      },
    );
  if (!people.length) return null;
  return (
    <View style={styles.group} accessibilityLabel="Assigned to" testID="recheck-assignee">
      <AppText variant="label">Assigned to</AppText>
      <View style={styles.chips}>
        <ChipToggle
          label="Nobody yet"
          checked={recheck.assigneeId === null}
          onChange={() => choose(null)}
          testID="recheck-assign-none"
        />
        {people.map((m) => (
          <ChipToggle
            key={m.userId}
            label={m.name}
            checked={recheck.assigneeId === m.userId}
            onChange={() => choose(m.userId)}
            testID={`recheck-assign-${m.userId}`}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
