import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { can } from '@/shared/roles';
import { useMembers } from '@/src/api/members';
import { useDueRechecks } from '@/src/api/rechecks';
import { DueList } from '@/src/components/rechecks/due-list';
import { AppText, ChipToggle, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { useRole, useSession, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

/** Re-checks across the workshop: overdue, this week, later; filtered by who does them. */
export default function Due() {
  const wid = useWorkshopId();
  const role = useRole();
  const { user } = useSession();
  const members = useMembers(wid, { enabled: can(role, 'members.read') });
  const [assigneeId, setAssigneeId] = useState<string | null>(null);
  const due = useDueRechecks(wid, assigneeId ? { assigneeId } : {});
  const people = (members.data ?? []).filter((m) => m.role !== 'client');

  return (
    <Screen title="Due" subtitle="Re-checks after treatment" testID="due-screen">
      <View style={styles.filters} accessibilityLabel="Whose re-checks">
        <AppText variant="label">Whose re-checks</AppText>
        <View style={styles.chips}>
          <ChipToggle
            label="Everyone"
            checked={assigneeId === null}
            onChange={() => setAssigneeId(null)}
            testID="due-filter-all"
          />
          {user ? (
            <ChipToggle
              label="Mine"
              checked={assigneeId === user.id}
              onChange={() => setAssigneeId(user.id)}
              testID="due-filter-mine"
            />
          ) : null}
          {people
            .filter((m) => m.userId !== user?.id)
            .map((m) => (
              <ChipToggle
                key={m.userId}
                label={m.name}
                checked={assigneeId === m.userId}
                onChange={() => setAssigneeId(m.userId)}
                testID={`due-filter-${m.userId}`}
              />
            ))}
        </View>
      </View>
      {due.isPending ? (
        <LoadingView label="Loading re-checks…" />
      ) : due.isError ? (
        <ErrorView error={due.error} onRetry={() => due.refetch()} />
      ) : (
        <DueList due={due.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
