import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { getZone, TRADE_NAME_LABELS, type BodyPlan } from '@/shared/body-plans';
import { AppText, Button, TextField } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

/** The finding's zone: shown as chosen (from the diagram), changeable from the plan's list. */
export function ZonePicker({
  plan,
  value,
  onChange,
  error,
}: {
  plan: BodyPlan;
  value: string;
  onChange(zoneKey: string): void;
  error?: string;
}) {
  const [open, setOpen] = useState(false);
  const [filter, setFilter] = useState('');
  const zone = getZone(plan, value);
  const matches = useMemo(() => {
    const q = filter.trim().toLowerCase();
    if (!q) return plan.zones;
    return plan.zones.filter(
      (z) =>
        z.label.toLowerCase().includes(q) ||
        TRADE_NAME_LABELS[z.tradeName].toLowerCase().includes(q),
    );
  }, [plan, filter]);

  return (
    <View style={styles.group}>
      <AppText variant="label">Zone</AppText>
      {error ? (
        <AppText
          variant="caption"
          style={styles.error}
          accessibilityRole="alert"
          testID="zone-error"
        >
          {error}
        </AppText>
      ) : null}
      <View style={styles.current}>
        <View style={styles.currentText}>
          <AppText variant="title" testID="finding-zone-label">
            {zone ? zone.label : 'No zone chosen'}
          </AppText>
          {zone ? (
            <AppText variant="caption" muted>
              {TRADE_NAME_LABELS[zone.tradeName]}
            </AppText>
          ) : null}
        </View>
        <Button
          label={open ? 'Close list' : 'Change zone'}
          variant="secondary"
          compact
          onPress={() => setOpen(!open)}
          testID="zone-change"
        />
      </View>
      {open ? (
        <View style={styles.list}>
          <TextField
            label="Find a zone"
            value={filter}
            onChangeText={setFilter}
            placeholder="e.g. sill, roof slat"
          />
          {matches.map((z) => (
            <Pressable
              key={z.key}
              testID={'zone-option-' + z.key}
              accessibilityRole="radio"
              accessibilityState={{ checked: z.key === value }}
              onPress={() => {
                onChange(z.key);
                setOpen(false);
                setFilter('');
              }}
              style={({ pressed }) => [
                styles.row,
                z.key === value && styles.rowSelected,
                pressed && styles.pressed,
              ]}
            >
              <AppText variant="label">{z.label}</AppText>
              <AppText variant="caption" muted>
                {TRADE_NAME_LABELS[z.tradeName]}
              </AppText>
            </Pressable>
          ))}
          {matches.length === 0 ? <AppText muted>No zone matches “{filter}”.</AppText> : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  error: { color: colors.danger },
  current: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, flexWrap: 'wrap' },
  currentText: { flex: 1, minWidth: 160 },
  list: { gap: spacing.xs },
  row: {
    minHeight: 48,
    justifyContent: 'center',
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  rowSelected: { borderColor: colors.accent, borderWidth: 2, backgroundColor: colors.accentSoft },
  pressed: { backgroundColor: colors.surfaceSunken },
});
