import { router, useLocalSearchParams } from 'expo-router';
import { useRepairPlan } from '@/src/api/repair-plan';
import { useVehicle } from '@/src/api/vehicles';
import { RepairPlanView } from '@/src/components/plan/repair-plan-view';
import { ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useWorkshopId } from '@/src/hooks/use-session';

/** The repair scope as it stands now: what must be fixed, what is cosmetic, timber to buy. */
export default function RepairPlan() {
  const { vehicleId } = useLocalSearchParams<{ vehicleId: string }>();
  const wid = useWorkshopId();
  const { wide } = useBreakpoint();
  const vehicle = useVehicle(wid, vehicleId);
  const plan = useRepairPlan(wid, vehicleId);

  if (plan.isPending || vehicle.isPending)
    return <LoadingView label="Working out the repair plan…" />;
  if (plan.isError || vehicle.isError)
    return (
      <Screen title="Repair plan">
        <ErrorView
          error={plan.error ?? vehicle.error}
          onRetry={() => (plan.isError ? plan.refetch() : vehicle.refetch())}
        />
      </Screen>
    );
  return (
    <Screen
      title="Repair plan"
      subtitle={vehicleTitle(vehicle.data)}
      maxWidth={wide ? 1280 : 880}
      testID="plan-screen"
    >
      <RepairPlanView
        plan={plan.data}
        wide={wide}
        onOpenZone={(zoneKey) =>
          router.push(`/vehicles/${vehicleId}/decisions/${encodeURIComponent(zoneKey)}`)
        }
      />
    </Screen>
  );
}
