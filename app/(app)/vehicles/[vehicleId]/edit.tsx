import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { updateVehicleRequest } from '@/shared/schemas';
import { can } from '@/shared/roles';
import { ApiRequestError, cleanError } from '@/src/api/client';
import {
  useDeleteVehicle,
  useRestoreVehicle,
  useUpdateVehicle,
  useVehicle,
} from '@/src/api/vehicles';
import { goBack } from '@/src/components/nav/go-back';
import {
  AppText,
  Button,
  Card,
  ConfirmDialog,
  ErrorView,
  LoadingView,
  Screen,
  useFormSubmit,
  useToast,
} from '@/src/components/ui';
import { VehicleForm, vehicleToForm } from '@/src/components/vehicles/vehicle-form';
import { vehicleTitle } from '@/src/components/vehicles/vehicle-labels';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

export default function EditVehicle() {
  const { vehicleId } = useLocalSearchParams<{ vehicleId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const toast = useToast();
  const vehicle = useVehicle(wid, vehicleId);
  const update = useUpdateVehicle(wid, vehicleId);
  const remove = useDeleteVehicle(wid);
  const restore = useRestoreVehicle(wid);
  const [confirming, setConfirming] = useState(false);
  const [stale, setStale] = useState(false);
  const back = () => goBack(`/vehicles/${vehicleId}`);

  const form = useFormSubmit(updateVehicleRequest, async (body) => {
    try {
      await update.mutateAsync(body);
    } catch (e) {
      setStale(e instanceof ApiRequestError && e.status === 409);
      throw e;
    }
    toast.show('Changes saved.', { kind: 'success' });
    back();
  });

  if (vehicle.isPending) return <LoadingView label="Loading the vehicle…" />;
  if (vehicle.isError)
    return (
      <Screen title="Edit vehicle">
        <ErrorView error={vehicle.error} onRetry={() => vehicle.refetch()} />
      </Screen>
    );
  const v = vehicle.data;
  const title = vehicleTitle(v);

  async function reload() {
    await vehicle.refetch();
    setStale(false);
    form.setMessage(null);
  }

  async function confirmDelete() {
    try {
      await remove.mutateAsync(v.id);
    } catch (e) {
      setConfirming(false);
      toast.show(cleanError(e), { kind: 'error' });
      return;
    }
    setConfirming(false);
    toast.show(`${title} removed.`, {
      kind: 'info',
      action: {
        label: 'Undo',
        onPress: () =>
          restore.mutateAsync(v.id).then(
            () => toast.show(`${title} restored.`, { kind: 'success' }),
            (e) => toast.show(cleanError(e), { kind: 'error' }),
          ),
      },
    });
    router.dismissTo('/vehicles');
  }

  return (
    <Screen title="Edit vehicle" subtitle={title} testID="edit-vehicle-screen">
      {stale ? (
        <Card testID="stale-version">
          <AppText variant="label">Someone else saved this vehicle while you were editing.</AppText>
          <AppText>
            Reload to see their version; your unsaved changes here will be replaced.
          </AppText>
          <Button
            label="Reload their version"
            variant="secondary"
            onPress={reload}
            testID="reload-vehicle"
          />
        </Card>
      ) : null}
      <VehicleForm
        // A new version from the server starts the form afresh from it.
        key={v.version}
        initial={vehicleToForm(v)}
        submitLabel="Save changes"
        onSubmit={(body) => form.submit({ ...body, version: v.version })}
        onCancel={back}
        errors={form.errors}
        message={stale ? null : form.message}
        busy={form.busy}
      />
      {can(role, 'vehicles.delete') ? (
        <View style={styles.danger}>
          <AppText variant="label">Remove this vehicle</AppText>
          <AppText muted>
            It leaves the list with its surveys and findings; an owner can restore it later.
          </AppText>
          <Button
            label="Remove vehicle"
            variant="danger"
            onPress={() => setConfirming(true)}
            testID="delete-vehicle"
          />
        </View>
      ) : null}
      <ConfirmDialog
        visible={confirming}
        title={`Remove ${title}?`}
        message="The vehicle and its survey records are hidden from everyone in the workshop until an owner restores it."
        confirmLabel="Remove"
        busy={remove.isPending}
        onConfirm={confirmDelete}
        onCancel={() => setConfirming(false)}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  danger: { gap: spacing.sm, marginTop: spacing.xl, alignItems: 'flex-start' },
});
