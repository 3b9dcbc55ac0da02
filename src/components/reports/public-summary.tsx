import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { REPORT_KIND_LABELS, type PublicShareResponse } from '@/shared/schemas/report';
import { percent } from '@/shared/wood';
import { AppText, Card, Section } from '@/src/components/ui';
import { hours, money } from '@/src/components/wood/labels';
import { colors, fonts, spacing } from '@/src/theme';
import { DownloadLink } from './download-link';
import { formatBytes, pagesLabel, pdfFileName } from './labels';
import { ReportDiagram } from './report-diagram';
import { formatDay } from '@/src/format/dates';

/** A shared report as its reader sees it: the same numbers the PDF prints, read-only. */
export function PublicSummary({ share }: { share: PublicShareResponse }) {
  const { report: r, summary: s } = share;
  const c = s.condition;
  return (
    <View style={styles.wrap} testID="public-summary">
      <View style={styles.titles}>
        <AppText variant="caption" muted>
          {s.workshopName}
        </AppText>
        <AppText variant="heading" accessibilityRole="header" testID="public-vehicle">
          {s.vehicleTitle}
        </AppText>
        <AppText testID="public-report-line">
          {REPORT_KIND_LABELS[r.kind]} · version {r.version} · {formatDay(r.generatedAt)} ·{' '}
          <AppText variant="label">{r.shortId}</AppText>
        </AppText>
      </View>
      {r.newerVersionExists ? (
        <AppText
          variant="label"
          style={styles.notice}
          accessibilityRole="alert"
          testID="public-newer"
        >
          A newer version of this report exists. Ask the workshop for it before relying on this one.
        </AppText>
      ) : null}
      <Card testID="public-grade">
        <AppText variant="label">Overall condition</AppText>
        <AppText variant="title">
          {c.gradeLabel} (grade {c.gradeRank} of 5, 1 is best)
        </AppText>
        <AppText>{c.gradeText}</AppText>
        <AppText testID="public-primary">
          Primary structural members sound: {c.primarySound} of {c.primaryMembers} (
          {percent(c.primarySoundShare)})
        </AppText>
      </Card>
      {s.diagram ? (
        <Section gap="xs" title="Where the damage is" testID="public-diagram-section">
          <ReportDiagram diagram={s.diagram} />
        </Section>
      ) : null}
      <Section gap="xs" title="Must be fixed for the body to be safe" testID="public-must-fix">
        {s.mustFix.length === 0 ? (
          <AppText>
            No structural repair is listed in this report.
            {c.undecidedZones > 0
              ? ` ${c.undecidedZones === 1 ? 'One damaged zone still awaits' : `${c.undecidedZones} damaged zones still await`} the inspector's repair decision.`
              : ''}
          </AppText>
        ) : (
          s.mustFix.map((m, i) => (
            <AppText key={`${m.zoneLabel}-${i}`}>
              • {m.zoneLabel}: {m.verdictLabel}
            </AppText>
          ))
        )}
      </Section>
      <Section gap="xs" title="Insect attack and its treatment" testID="public-infestations">
        {s.infestations.length === 0 ? (
          <AppText>No active or recent insect attack recorded.</AppText>
        ) : (
          s.infestations.map((f, i) => (
            <AppText key={`${f.zoneLabel}-${i}`}>
              • {f.zoneLabel}: {f.stateLabel}
            </AppText>
          ))
        )}
      </Section>
      <Section gap="xs" title="Not inspected" testID="public-not-inspected">
        {s.notInspected.length === 0 ? (
          <AppText>Every area of the body was looked at.</AppText>
        ) : (
          s.notInspected.map((n, i) => (
            <AppText key={`${n.date}-${i}`}>
              • {n.what} ({formatDay(n.date)})
            </AppText>
          ))
        )}
        <AppText variant="caption" muted>
          A visual, non-destructive survey cannot see inside members or behind panels that stay
          fitted.
        </AppText>
      </Section>
      {s.totals ? (
        <Section gap="xs" title="Estimated repair" testID="public-totals">
          <AppText>
            {hours(s.totals.hours)} of work, {money(s.totals.totalCost, s.totals.currency)} in all
          </AppText>
        </Section>
      ) : null}
      <AppText testID="public-inspector">
        Inspected by {s.inspectorName ?? 'the workshop'}
        {s.latestSurveyDate ? ` on ${formatDay(s.latestSurveyDate)}` : ''}.
      </AppText>
      <View style={styles.download}>
        <DownloadLink
          url={share.pdfUrl}
          fileName={pdfFileName(r.shortId, r.kind, r.version)}
          testID="public-download"
        />
        <AppText variant="caption" muted>
          {pagesLabel(r.pageCount)}, {formatBytes(r.byteSize)}. This link works until{' '}
          {formatDay(share.expiresAt)}.
        </AppText>
      </View>
      <AppText testID="public-verify-line">
        To check that a copy of this PDF is genuine and unchanged, enter {r.shortId} or drop the
        file on{' '}
        <Link href={{ pathname: '/verify', params: { id: r.shortId } }} style={styles.link}>
          the verification page
        </Link>
        .
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  titles: { gap: spacing.xs },
  notice: {
    padding: spacing.md,
    borderLeftWidth: 4,
    borderLeftColor: colors.caution,
    backgroundColor: colors.cautionSoft,
  },
  download: { gap: spacing.xs },
  link: { color: colors.accent, textDecorationLine: 'underline', fontFamily: fonts.bold },
});
