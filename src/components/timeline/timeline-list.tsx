import { format } from 'date-fns';
import { StyleSheet, View } from 'react-native';
import type { TimelineItem, TimelineKind } from '@/shared/schemas/recheck';
import { AppText, Badge, type BadgeTone } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

export const TIMELINE_KIND_LABELS: Record<TimelineKind, string> = {
  survey: 'Survey',
  finding: 'Finding',
  treatment: 'Treatment',
  recheck: 'Re-check',
};
const TONES: Record<TimelineKind, BadgeTone> = {
  survey: 'neutral',
  finding: 'caution',
  treatment: 'accent',
  recheck: 'ok',
};

/** One vehicle's records, newest first, each with its kind written out. */
export function TimelineList({
  items,
  zoneLabel,
}: {
  items: TimelineItem[];
  zoneLabel(key: string): string;
}) {
  if (!items.length) return <AppText muted>Nothing recorded of these kinds yet.</AppText>;
  return (
    <View style={styles.list} testID="timeline-list">
      {items.map((item) => (
        <View
          key={`${item.kind}-${item.id}`}
          style={styles.item}
          testID={`timeline-${item.kind}-${item.id}`}
        >
          <View style={styles.head}>
            <Badge label={TIMELINE_KIND_LABELS[item.kind]} tone={TONES[item.kind]} />
            <AppText variant="caption" muted>
              {format(new Date(item.at), 'd MMM yyyy, HH:mm')}
            </AppText>
          </View>
          <AppText variant="label">{item.title}</AppText>
          {item.detail ? <AppText variant="caption">{item.detail}</AppText> : null}
          {item.zoneKeys.length ? (
            <AppText variant="caption" muted>
              {item.zoneKeys.map(zoneLabel).join(', ')}
            </AppText>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  item: {
    gap: 2,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
});
