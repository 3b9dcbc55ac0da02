import { can } from '@/shared/roles';
import { useWorkshop } from '@/src/api/workshops';
import { SettingsEditor } from '@/src/components/settings/settings-editor';
import { SettingsView } from '@/src/components/settings/settings-view';
import { AppText, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';

/** Workshop settings: the owner edits them, everyone else reads what the estimates use. */
export default function Settings() {
  const wid = useWorkshopId();
  const role = useRole();
  const workshop = useWorkshop(wid);

  if (workshop.isPending) return <LoadingView label="Loading the settings…" />;
  if (workshop.isError)
    return (
      <Screen title="Settings">
        <ErrorView error={workshop.error} onRetry={() => workshop.refetch()} />
      </Screen>
    );
  const w = workshop.data;
  return (
    <Screen title="Settings" subtitle={w.name} testID="settings-screen">
      {can(role, 'workshop.update') ? (
        // A settings change saved elsewhere starts the form afresh once it is loaded.
        <SettingsEditor key={JSON.stringify(w.settings)} wid={wid} settings={w.settings} />
      ) : (
        <>
          <AppText muted>Only the workshop owner changes these.</AppText>
          <SettingsView settings={w.settings} />
        </>
      )}
    </Screen>
  );
}
