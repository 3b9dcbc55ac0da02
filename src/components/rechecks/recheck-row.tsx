import { Pressable, StyleSheet, View } from 'react-native';
import { RECHECK_STATUS_LABELS, type RecheckResponse } from '@/shared/schemas/recheck';
import { AppText, Badge, type BadgeTone } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { formatWeekday } from '@/src/format/dates';

const TONES: Record<RecheckResponse['status'], BadgeTone> = {
  pending: 'neutral',
  clean: 'ok',
  'fresh-evidence': 'danger',
};

/** One re-check as a row: due date, vehicle, zones, who; opens the re-check. */
export function RecheckRow({
  recheck: r,
  zoneLabel,
  showVehicle = true,
  onPress,
}: {
  recheck: RecheckResponse;
  zoneLabel?: (key: string) => string;
  showVehicle?: boolean;
  onPress(): void;
}) {
  const zones = r.zoneKeys.map((k) => zoneLabel?.(k) ?? k).join(', ');
  const due = formatWeekday(r.dueDate);
  return (
    <Pressable
      onPress={onPress}
      accessibilityRole="button"
      accessibilityLabel={`Re-check due ${due}${showVehicle ? `, ${r.vehicleLabel}` : ''}, ${zones}`}
      testID={`recheck-row-${r.id}`}
      style={({ pressed }) => [styles.row, pressed && styles.pressed]}
    >
      <View style={styles.main}>
        <AppText variant="label">{due}</AppText>
        {showVehicle ? <AppText>{r.vehicleLabel}</AppText> : null}
        <AppText variant="caption" muted>
          {zones}
        </AppText>
        <AppText variant="caption" muted>
          {r.assigneeName ? `Assigned to ${r.assigneeName}` : 'Not assigned'}
        </AppText>
      </View>
      <Badge label={RECHECK_STATUS_LABELS[r.status]} tone={TONES[r.status]} />
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: 56,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  pressed: { backgroundColor: colors.surfaceSunken },
  main: { flex: 1, gap: 2 },
});
