import { StyleSheet, View } from 'react-native';
import type { TimelineItem, TimelineKind } from '@/shared/schemas/recheck';
import { calendarDaysBetween } from '@/shared/treatments/dates';
import { AppText, Badge, type BadgeTone } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { formatDay, formatMoment, todayLocal } from '@/src/format/dates';

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

/** When an entry happened: a day for day-only entries (never shifted by the clock), else day and time. */
export function timelineWhen(item: Pick<TimelineItem, 'at' | 'allDay'>): string {
  return item.allDay ? formatDay(item.at.slice(0, 10)) : formatMoment(item.at);
}

/** How far off a planned entry is, from the reader's today: "in 12 days", "today", "3 days late". */
export function timelineDistance(day: string, today: string): string {
  const days = calendarDaysBetween(today, day);
  if (days === 0) return 'today';
  if (days === 1) return 'tomorrow';
  if (days > 0) return `in ${days} days`;
  return days === -1 ? '1 day late' : `${-days} days late`;
}

/**
 * One vehicle's records: what is still planned first (soonest first), then what has been
 * recorded (newest first), each entry with its kind written out.
 */
export function TimelineList({
  items,
  zoneLabel,
}: {
  items: TimelineItem[];
  zoneLabel(key: string): string;
}) {
  if (!items.length) return <AppText muted>Nothing recorded of these kinds yet.</AppText>;
  const planned = items.filter((i) => i.planned).reverse();
  const today = todayLocal();
  const recorded = items.filter((i) => !i.planned);
  return (
    <View style={styles.list} testID="timeline-list">
      {planned.length ? (
        <Group
          title="Planned"
          testID="timeline-planned"
          items={planned}
          today={today}
          zoneLabel={zoneLabel}
        />
      ) : null}
      {recorded.length ? (
        <Group
          title={planned.length ? 'Recorded' : undefined}
          testID="timeline-recorded"
          items={recorded}
          today={today}
          zoneLabel={zoneLabel}
        />
      ) : null}
    </View>
  );
}

function Group({
  title,
  items,
  today,
  zoneLabel,
  testID,
}: {
  title?: string;
  items: TimelineItem[];
  /** The reader's today (YYYY-MM-DD), for how far off a planned entry is. */
  today: string;
  zoneLabel(key: string): string;
  testID: string;
}) {
  return (
    <View style={styles.list} testID={testID}>
      {title ? (
        <AppText variant="label" accessibilityRole="header">
          {title}
        </AppText>
      ) : null}
      {items.map((item) => (
        <View
          key={`${item.kind}-${item.id}`}
          style={[styles.item, item.planned && styles.planned]}
          testID={`timeline-${item.kind}-${item.id}`}
        >
          <View style={styles.head}>
            <Badge label={TIMELINE_KIND_LABELS[item.kind]} tone={TONES[item.kind]} />
            <AppText variant="caption" muted>
              {item.planned ? timelineDistance(item.at.slice(0, 10), today) : timelineWhen(item)}
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
  planned: { borderStyle: 'dashed' },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
});
