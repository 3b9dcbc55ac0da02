import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Zone } from '@/shared/body-plans';
import { AppText, Button, ChipToggle, TextField } from '@/src/components/ui';
import { spacing } from '@/src/theme';

type Props = { zones: readonly Zone[]; value: string[]; onChange: (keys: string[]) => void };

/**
 * Many zones (30+) per plan: the chosen ones stay in view, the full list opens on demand
 * with a filter, so the form stays short on a phone.
 */
export function ZoneMultiPicker({ zones, value, onChange }: Props) {
  const [open, setOpen] = useState(false);
  const [filter, setFilter] = useState('');
  const toggle = (key: string, on: boolean) =>
    onChange(on ? [...value, key] : value.filter((k) => k !== key));
  const words = filter.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const shown = open
    ? zones.filter((z) => words.every((w) => z.label.toLowerCase().includes(w)))
    : zones.filter((z) => value.includes(z.key));

  return (
    <View style={styles.wrap} testID="zone-multi-picker">
      {open ? (
        <TextField
          label="Find a zone"
          value={filter}
          onChangeText={setFilter}
          autoCorrect={false}
          testID="zone-filter"
        />
      ) : null}
      {shown.length ? (
        <View style={styles.chips}>
          {shown.map((z) => (
            <ChipToggle
              key={z.key}
              label={z.label}
              checked={value.includes(z.key)}
              onChange={(on) => toggle(z.key, on)}
              testID={`hidden-${z.key}`}
            />
          ))}
        </View>
      ) : (
        <AppText variant="caption" muted>
          {open ? 'No zone matches.' : 'No zones chosen.'}
        </AppText>
      )}
      <View style={styles.actions}>
        <Button
          label={
            open ? 'Done' : value.length ? `Change zones (${value.length} chosen)` : 'Choose zones'
          }
          variant="secondary"
          compact
          onPress={() => {
            setOpen((o) => !o);
            setFilter('');
          }}
          testID="zone-picker-toggle"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  actions: { flexDirection: 'row' },
});
