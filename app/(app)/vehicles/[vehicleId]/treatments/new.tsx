import { router, useLocalSearchParams } from 'expo-router';
import { getBodyPlan } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { useZoneStates } from '@/src/api/treatments';
import { useVehicle } from '@/src/api/vehicles';
import { useWorkshopSettings } from '@/src/api/workshops';
import { zoneStateMap } from '@/src/components/treatments/zone-state-map';
import { TreatmentEditor } from '@/src/components/treatments/treatment-editor';
import { EmptyState, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useSession, useWorkshopId } from '@/src/hooks/use-session';

/** Record a treatment: `zone` (optional, comma-separated) preselects zones. */
export default function NewTreatment() {
  const p = useLocalSearchParams<{ vehicleId: string; zone?: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const { user } = useSession();
  const vehicle = useVehicle(wid, p.vehicleId);
  const settings = useWorkshopSettings(wid);
  const states = useZoneStates(wid, p.vehicleId);

  if (vehicle.isPending || settings.isPending) return <LoadingView label="Opening the form…" />;
  if (vehicle.isError || settings.isError)
    return (
      <Screen title="Record a treatment">
        <ErrorView
          error={vehicle.error ?? settings.error}
          onRetry={() => (vehicle.isError ? vehicle.refetch() : settings.refetch())}
        />
      </Screen>
    );
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  return (
    <Screen
      title="Record a treatment"
      subtitle={vehicleTitle(vehicle.data)}
      testID="treatment-new-screen"
    >
      {!can(role, 'treatments.write') ? (
        <EmptyState
          title="Your role cannot record treatments"
          message="Ask an applicator, an inspector or the workshop owner."
        />
      ) : !plan ? (
        <EmptyState
          title="This body style cannot be drawn"
          message="Its body plan is not in this version of Soundframe."
        />
      ) : (
        <TreatmentEditor
          wid={wid}
          plan={plan}
          mode={{
            kind: 'new',
            vehicleId: p.vehicleId,
            applicatorName: user?.name ?? '',
            zoneKeys: p.zone
              ? p.zone.split(',').filter((z) => plan.zones.some((x) => x.key === z))
              : [],
          }}
          regulatoryNotes={settings.data.treatments?.regulatoryNotes ?? ''}
          region={settings.data.region || undefined}
          zoneStates={zoneStateMap(states.data)}
          onDone={(t) =>
            router.replace({
              pathname: '/vehicles/[vehicleId]/treatments/[treatmentId]',
              params: { vehicleId: p.vehicleId, treatmentId: t.id },
            })
          }
        />
      )}
    </Screen>
  );
}
