import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BodyPlan, ViewKey } from '@/shared/body-plans';
import { BodyDiagram, ViewSwitcher, type ZoneStateCue } from '@/src/components/body-diagram';
import { AppText, Card } from '@/src/components/ui';
import { ZoneMultiPicker } from '@/src/components/vehicles/zone-multi-picker';
import { colors, spacing } from '@/src/theme';

/** Zones treated, picked by tapping them on the drawing (tap again to drop), or from the list. */
export function TreatmentZonePicker({
  plan,
  value,
  onChange,
  error,
  zoneStates,
}: {
  plan: BodyPlan;
  value: string[];
  onChange(keys: string[]): void;
  error?: string;
  zoneStates?: Record<string, ZoneStateCue>;
}) {
  const [view, setView] = useState<ViewKey>(plan.views[0].key);
  const toggle = (key: string) =>
    onChange(value.includes(key) ? value.filter((k) => k !== key) : [...value, key]);
  return (
    <View style={styles.group} testID="treatment-zones">
      <AppText variant="label">Zones treated</AppText>
      <AppText variant="caption" muted>
        Tap each member you treated; tap it again to take it off.
      </AppText>
      {error ? (
        <AppText
          variant="caption"
          style={styles.error}
          accessibilityRole="alert"
          testID="treatment-zones-error"
        >
          {error}
        </AppText>
      ) : null}
      <Card style={styles.card}>
        <ViewSwitcher plan={plan} value={view} onChange={setView} />
        <BodyDiagram
          plan={plan}
          view={view}
          zoneSummaries={{}}
          pins={[]}
          selectedZones={value}
          zoneStates={zoneStates}
          onZonePress={toggle}
          maxHeight={420}
          testID="treatment-diagram"
        />
      </Card>
      <AppText variant="caption" testID="treatment-zone-count">
        {value.length === 0
          ? 'No zones chosen yet'
          : value.length === 1
            ? '1 zone chosen'
            : `${value.length} zones chosen`}
      </AppText>
      <ZoneMultiPicker zones={plan.zones} value={value} onChange={onChange} />
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  error: { color: colors.danger },
  card: { padding: spacing.md },
});
