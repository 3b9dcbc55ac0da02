import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { getBodyPlan, zoneLabel } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { useVehicleRechecks } from '@/src/api/rechecks';
import { useTreatment } from '@/src/api/treatments';
import { useVehicle } from '@/src/api/vehicles';
import { useWorkshopSettings } from '@/src/api/workshops';
import { RecheckRow } from '@/src/components/rechecks/recheck-row';
import { TreatmentDetails } from '@/src/components/treatments/treatment-details';
import { TreatmentEditor } from '@/src/components/treatments/treatment-editor';
import { AppText, Button, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

/** One treatment record, its scheduled re-checks, and a correction (a new version) on demand. */
export default function TreatmentScreen() {
  const p = useLocalSearchParams<{ vehicleId: string; treatmentId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const vehicle = useVehicle(wid, p.vehicleId);
  const treatment = useTreatment(wid, p.treatmentId);
  const rechecks = useVehicleRechecks(wid, p.vehicleId);
  const settings = useWorkshopSettings(wid);
  const [correcting, setCorrecting] = useState(false);

  if (treatment.isPending || vehicle.isPending)
    return <LoadingView label="Loading the treatment…" />;
  if (treatment.isError || vehicle.isError)
    return (
      <Screen title="Treatment">
        <ErrorView
          error={treatment.error ?? vehicle.error}
          onRetry={() => (treatment.isError ? treatment.refetch() : vehicle.refetch())}
        />
      </Screen>
    );
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  const mine = (rechecks.data ?? [])
    .filter((r) => r.treatmentId === p.treatmentId)
    .sort((a, b) => a.dueDate.localeCompare(b.dueDate));

  return (
    <Screen
      title="Treatment"
      subtitle={vehicleTitle(vehicle.data)}
      testID="treatment-screen"
      actions={
        can(role, 'treatments.write') && !correcting && plan ? (
          <Button
            label="Correct this record"
            variant="secondary"
            compact
            onPress={() => setCorrecting(true)}
            testID="treatment-correct"
          />
        ) : null
      }
    >
      {correcting && plan ? (
        <TreatmentEditor
          wid={wid}
          plan={plan}
          mode={{ kind: 'correct', treatment: treatment.data }}
          regulatoryNotes={settings.data?.treatments?.regulatoryNotes ?? ''}
          region={settings.data?.region || undefined}
          onDone={() => setCorrecting(false)}
        />
      ) : (
        <TreatmentDetails treatment={treatment.data} plan={plan} />
      )}
      <AppText variant="title" accessibilityRole="header">
        Re-checks
      </AppText>
      {rechecks.isError ? (
        <ErrorView error={rechecks.error} onRetry={() => rechecks.refetch()} />
      ) : mine.length === 0 ? (
        <AppText muted>
          {rechecks.isPending ? 'Loading re-checks…' : 'No re-checks scheduled.'}
        </AppText>
      ) : (
        mine.map((r) => (
          <RecheckRow
            key={r.id}
            recheck={r}
            showVehicle={false}
            zoneLabel={(k) => zoneLabel(plan, k)}
            onPress={() =>
              router.push({
                pathname: '/vehicles/[vehicleId]/rechecks/[recheckId]',
                params: { vehicleId: p.vehicleId, recheckId: r.id },
              })
            }
          />
        ))
      )}
    </Screen>
  );
}
