import { StyleSheet, View } from 'react-native';
import { REPORT_KIND_LABELS, type ReportKind, type ReportResponse } from '@/shared/schemas/report';
import { isGenerating } from '@/src/api/reports';
import { AppText, Badge, Button, Card, FormMessage } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { DownloadLink } from './download-link';
import {
  formatBytes,
  KIND_PURPOSE,
  pagesLabel,
  pdfFileName,
  STATUS_LABELS,
  STATUS_TONES,
} from './labels';
import { ProgressBar } from './progress-bar';
import { formatDay } from '@/src/format/dates';

type Props = {
  kind: ReportKind;
  /** This kind's versions, newest first. */
  versions: ReportResponse[];
  onGenerate?: () => void;
  generating?: boolean;
  error?: string | null;
  onShare?: (report: ReportResponse) => void;
};

/** One kind of report: what it is for, its newest version in full and the older ones below. */
export function ReportCard({ kind, versions, onGenerate, generating, error, onShare }: Props) {
  const [newest, ...older] = versions;
  const busy = generating || (newest ? isGenerating(newest) : false);
  return (
    <Card testID={`report-card-${kind}`} style={styles.card}>
      <View style={styles.head}>
        <View style={styles.headText}>
          <AppText variant="title" accessibilityRole="header">
            {REPORT_KIND_LABELS[kind]}
          </AppText>
          <AppText muted>{KIND_PURPOSE[kind]}</AppText>
        </View>
        {onGenerate ? (
          <Button
            label={newest ? 'Generate a new version' : 'Generate'}
            onPress={onGenerate}
            loading={generating}
            disabled={busy}
            compact
            testID={`report-generate-${kind}`}
          />
        ) : null}
      </View>
      <FormMessage message={error ?? null} testID={`report-error-${kind}`} />
      {newest ? (
        <Newest report={newest} onShare={onShare} />
      ) : (
        <AppText muted testID={`report-none-${kind}`}>
          No {REPORT_KIND_LABELS[kind].toLowerCase()} yet.
          {onGenerate ? ' Generate one from the latest survey and decisions.' : ''}
        </AppText>
      )}
      {older.length > 0 ? (
        <View style={styles.older} testID={`report-older-${kind}`}>
          <AppText variant="label">Earlier versions</AppText>
          {older.map((r) => (
            <View key={r.id} style={styles.olderRow} testID={`report-version-${r.id}`}>
              <AppText style={styles.grow}>
                Version {r.version} · {formatDay(r.createdAt)} · {r.shortId}
                {r.status !== 'ready' ? ` · ${STATUS_LABELS[r.status]}` : ''}
              </AppText>
              {r.pdfUrl && r.status === 'ready' ? (
                <DownloadLink
                  url={r.pdfUrl}
                  fileName={pdfFileName(r.shortId, r.kind, r.version)}
                  label="Download"
                  accessibilityLabel={`Download version ${r.version}`}
                  compact
                  testID={`report-download-${r.id}`}
                />
              ) : null}
            </View>
          ))}
        </View>
      ) : null}
    </Card>
  );
}

function Newest({
  report: r,
  onShare,
}: {
  report: ReportResponse;
  onShare?: (r: ReportResponse) => void;
}) {
  const kind = r.kind;
  const c = r.summary?.condition;
  return (
    <View style={styles.newest} testID={`report-newest-${kind}`}>
      <View style={styles.row}>
        <Badge
          label={STATUS_LABELS[r.status]}
          tone={STATUS_TONES[r.status]}
          testID={`report-status-${kind}`}
        />
        <AppText variant="caption" muted>
          Version {r.version} · started {formatDay(r.createdAt)}
          {r.createdByName ? ` by ${r.createdByName}` : ''}
        </AppText>
      </View>
      {isGenerating(r) ? (
        <ProgressBar progress={r.progress} stage={r.stage} testID={`report-progress-${kind}`} />
      ) : null}
      {r.status === 'failed' ? (
        <AppText style={styles.failed} accessibilityRole="alert" testID={`report-failed-${kind}`}>
          {r.error || 'The report could not be prepared.'} Generate it again to retry.
        </AppText>
      ) : null}
      {r.status === 'ready' ? (
        <>
          {c ? (
            <View style={styles.grade} testID={`report-grade-${kind}`}>
              <AppText variant="label">
                {c.gradeLabel} (grade {c.gradeRank} of 5)
              </AppText>
              <AppText variant="caption">{c.gradeText}</AppText>
            </View>
          ) : null}
          <AppText testID={`report-facts-${kind}`}>
            <AppText variant="label" testID={`report-shortid-${kind}`}>
              {r.shortId}
            </AppText>
            {' · '}
            {r.finishedAt ? formatDay(r.finishedAt) : formatDay(r.createdAt)}
            {r.byteSize ? ` · ${formatBytes(r.byteSize)}` : ''}
            {r.pageCount ? ` · ${pagesLabel(r.pageCount)}` : ''}
          </AppText>
          <View style={styles.row}>
            {r.pdfUrl ? (
              <DownloadLink
                url={r.pdfUrl}
                fileName={pdfFileName(r.shortId, r.kind, r.version)}
                testID={`report-download-${kind}`}
              />
            ) : null}
            {onShare ? (
              <Button
                label="Share"
                variant="secondary"
                onPress={() => onShare(r)}
                testID={`report-share-${kind}`}
              />
            ) : null}
          </View>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, alignItems: 'flex-start' },
  headText: { flex: 1, minWidth: 220, gap: spacing.xs },
  newest: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  grade: {
    gap: 2,
    padding: spacing.md,
    borderLeftWidth: 4,
    borderLeftColor: colors.timber,
    backgroundColor: colors.surfaceSunken,
  },
  failed: { color: colors.danger },
  older: {
    gap: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: colors.line,
    paddingTop: spacing.md,
  },
  olderRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1, minWidth: 200 },
});
