import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { can } from '@/shared/roles';
import { REPORT_KIND_LABELS } from '@/shared/schemas/report';
import { useReport } from '@/src/api/reports';
import { DownloadLink } from '@/src/components/reports/download-link';
import { pdfFileName, STATUS_LABELS } from '@/src/components/reports/labels';
import { ShareForm } from '@/src/components/reports/share-form';
import { ShareList } from '@/src/components/reports/share-list';
import { AppText, ErrorView, LoadingView, Screen } from '@/src/components/ui';
import { useBreakpoint } from '@/src/hooks/use-breakpoint';
import { useRole, useWorkshopId } from '@/src/hooks/use-session';
import { spacing } from '@/src/theme';
import { formatDay } from '@/src/format/dates';

/** One report version: its download, a form to share it and the links already made. */
export default function ReportScreen() {
  const { reportId } = useLocalSearchParams<{ vehicleId: string; reportId: string }>();
  const wid = useWorkshopId();
  const role = useRole();
  const { wide } = useBreakpoint();
  const report = useReport(wid, reportId);

  if (report.isPending) return <LoadingView label="Loading the report…" />;
  if (report.isError)
    return (
      <Screen title="Report">
        <ErrorView error={report.error} onRetry={() => report.refetch()} />
      </Screen>
    );
  const r = report.data;
  const canShare = can(role, 'reports.share');
  return (
    <Screen
      title={REPORT_KIND_LABELS[r.kind]}
      subtitle={`${r.summary?.vehicleTitle ?? ''} · version ${r.version} · ${r.shortId} · ${formatDay(r.createdAt)}`}
      maxWidth={wide ? 1200 : 880}
      testID="report-screen"
      actions={
        r.pdfUrl && r.status === 'ready' ? (
          <DownloadLink
            url={r.pdfUrl}
            fileName={pdfFileName(r.shortId, r.kind, r.version)}
            compact
            testID="report-screen-download"
          />
        ) : null
      }
    >
      {r.status !== 'ready' ? (
        <AppText testID="report-screen-status">
          {STATUS_LABELS[r.status]}. It can be shared once it is ready.
        </AppText>
      ) : null}
      {!r.latest ? (
        <AppText variant="label" testID="report-screen-older">
          A newer version of this report exists. People you share this one with are told so.
        </AppText>
      ) : null}
      <View style={[styles.split, wide && styles.splitWide]}>
        {canShare && r.status === 'ready' ? (
          <View style={wide ? styles.pane : undefined}>
            <ShareForm wid={wid} reportId={r.id} />
          </View>
        ) : null}
        {canShare ? (
          <View style={wide ? styles.pane : undefined}>
            <ShareList wid={wid} reportId={r.id} canRevoke />
          </View>
        ) : null}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  split: { gap: spacing.xl },
  splitWide: { flexDirection: 'row', alignItems: 'flex-start' },
  pane: { flex: 1, minWidth: 0 },
});
