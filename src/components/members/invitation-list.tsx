import { StyleSheet, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/roles';
import { cleanError } from '@/src/api/client';
import { useInvitations, useRevokeInvitation } from '@/src/api/invitations';
import { AppText, Button, Card, ErrorView, LoadingView, useToast } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { formatDay } from '@/src/format/dates';

/** Invitations not yet accepted, newest first, each revocable. */
export function InvitationList({ workshopId }: { workshopId: string }) {
  const toast = useToast();
  const invitations = useInvitations(workshopId);
  const revoke = useRevokeInvitation(workshopId);

  if (invitations.isPending) return <LoadingView label="Loading invitations…" />;
  if (invitations.isError)
    return <ErrorView error={invitations.error} onRetry={() => invitations.refetch()} />;
  // Judged against when the list arrived, so rendering stays pure.
  const now = invitations.dataUpdatedAt;
  const pending = invitations.data
    .filter((i) => !i.acceptedAt)
    .sort((a, b) => b.createdAt.localeCompare(a.createdAt));

  return (
    <View style={styles.wrap} testID="invitation-list">
      <AppText variant="title" accessibilityRole="header">
        Waiting for an answer
      </AppText>
      {pending.length === 0 ? <AppText muted>No open invitations.</AppText> : null}
      {pending.map((inv) => {
        const expired = Date.parse(inv.expiresAt) < now;
        return (
          <Card key={inv.id} testID={`invitation-${inv.id}`}>
            <AppText variant="label">{inv.email}</AppText>
            <AppText variant="caption" muted>
              {ROLE_LABELS[inv.role]} · invited by {inv.invitedBy} ·{' '}
              {expired
                ? `expired ${formatDay(inv.expiresAt)}`
                : `valid until ${formatDay(inv.expiresAt)}`}
            </AppText>
            <View style={styles.actions}>
              <Button
                label={expired ? 'Clear' : 'Revoke'}
                variant="ghost"
                compact
                loading={revoke.isPending && revoke.variables === inv.id}
                accessibilityLabel={`Revoke the invitation to ${inv.email}`}
                onPress={() =>
                  revoke.mutate(inv.id, {
                    onSuccess: () =>
                      toast.show(`Invitation to ${inv.email} withdrawn.`, { kind: 'success' }),
                    onError: (e) => toast.show(cleanError(e), { kind: 'error' }),
                  })
                }
                testID={`invitation-${inv.id}-revoke`}
              />
            </View>
          </Card>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  actions: { flexDirection: 'row', justifyContent: 'flex-end' },
});
