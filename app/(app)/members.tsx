import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { can, ROLE_LABELS, ROLES } from '@/shared/roles';
import type { MemberResponse } from '@/shared/schemas';
import { cleanError } from '@/src/api/client';
import { useChangeMemberRole, useMembers, useRemoveMember } from '@/src/api/members';
import { InvitationList } from '@/src/components/members/invitation-list';
import { InviteForm } from '@/src/components/members/invite-form';
import { MemberRow } from '@/src/components/members/member-row';
import {
  AppText,
  ConfirmDialog,
  EmptyState,
  ErrorView,
  LoadingView,
  Screen,
  useToast,
} from '@/src/components/ui';
import { useRole, useSession, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';

export default function Members() {
  const wid = useWorkshopId();
  const role = useRole();
  const { user, active } = useSession();
  const toast = useToast();
  const canRead = can(role, 'members.read');
  const canManage = can(role, 'members.manage');
  const members = useMembers(wid, { enabled: canRead });
  const changeRole = useChangeMemberRole(wid);
  const remove = useRemoveMember(wid);
  const [removing, setRemoving] = useState<MemberResponse | null>(null);

  if (!canRead)
    return (
      <Screen title="Team">
        <EmptyState
          title="Not available"
          message="Your role in this workshop does not show the member list."
        />
      </Screen>
    );

  function list() {
    if (members.isPending) return <LoadingView label="Loading members…" />;
    if (members.isError)
      return <ErrorView error={members.error} onRetry={() => members.refetch()} />;
    // Owners first, then by role as the table lists them, then by name.
    const sorted = [...members.data].sort(
      (a, b) => ROLES.indexOf(a.role) - ROLES.indexOf(b.role) || a.name.localeCompare(b.name),
    );
    return (
      <View style={styles.list} accessibilityRole="list">
        {sorted.map((m) => (
          <MemberRow
            key={m.id}
            member={m}
            isSelf={m.userId === user?.id}
            canManage={canManage}
            changing={changeRole.isPending}
            onChangeRole={(next) =>
              changeRole.mutate(
                { memberId: m.id, role: next },
                {
                  onSuccess: () =>
                    toast.show(`${m.name} is now ${ROLE_LABELS[next].toLowerCase()}.`, {
                      kind: 'success',
                    }),
                  onError: (e) => toast.show(cleanError(e), { kind: 'error' }),
                },
              )
            }
            onRemove={() => setRemoving(m)}
          />
        ))}
      </View>
    );
  }

  return (
    <Screen title="Team" subtitle={active?.workshopName} testID="members-screen">
      {list()}
      {canManage ? (
        <>
          <InviteForm workshopId={wid} />
          <InvitationList workshopId={wid} />
        </>
      ) : (
        <AppText muted>Only the workshop owner invites people and changes roles.</AppText>
      )}
      <ConfirmDialog
        visible={!!removing}
        title={`Remove ${removing?.name ?? ''}?`}
        message="They lose access to this workshop at once. Their surveys and findings stay, under their name."
        confirmLabel="Remove"
        busy={remove.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => {
          const m = removing;
          if (!m) return;
          remove.mutate(m.id, {
            onSuccess: () =>
              toast.show(`${m.name} removed from the workshop.`, { kind: 'success' }),
            onError: (e) => toast.show(cleanError(e), { kind: 'error' }),
            onSettled: () => setRemoving(null),
          });
        }}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
