import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { VehicleStage } from '@/shared/schemas';
import { can } from '@/shared/roles';
import { cleanError } from '@/src/api/client';
import { useRestoreVehicle, useVehicles } from '@/src/api/vehicles';
import {
  AppText,
  Button,
  EmptyState,
  ErrorView,
  LoadingView,
  Screen,
  useToast,
} from '@/src/components/ui';
import { useDebouncedValue } from '@/src/components/vehicles/use-debounced-value';
import { VehicleFilters } from '@/src/components/vehicles/vehicle-filters';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { VehicleRow } from '@/src/components/vehicles/vehicle-row';
import { useRole, useSession, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

export default function VehiclesList() {
  const wid = useWorkshopId();
  const role = useRole();
  const { active } = useSession();
  const toast = useToast();
  const [search, setSearch] = useState('');
  const [stage, setStage] = useState<VehicleStage | null>(null);
  const [removed, setRemoved] = useState(false);
  const q = useDebouncedValue(search.trim());
  const vehicles = useVehicles(wid, {
    q: q || undefined,
    stage: stage ?? undefined,
    deleted: removed ? 'only' : undefined,
  });
  const restore = useRestoreVehicle(wid);
  const canAdd = can(role, 'vehicles.write');
  const filtered = !!q || !!stage;

  const addButton = canAdd ? (
    <Button
      label="Add a vehicle"
      onPress={() => router.push('/vehicles/new')}
      testID="add-vehicle"
    />
  ) : null;

  function body() {
    if (vehicles.isPending) return <LoadingView label="Loading vehicles…" />;
    if (vehicles.isError)
      return <ErrorView error={vehicles.error} onRetry={() => vehicles.refetch()} />;
    const items = vehicles.data;
    if (!items.length) {
      if (removed)
        return (
          <EmptyState
            title="Nothing removed"
            message="Removed vehicles appear here and can be restored."
          />
        );
      if (filtered)
        return (
          <EmptyState title="No vehicle matches" message="Try fewer words, or another stage." />
        );
      return (
        <EmptyState
          title="No vehicles yet"
          message={
            canAdd
              ? 'Add the first vehicle to start its survey.'
              : 'Vehicles shared with you will appear here.'
          }
          action={addButton}
        />
      );
    }
    return (
      <View style={styles.list} accessibilityRole="list">
        <AppText variant="caption" muted accessibilityLiveRegion="polite">
          {items.length === 1 ? '1 vehicle' : `${items.length} vehicles`}
        </AppText>
        {items.map((v) =>
          removed ? (
            <VehicleRow
              key={v.id}
              vehicle={v}
              restoring={restore.isPending && restore.variables === v.id}
              onRestore={() =>
                restore.mutate(v.id, {
                  onSuccess: () =>
                    toast.show(`${vehicleTitle(v)} is back in the list.`, { kind: 'success' }),
                  onError: (e) => toast.show(cleanError(e), { kind: 'error' }),
                })
              }
            />
          ) : (
            <VehicleRow key={v.id} vehicle={v} onOpen={() => router.push(`/vehicles/${v.id}`)} />
          ),
        )}
      </View>
    );
  }

  return (
    <Screen
      title="Vehicles"
      subtitle={active?.workshopName}
      actions={addButton}
      testID="vehicles-screen"
    >
      <VehicleFilters
        search={search}
        onSearch={setSearch}
        stage={stage}
        onStage={setStage}
        removed={removed}
        onRemoved={can(role, 'vehicles.delete') ? setRemoved : undefined}
      />
      {body()}
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
