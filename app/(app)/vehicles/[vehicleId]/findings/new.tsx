import { router, useLocalSearchParams } from 'expo-router';
import { getBodyPlan } from '@/shared/body-plans';
import { can } from '@/shared/roles';
import { useSurveys } from '@/src/api/surveys';
import { useVehicle } from '@/src/api/vehicles';
import { useWorkshopSettings } from '@/src/api/workshops';
import { FindingEditor } from '@/src/components/findings/finding-editor';
import { sortSurveys } from '@/src/components/findings/overview';
import { goBack } from '@/src/components/nav/go-back';
import { Button, EmptyState, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

/** Log a finding: `zone` preselected, `surveyId` (else the latest survey), pin from `view`, `x`, `y`. */
export default function NewFinding() {
  const p = useLocalSearchParams<{
    vehicleId: string;
    zone?: string;
    surveyId?: string;
    view?: string;
    x?: string;
    y?: string;
  }>();
  const wid = useWorkshopId();
  const role = useRole();
  const vehicle = useVehicle(wid, p.vehicleId);
  const surveys = useSurveys(wid, p.vehicleId);
  const settings = useWorkshopSettings(wid);
  const back = () => goBack(`/vehicles/${p.vehicleId}`);

  if (vehicle.isPending || surveys.isPending) return <LoadingView label="Opening the form…" />;
  if (vehicle.isError || surveys.isError)
    return (
      <Screen title="Log a finding">
        <ErrorView
          error={vehicle.error ?? surveys.error}
          onRetry={() => (vehicle.isError ? vehicle.refetch() : surveys.refetch())}
        />
      </Screen>
    );
  const plan = getBodyPlan(vehicle.data.bodyPlanKey);
  const surveyId = p.surveyId ?? sortSurveys(surveys.data)[0]?.id;
  const survey = surveys.data.find((s) => s.id === surveyId) ?? null;
  const x = Number(p.x);
  const y = Number(p.y);
  const pin = p.view && Number.isFinite(x) && Number.isFinite(y) ? { view: p.view, x, y } : null;

  return (
    <Screen title="Log a finding" subtitle={vehicleTitle(vehicle.data)} testID="finding-new-screen">
      {!can(role, 'findings.write') ? (
        <EmptyState
          title="Your role cannot log findings"
          message="Ask an inspector or the workshop owner."
        />
      ) : !plan ? (
        <EmptyState
          title="This body style cannot be drawn"
          message="Its body plan is not in this version of Soundframe."
        />
      ) : !surveyId ? (
        <EmptyState
          title="Start a survey first"
          message="Every finding belongs to a dated survey visit."
          action={
            <Button
              label="Start a survey"
              onPress={() => router.replace(`/vehicles/${p.vehicleId}/surveys/new`)}
            />
          }
        />
      ) : (
        <FindingEditor
          wid={wid}
          plan={plan}
          role={role}
          mode={{ kind: 'new', surveyId, zoneKey: p.zone ?? '', pin }}
          climate={survey}
          units={settings.data?.units}
          onDone={back}
        />
      )}
    </Screen>
  );
}
