import { useLocalSearchParams } from 'expo-router';
import { getBodyPlan } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { cleanError } from '@/src/api/client';
import { useFinding, useRestoreFinding } from '@/src/api/findings';
import { useSurveys } from '@/src/api/surveys';
import { useVehicle } from '@/src/api/vehicles';
import { useWorkshopSettings } from '@/src/api/workshops';
import { FindingCard } from '@/src/components/findings/finding-card';
import { FindingEditor } from '@/src/components/findings/finding-editor';
import { goBack } from '@/src/components/nav/go-back';
import { EmptyState, ErrorView, LoadingView, Screen, useToast } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

/** Edit one finding (sends the loaded `version`; a stale one is refused and offered a reload). */
export default function EditFinding() {
  const { vehicleId, findingId } = useLocalSearchParams<{ vehicleId: string; findingId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const vehicle = useVehicle(wid, vehicleId);
  const finding = useFinding(wid, findingId);
  // The shop climate of the finding's survey feeds the moisture panel; a failed list only loses that.
  const surveys = useSurveys(wid, vehicleId);
  const settings = useWorkshopSettings(wid);
  const restore = useRestoreFinding(wid);
  const toast = useToast();
  const back = () => goBack(`/vehicles/${vehicleId}`);

  if (vehicle.isPending || finding.isPending || surveys.isPending)
    return <LoadingView label="Loading the finding…" />;
  if (vehicle.isError || finding.isError)
    return (
      <Screen title="Edit finding">
        <ErrorView
          error={vehicle.error ?? finding.error}
          onRetry={() => (vehicle.isError ? vehicle.refetch() : finding.refetch())}
        />
      </Screen>
    );
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  const f = finding.data;
  const canWrite = can(role, 'findings.write');
  // Read-only roles, and removed findings, see the record rather than a form.
  if (!canWrite || f.deletedAt)
    return (
      <Screen title="Finding" subtitle={vehicleTitle(vehicle.data)} testID="finding-view-screen">
        <FindingCard
          finding={f}
          detail="full"
          restoring={restore.isPending}
          onRestore={
            canWrite
              ? () =>
                  restore.mutateAsync(f.id).then(
                    () => toast.show('Finding restored', { kind: 'success' }),
                    (e) => toast.show(cleanError(e), { kind: 'error' }),
                  )
              : undefined
          }
        />
      </Screen>
    );
  return (
    <Screen title="Edit finding" subtitle={vehicleTitle(vehicle.data)} testID="finding-edit-screen">
      {!plan ? (
        <EmptyState
          title="This body style cannot be drawn"
          message="Its body plan is not in this version of Soundframe."
        />
      ) : (
        <FindingEditor
          // The form starts from the loaded record; it is not re-seeded by background refetches.
          key={f.id}
          wid={wid}
          plan={plan}
          role={role}
          mode={{ kind: 'edit', finding: f }}
          climate={surveys.data?.find((s) => s.id === f.surveyId) ?? null}
          units={settings.data?.units}
          onDone={back}
          onDeleted={back}
        />
      )}
    </Screen>
  );
}
