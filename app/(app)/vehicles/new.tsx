import { router } from 'expo-router';
import { useState } from 'react';
import { createVehicleRequest } from '@/shared/schemas';
import { can } from '@/shared/roles';
import { newId } from '@/src/api/ids';
import { useCreateVehicle } from '@/src/api/vehicles';
import { goBack } from '@/src/components/nav/go-back';
import { EmptyState, Screen, useFormSubmit, useToast } from '@/src/components/ui';
import { VehicleForm, vehicleToForm } from '@/src/components/vehicles/vehicle-form';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

export default function NewVehicle() {
  const wid = useWorkshopId();
  const role = useRole();
  const toast = useToast();
  // One id for this form, kept across retries: a repeated create after a lost answer is still one vehicle.
  const [id] = useState(newId);
  const create = useCreateVehicle(wid);
  const form = useFormSubmit(createVehicleRequest, async (body) => {
    const vehicle = await create.mutateAsync({ ...body, id });
    toast.show(`${vehicleTitle(vehicle)} added.`, { kind: 'success' });
    router.replace(`/vehicles/${vehicle.id}`);
  });

  if (!can(role, 'vehicles.write'))
    return (
      <Screen title="Add a vehicle">
        <EmptyState
          title="Not available"
          message="Your role in this workshop cannot add vehicles."
        />
      </Screen>
    );
  return (
    <Screen
      title="Add a vehicle"
      subtitle="Year, make and model as written on the papers."
      testID="new-vehicle-screen"
    >
      <VehicleForm
        initial={vehicleToForm()}
        submitLabel="Add vehicle"
        onSubmit={form.submit}
        onCancel={() => goBack('/vehicles')}
        errors={form.errors}
        message={form.message}
        busy={form.busy}
      />
    </Screen>
  );
}
