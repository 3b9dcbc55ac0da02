import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';
import { REPORT_KIND_LABELS, type VerifyResponse } from '@/shared/schemas/report';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { formatDay } from '@/src/format/dates';

type Outcome = 'genuine' | 'known-id' | 'changed' | 'not-the-file' | 'unknown-id';
export type CheckedBy = 'file' | 'id';

/**
 * What a check found. A file that matches a stored report byte for byte is genuine; a file that
 * names an issued report but differs from it has been changed; any other file matches nothing
 * issued. An identifier alone only says whether such a report was issued.
 */
export function outcomeOf(v: VerifyResponse, checkedBy: CheckedBy): Outcome {
  if (v.genuine) return v.matchedBy === 'hash' ? 'genuine' : 'known-id';
  if (checkedBy === 'id') return 'unknown-id';
  return v.claimedShortId ? 'changed' : 'not-the-file';
}

const HEADLINES: Record<Outcome, string> = {
  genuine: 'Genuine and unchanged',
  'known-id': 'This identifier belongs to a real report',
  changed: 'Changed: this file differs from the report that was issued',
  'not-the-file': 'Not genuine: this file matches no issued report',
  'unknown-id': 'Not genuine: no report has this identifier',
};

const TONE: Record<Outcome, { ink: string; bg: string }> = {
  genuine: { ink: colors.ok, bg: colors.okSoft },
  'known-id': { ink: colors.accent, bg: colors.accentSoft },
  changed: { ink: colors.danger, bg: colors.dangerSoft },
  'not-the-file': { ink: colors.danger, bg: colors.dangerSoft },
  'unknown-id': { ink: colors.danger, bg: colors.dangerSoft },
};

/** A drawn sign beside the words: tick, i, or cross (never colour alone). */
function Sign({ outcome, color }: { outcome: Outcome; color: string }) {
  const path =
    outcome === 'genuine'
      ? 'M7 12.5 L10.5 16 L17 8.5'
      : outcome === 'known-id'
        ? 'M12 11 L12 17 M12 7.5 L12 8'
        : 'M8 8 L16 16 M16 8 L8 16';
  return (
    <Svg width={28} height={28} viewBox="0 0 24 24" accessibilityElementsHidden>
      <Circle cx={12} cy={12} r={10.5} stroke={color} strokeWidth={2} fill="none" />
      <Path d={path} stroke={color} strokeWidth={2.5} strokeLinecap="round" fill="none" />
    </Svg>
  );
}

export function VerifyResult({
  result,
  checkedBy,
}: {
  result: VerifyResponse;
  checkedBy: CheckedBy;
}) {
  const outcome = outcomeOf(result, checkedBy);
  const tone = TONE[outcome];
  const r = result.report;
  return (
    <View
      style={[styles.box, { borderColor: tone.ink, backgroundColor: tone.bg }]}
      accessibilityRole="alert"
      testID="verify-result"
    >
      <View style={styles.head}>
        <Sign outcome={outcome} color={tone.ink} />
        <AppText variant="title" style={styles.grow} testID="verify-outcome">
          {HEADLINES[outcome]}
        </AppText>
      </View>
      <AppText testID="verify-message">{result.message}</AppText>
      {r ? (
        <View style={styles.facts} testID="verify-report">
          <AppText>
            {REPORT_KIND_LABELS[r.kind]} {r.shortId}, issued by {r.workshopName} on{' '}
            {formatDay(r.generatedAt)}.
          </AppText>
          <AppText variant="label" testID="verify-version">
            {r.newerVersionExists
              ? `Version ${r.version} of ${r.latestVersion}: a newer version exists.`
              : `Version ${r.version}, the newest.`}
          </AppText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm, padding: spacing.lg, borderRadius: radius.lg, borderWidth: 2 },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1 },
  facts: { gap: spacing.xs },
});
