import { StyleSheet, View } from 'react-native';
import type { FindingResponse } from '@/shared/schemas';
import { AppText } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { FindingCard } from './finding-card';
import { formatDay } from '@/src/format/dates';

/** Newest survey first; within a survey, the latest record first. */
export function sortHistory(findings: FindingResponse[]): FindingResponse[] {
  return [...findings].sort(
    (a, b) => b.surveyDate.localeCompare(a.surveyDate) || b.createdAt.localeCompare(a.createdAt),
  );
}

/** A zone's findings across surveys, grouped under each survey's date. */
export function ZoneHistoryList({
  findings,
  onEdit,
  onRestore,
  restoringId,
}: {
  findings: FindingResponse[];
  onEdit?: (f: FindingResponse) => void;
  onRestore?: (f: FindingResponse) => void;
  restoringId?: string | null;
}) {
  const groups: { surveyId: string; date: string; items: FindingResponse[] }[] = [];
  for (const f of sortHistory(findings)) {
    const last = groups[groups.length - 1];
    if (last && last.surveyId === f.surveyId) last.items.push(f);
    else groups.push({ surveyId: f.surveyId, date: f.surveyDate, items: [f] });
  }
  return (
    <View style={styles.list} testID="zone-history-list">
      {groups.map((g) => (
        <View key={g.surveyId} style={styles.group}>
          <AppText variant="label" accessibilityRole="header">
            Survey of {formatDay(g.date)}
          </AppText>
          {g.items.map((f) => (
            <FindingCard
              key={f.id}
              finding={f}
              detail="full"
              onEdit={onEdit ? () => onEdit(f) : undefined}
              onRestore={onRestore ? () => onRestore(f) : undefined}
              restoring={restoringId === f.id}
            />
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xl },
  group: { gap: spacing.sm },
});
