import { StyleSheet, View } from 'react-native';
import { isOutboxOff, useOutbox } from '@/src/api/outbox';
import { OutboxMessageCard } from '@/src/components/members/outbox-message';
import { EmptyState, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { spacing } from '@/src/theme';

/** Development only: the mail the local sink caught (invitations), newest first. */
export default function Outbox() {
  const outbox = useOutbox();

  function body() {
    if (outbox.isPending) return <LoadingView label="Loading mail…" />;
    if (outbox.isError && isOutboxOff(outbox.error))
      return (
        <EmptyState
          title="No outbox here"
          message="This server sends real e-mail, so there is no captured mail to show."
        />
      );
    if (outbox.isError) return <ErrorView error={outbox.error} onRetry={() => outbox.refetch()} />;
    if (!outbox.data.length)
      return (
        <EmptyState
          title="No mail yet"
          message="Invitations you send appear here within a few seconds."
        />
      );
    const items = [...outbox.data].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
    return (
      <View style={styles.list}>
        {items.map((m) => (
          <OutboxMessageCard key={m.id} message={m} />
        ))}
      </View>
    );
  }

  return (
    <Screen
      title="Mail"
      subtitle="Messages caught by the development mail sink. Nothing here leaves this machine."
      testID="outbox-screen"
    >
      {body()}
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
