import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { BODY_PLANS } from '@/shared/body-plans';
import type { DueListResponse, RecheckResponse } from '@/shared/schemas/recheck';
import { AppText } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { RecheckRow } from './recheck-row';

const GROUPS: { key: keyof DueListResponse; title: string; empty: string }[] = [
  { key: 'overdue', title: 'Overdue', empty: 'Nothing overdue.' },
  { key: 'thisWeek', title: 'Due this week', empty: 'Nothing due in the next seven days.' },
  { key: 'upcoming', title: 'Later', empty: 'Nothing scheduled after this week.' },
];

// A re-check names zones by key and the list spans vehicles: any plan's label for the key reads well.
const zoneLabels = new Map(
  Object.values(BODY_PLANS).flatMap((p) => p.zones.map((z) => [z.key, z.label] as const)),
);
const zoneLabel = (key: string) => zoneLabels.get(key) ?? key;

/** The workshop's pending re-checks in three groups; each row opens the re-check on its vehicle. */
export function DueList({ due }: { due: DueListResponse }) {
  const open = (r: RecheckResponse) =>
    router.push({
      pathname: '/vehicles/[vehicleId]/rechecks/[recheckId]',
      params: { vehicleId: r.vehicleId, recheckId: r.id },
    });
  return (
    <View style={styles.wrap}>
      {GROUPS.map((g) => (
        <View key={g.key} style={styles.group} testID={`due-${g.key}`}>
          <AppText
            variant="title"
            accessibilityRole="header"
            style={g.key === 'overdue' && due.overdue.length ? styles.overdue : undefined}
          >
            {g.title} ({due[g.key].length})
          </AppText>
          {due[g.key].length === 0 ? (
            <AppText muted>{g.empty}</AppText>
          ) : (
            due[g.key].map((r) => (
              <RecheckRow key={r.id} recheck={r} zoneLabel={zoneLabel} onPress={() => open(r)} />
            ))
          )}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xl },
  group: { gap: spacing.sm },
  overdue: { color: colors.danger },
});
