import { useLocalSearchParams } from 'expo-router';
import { ApiRequestError } from '@/src/api/client';
import { usePublicShare } from '@/src/api/public';
import { PublicFrame } from '@/src/components/reports/public-frame';
import { PublicSummary } from '@/src/components/reports/public-summary';
import { AppText, ErrorView, LoadingView } from '@/src/components/ui';

/**
 * A shared report, for anyone holding the link (no session). An unknown, expired or withdrawn
 * link gets one calm page that says nothing about why.
 */
export default function SharedReport() {
  const { token } = useLocalSearchParams<{ token: string }>();
  const share = usePublicShare(token ?? '');

  if (share.isPending)
    return (
      <PublicFrame testID="shared-screen">
        <LoadingView label="Opening the report…" />
      </PublicFrame>
    );
  if (share.isError) {
    const gone = share.error instanceof ApiRequestError && share.error.status === 404;
    return (
      <PublicFrame testID="shared-screen">
        {gone ? (
          <>
            <AppText variant="heading" accessibilityRole="header" testID="shared-unavailable">
              This link is no longer available
            </AppText>
            <AppText muted>
              If you still need the report, ask the workshop that sent it for a new link.
            </AppText>
          </>
        ) : (
          <ErrorView error={share.error} onRetry={() => share.refetch()} />
        )}
      </PublicFrame>
    );
  }
  return (
    <PublicFrame testID="shared-screen">
      <PublicSummary share={share.data} />
    </PublicFrame>
  );
}
