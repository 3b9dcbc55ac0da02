import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { Linking, StyleSheet, View } from 'react-native';
import { getBodyPlan, zoneLabel } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { RECHECK_STATUS_LABELS } from '@/shared/schemas/recheck';
import { recheckCalendarUrl, useVehicleRechecks } from '@/src/api/rechecks';
import { useVehicle } from '@/src/api/vehicles';
import { goBack } from '@/src/components/nav/go-back';
import { RecheckAssignee } from '@/src/components/rechecks/recheck-assignee';
import { RecheckMoveForm } from '@/src/components/rechecks/recheck-move-form';
import { RecheckResultForm } from '@/src/components/rechecks/recheck-result-form';
import {
  AppText,
  Button,
  Card,
  EmptyState,
  ErrorView,
  LoadingView,
  Screen,
} from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';
import { formatDay, formatLongDay } from '@/src/format/dates';

/** One re-check: what is due where, its calendar file, and recording the result or moving it. */
export default function RecheckScreen() {
  const p = useLocalSearchParams<{ vehicleId: string; recheckId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const vehicle = useVehicle(wid, p.vehicleId);
  const rechecks = useVehicleRechecks(wid, p.vehicleId);
  const [moving, setMoving] = useState(false);
  const back = () => goBack(`/vehicles/${p.vehicleId}`);

  if (vehicle.isPending || rechecks.isPending) return <LoadingView label="Loading the re-check…" />;
  if (vehicle.isError || rechecks.isError)
    return (
      <Screen title="Re-check">
        <ErrorView
          error={vehicle.error ?? rechecks.error}
          onRetry={() => (vehicle.isError ? vehicle.refetch() : rechecks.refetch())}
        />
      </Screen>
    );
  const r = rechecks.data.find((x) => x.id === p.recheckId);
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  if (!r || !plan)
    return (
      <Screen title="Re-check">
        <EmptyState
          title="Re-check not found"
          message="It may belong to another vehicle, or the body plan is not in this version."
        />
      </Screen>
    );
  const zones = r.zoneKeys.map((k) => zoneLabel(plan, k)).join(', ');
  const canWrite = can(role, 'rechecks.write') && r.status === 'pending';

  return (
    <Screen title="Re-check" subtitle={vehicleTitle(vehicle.data)} testID="recheck-screen">
      <Card>
        <AppText variant="label" testID="recheck-due">
          Due {formatLongDay(r.dueDate)}
        </AppText>
        <AppText testID="recheck-zones">{zones}</AppText>
        <AppText variant="caption" muted>
          {r.assigneeName ? `Assigned to ${r.assigneeName}` : 'Not assigned'}
        </AppText>
        <AppText variant="caption" testID="recheck-status">
          {RECHECK_STATUS_LABELS[r.status]}
          {r.completedAt
            ? `, ${formatDay(r.completedAt)} by ${r.completedByName ?? 'unknown'}`
            : ''}
        </AppText>
        {r.moveReason ? (
          <AppText variant="caption" muted>
            Moved: {r.moveReason}
          </AppText>
        ) : null}
        {r.notes ? <AppText variant="caption">Notes: {r.notes}</AppText> : null}
      </Card>
      <View style={styles.actions}>
        <Button
          label="Add to calendar (.ics)"
          variant="secondary"
          compact
          onPress={() => Linking.openURL(recheckCalendarUrl(wid, r.id))}
          testID="recheck-calendar"
        />
        <Button
          label="The treatment"
          variant="secondary"
          compact
          onPress={() =>
            router.push({
              pathname: '/vehicles/[vehicleId]/treatments/[treatmentId]',
              params: { vehicleId: p.vehicleId, treatmentId: r.treatmentId },
            })
          }
          testID="recheck-treatment"
        />
        {canWrite && !moving ? (
          <Button
            label="Move"
            variant="ghost"
            compact
            onPress={() => setMoving(true)}
            testID="recheck-move"
          />
        ) : null}
      </View>
      {canWrite && can(role, 'members.read') ? <RecheckAssignee wid={wid} recheck={r} /> : null}
      {canWrite && moving ? (
        <RecheckMoveForm wid={wid} recheck={r} onDone={() => setMoving(false)} />
      ) : null}
      {canWrite ? <RecheckResultForm wid={wid} plan={plan} recheck={r} onDone={back} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
