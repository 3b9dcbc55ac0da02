import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ShareResponse } from '@/shared/schemas/report';
import { cleanError } from '@/src/api/client';
import { useRevokeShare, useShares } from '@/src/api/reports';
import { AppText, Badge, Button, ConfirmDialog, ErrorView, useToast } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { SHARE_STATUS_LABELS, SHARE_STATUS_TONES } from './labels';
import { formatDay, formatMoment } from '@/src/format/dates';

/** Every link made for one report: who it went to, until when, how often it was opened. */
export function ShareList({
  wid,
  reportId,
  canRevoke,
}: {
  wid: string;
  reportId: string;
  canRevoke: boolean;
}) {
  const shares = useShares(wid, reportId);
  const revoke = useRevokeShare(wid, reportId);
  const toast = useToast();
  const [asking, setAsking] = useState<ShareResponse | null>(null);

  if (shares.isError) return <ErrorView error={shares.error} onRetry={() => shares.refetch()} />;
  const items = shares.data ?? [];
  return (
    <View style={styles.wrap} testID="share-list">
      <AppText variant="title" accessibilityRole="header">
        Links to this report
      </AppText>
      {shares.isPending ? <AppText muted>Loading the links…</AppText> : null}
      {!shares.isPending && items.length === 0 ? (
        <AppText muted testID="share-list-empty">
          No links yet.
        </AppText>
      ) : null}
      {items.map((s) => (
        <View key={s.id} style={styles.row} testID={`share-row-${s.id}`}>
          <View style={styles.line}>
            <Badge
              label={SHARE_STATUS_LABELS[s.status]}
              tone={SHARE_STATUS_TONES[s.status]}
              testID={`share-status-${s.id}`}
            />
            <AppText variant="label" style={styles.grow}>
              {s.recipientEmail ?? 'Link without e-mail'}
            </AppText>
          </View>
          <AppText variant="caption">
            Made {formatDay(s.createdAt)}
            {s.createdByName ? ` by ${s.createdByName}` : ''} ·{' '}
            {s.revokedAt
              ? `withdrawn ${formatDay(s.revokedAt)}`
              : `${s.status === 'expired' ? 'expired' : 'open until'} ${formatDay(s.expiresAt)}`}
          </AppText>
          <AppText variant="caption" testID={`share-views-${s.id}`}>
            {s.viewCount === 1 ? 'Opened once' : `Opened ${s.viewCount} times`}
            {s.lastViewedAt ? `, last on ${formatMoment(s.lastViewedAt)}` : ''}
            {' · '}
            {s.downloadCount === 0
              ? 'PDF not downloaded'
              : `PDF downloaded ${s.downloadCount === 1 ? 'once' : `${s.downloadCount} times`}`}
          </AppText>
          {canRevoke && s.status === 'active' ? (
            <Button
              label="Withdraw link"
              variant="secondary"
              compact
              onPress={() => setAsking(s)}
              testID={`share-revoke-${s.id}`}
            />
          ) : null}
        </View>
      ))}
      <ConfirmDialog
        visible={!!asking}
        title="Withdraw this link?"
        message={`${asking?.recipientEmail ?? 'Whoever has the link'} will no longer be able to open the report. This cannot be undone; make a new link if they need it again.`}
        confirmLabel="Withdraw"
        busy={revoke.isPending}
        onCancel={() => setAsking(null)}
        onConfirm={() =>
          asking &&
          revoke.mutate(asking.id, {
            onSuccess: () => toast.show('Link withdrawn.', { kind: 'success' }),
            onError: (e) => toast.show(cleanError(e), { kind: 'error' }),
            onSettled: () => setAsking(null),
          })
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  row: {
    gap: spacing.xs,
    paddingVertical: spacing.md,
    borderTopWidth: 1,
    borderTopColor: colors.line,
    alignItems: 'flex-start',
  },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  grow: { flexShrink: 1 },
});
