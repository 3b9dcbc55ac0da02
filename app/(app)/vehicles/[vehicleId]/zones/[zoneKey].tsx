import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  getBodyPlan,
  getZone,
  STRUCTURAL_CLASS_LABELS,
  TRADE_NAME_LABELS,
} from '@/shared/body-plans';
import { can } from '@/shared/roles';
import type { FindingResponse } from '@/shared/schemas';
import { cleanError } from '@/src/api/client';
import { useFindings, useRestoreFinding } from '@/src/api/findings';
import { useVehicle } from '@/src/api/vehicles';
import { ZoneHistoryList } from '@/src/components/findings/zone-history-list';
import { goBack } from '@/src/components/nav/go-back';
import {
  AppText,
  Button,
  Checkbox,
  EmptyState,
  ErrorView,
  LoadingView,
  Screen,
  useToast,
} from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

/** Everything ever recorded for one zone of one vehicle, newest first; removed ones on request. */
export default function ZoneHistory() {
  const { vehicleId, zoneKey } = useLocalSearchParams<{ vehicleId: string; zoneKey: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const toast = useToast();
  const [showRemoved, setShowRemoved] = useState(false);
  const vehicle = useVehicle(wid, vehicleId);
  const findings = useFindings(wid, vehicleId, {
    zone: zoneKey,
    deleted: showRemoved ? 'include' : undefined,
  });
  const restore = useRestoreFinding(wid);
  const canWrite = can(role, 'findings.write');

  if (vehicle.isPending) return <LoadingView label="Loading the zone…" />;
  if (vehicle.isError)
    return (
      <Screen title="Zone history">
        <ErrorView error={vehicle.error} onRetry={() => vehicle.refetch()} />
      </Screen>
    );
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  const zone = plan ? getZone(plan, zoneKey) : undefined;

  const restoreOne = (f: FindingResponse) =>
    restore.mutateAsync(f.id).then(
      () => toast.show('Finding restored', { kind: 'success' }),
      (e) => toast.show(cleanError(e), { kind: 'error' }),
    );

  return (
    <Screen
      title={zone ? `${zone.label}: history` : 'Zone history'}
      subtitle={vehicleTitle(vehicle.data)}
      testID="zone-history-screen"
      actions={
        <Button
          label="Back to the diagram"
          variant="secondary"
          compact
          onPress={() => goBack(`/vehicles/${vehicleId}`)}
        />
      }
    >
      {zone ? (
        <AppText muted>
          {TRADE_NAME_LABELS[zone.tradeName]} · {STRUCTURAL_CLASS_LABELS[zone.structuralClass]}
        </AppText>
      ) : null}
      <View style={styles.toggle}>
        <Checkbox
          label="Show removed findings"
          checked={showRemoved}
          onChange={setShowRemoved}
          testID="history-show-removed"
        />
      </View>
      {findings.isPending ? (
        <LoadingView label="Loading findings…" />
      ) : findings.isError ? (
        <ErrorView error={findings.error} onRetry={() => findings.refetch()} />
      ) : findings.data.length === 0 ? (
        <EmptyState
          title="Nothing recorded for this zone"
          message={
            showRemoved
              ? 'No findings, open or removed.'
              : 'No open findings. Removed ones show with the box above.'
          }
        />
      ) : (
        <ZoneHistoryList
          findings={findings.data}
          onEdit={
            canWrite
              ? (f) =>
                  router.push({
                    pathname: '/vehicles/[vehicleId]/findings/[findingId]',
                    params: { vehicleId, findingId: f.id },
                  })
              : undefined
          }
          onRestore={canWrite ? restoreOne : undefined}
          restoringId={restore.isPending ? (restore.variables ?? null) : null}
        />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  toggle: { gap: spacing.sm },
});
