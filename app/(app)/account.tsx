import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/roles';
import { cleanError } from '@/src/api/client';
import { setRemindersEnabled } from '@/src/api/rechecks';
import { WorkshopSwitcher } from '@/src/components/nav/workshop-switcher';
import {
  AppText,
  Button,
  Card,
  Checkbox,
  FormMessage,
  Screen,
  useToast,
} from '@/src/components/ui';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useSession } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

export default function Account() {
  const { user, active, signOut, refresh } = useSession();
  const toast = useToast();
  const [reminders, setReminders] = useState<boolean | null>(null);
  const remindersOn = reminders ?? user?.remindersEnabled ?? true;

  async function toggleReminders(on: boolean) {
    setReminders(on);
    try {
      await setRemindersEnabled(on);
      await refresh();
      toast.show(on ? 'Reminder e-mails on' : 'Reminder e-mails off', { kind: 'success' });
    } catch (e) {
      setReminders(!on);
      toast.show(cleanError(e), { kind: 'error' });
    }
  }
  const { wide } = useBreakpoint();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function leave() {
    setBusy(true);
    setError(null);
    try {
      // The signed-in layout sends the browser to sign-in once the session is gone.
      await signOut();
    } catch (e) {
      setError(cleanError(e));
      setBusy(false);
    }
  }

  return (
    <Screen title="Account" testID="account-screen">
      <Card>
        <Row label="Name" value={user?.name ?? ''} />
        <Row label="E-mail" value={user?.email ?? ''} />
        <Row label="Workshop" value={active?.workshopName ?? ''} />
        <Row label="Role" value={active ? ROLE_LABELS[active.role] : ''} />
      </Card>
      <Card>
        <Checkbox
          label="E-mail me a digest of my re-checks that are due or overdue"
          description="Sent for the re-checks assigned to you. Turn it off to get no reminders."
          checked={remindersOn}
          onChange={toggleReminders}
          testID="account-reminders"
        />
      </Card>
      {/* The side navigation carries the switcher on wide screens. */}
      {wide ? null : <WorkshopSwitcher />}
      <FormMessage message={error} />
      <View style={styles.actions}>
        <Button
          label="Sign out"
          variant="secondary"
          onPress={leave}
          loading={busy}
          testID="sign-out"
        />
      </View>
    </Screen>
  );
}

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.row}>
      <AppText variant="caption" muted style={styles.rowLabel}>
        {label}
      </AppText>
      <AppText style={styles.rowValue}>{value}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, paddingVertical: spacing.xs },
  rowLabel: { width: 90 },
  rowValue: { flex: 1, minWidth: 160 },
  actions: { flexDirection: 'row' },
});
