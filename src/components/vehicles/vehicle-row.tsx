import { StyleSheet, View } from 'react-native';
import type { VehicleResponse } from '@/shared/schemas';
import { AppText, Badge, Button, Card, SeverityBadge } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { bodyPlanName, STAGE_LABELS, STAGE_TONES, vehicleTitle } from './vehicle-labels';
import { formatDay } from '@/src/format/dates';

type Props = {
  vehicle: VehicleResponse;
  onOpen?: () => void;
  /** Shown instead of opening for removed vehicles. */
  onRestore?: () => void;
  restoring?: boolean;
};

export function VehicleRow({ vehicle: v, onOpen, onRestore, restoring }: Props) {
  const title = vehicleTitle(v);
  const { findings, worstSeverity, lastSurveyDate } = v.summary;
  const details = [bodyPlanName(v.bodyPlanKey), v.clientName].filter(Boolean).join(' · ');
  return (
    <Card
      onPress={onOpen}
      accessibilityLabel={onOpen ? `Open ${title}` : undefined}
      testID={`vehicle-row-${v.id}`}
    >
      <View style={styles.top}>
        <View style={styles.titles}>
          <AppText variant="title">{title}</AppText>
          {details ? <AppText muted>{details}</AppText> : null}
        </View>
        <Badge label={STAGE_LABELS[v.stage]} tone={STAGE_TONES[v.stage]} />
      </View>
      <View style={styles.facts}>
        <SeverityBadge severity={worstSeverity} />
        {findings > 0 ? (
          <AppText variant="caption">
            {findings === 1 ? '1 open finding' : `${findings} open findings`}
          </AppText>
        ) : null}
        <AppText variant="caption" muted>
          {lastSurveyDate ? `Last survey ${formatDay(lastSurveyDate)}` : 'Not surveyed yet'}
        </AppText>
      </View>
      {onRestore ? (
        <View style={styles.restore}>
          <AppText variant="caption" muted>
            Removed {v.deletedAt ? formatDay(v.deletedAt) : ''}
          </AppText>
          <Button
            label="Restore"
            variant="secondary"
            compact
            onPress={onRestore}
            loading={restoring}
            accessibilityLabel={`Restore ${title}`}
            testID={`restore-${v.id}`}
          />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'flex-start',
    gap: spacing.md,
  },
  titles: { flex: 1, gap: 2 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  restore: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
});
