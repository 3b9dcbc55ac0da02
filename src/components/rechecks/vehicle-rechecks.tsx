import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { RecheckResponse } from '@/shared/schemas/recheck';
import { AppText } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { RecheckRow } from './recheck-row';

/** The vehicle's pending re-checks, soonest first, each opening its re-check screen. */
export function VehicleRechecks({
  vehicleId,
  rechecks,
  zoneLabel,
}: {
  vehicleId: string;
  rechecks: RecheckResponse[];
  zoneLabel(key: string): string;
}) {
  const pending = rechecks
    .filter((r) => r.status === 'pending')
    .sort((a, b) => a.dueDate.localeCompare(b.dueDate));
  if (!pending.length) return null;
  return (
    <View style={styles.wrap} testID="vehicle-rechecks">
      <AppText variant="title" accessibilityRole="header">
        Re-checks to do
      </AppText>
      {pending.map((r) => (
        <RecheckRow
          key={r.id}
          recheck={r}
          showVehicle={false}
          zoneLabel={zoneLabel}
          onPress={() =>
            router.push({
              pathname: '/vehicles/[vehicleId]/rechecks/[recheckId]',
              params: { vehicleId, recheckId: r.id },
            })
          }
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.sm } });
