import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { getBodyPlan } from '@/shared/body-plans';
import { createSurveyRequest } from '@/shared/schemas';
import { can } from '@/shared/roles';
import { newId } from '@/src/api/ids';
import { useCreateSurvey } from '@/src/api/surveys';
import { useVehicle } from '@/src/api/vehicles';
import { goBack } from '@/src/components/nav/go-back';
import {
  EmptyState,
  ErrorView,
  LoadingView,
  Screen,
  useFormSubmit,
  useToast,
} from '@/src/components/ui';
import { SurveyForm } from '@/src/components/vehicles/survey-form';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

export default function NewSurvey() {
  const { vehicleId } = useLocalSearchParams<{ vehicleId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const toast = useToast();
  const vehicle = useVehicle(wid, vehicleId);
  const create = useCreateSurvey(wid, vehicleId);
  // Kept across retries so a repeated save stays one survey.
  const [id] = useState(newId);
  const back = () => goBack(`/vehicles/${vehicleId}`);
  const form = useFormSubmit(createSurveyRequest, async (body) => {
    await create.mutateAsync({ ...body, id });
    toast.show('Survey started. Tap a zone to log what you find.', { kind: 'success' });
    back();
  });

  if (!can(role, 'surveys.write'))
    return (
      <Screen title="New survey">
        <EmptyState
          title="Not available"
          message="Your role in this workshop cannot record surveys."
        />
      </Screen>
    );
  if (vehicle.isPending) return <LoadingView label="Loading the vehicle…" />;
  if (vehicle.isError)
    return (
      <Screen title="New survey">
        <ErrorView error={vehicle.error} onRetry={() => vehicle.refetch()} />
      </Screen>
    );
  const zones = getBodyPlan(vehicle.data.bodyPlanKey)?.zones ?? [];
  return (
    <Screen title="New survey" subtitle={vehicleTitle(vehicle.data)} testID="new-survey-screen">
      <SurveyForm
        zones={[...zones].sort((a, b) => a.label.localeCompare(b.label))}
        onSubmit={form.submit}
        onCancel={back}
        errors={form.errors}
        message={form.message}
        busy={form.busy}
      />
    </Screen>
  );
}
