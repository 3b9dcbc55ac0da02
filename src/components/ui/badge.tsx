import { StyleSheet, View } from 'react-native';
import { SEVERITY_LABELS } from '@/shared/schemas';
import { colors, fonts, radius, severityFill, severityInk, spacing } from '@/src/theme';
import { AppText } from './app-text';

export type BadgeTone = 'neutral' | 'accent' | 'ok' | 'caution' | 'danger';

const TONES: Record<BadgeTone, { bg: string; ink: string }> = {
  neutral: { bg: colors.surfaceSunken, ink: colors.ink },
  accent: { bg: colors.accentSoft, ink: colors.accent },
  ok: { bg: colors.okSoft, ink: colors.ok },
  caution: { bg: colors.cautionSoft, ink: colors.caution },
  danger: { bg: colors.dangerSoft, ink: colors.danger },
};

export function Badge({
  label,
  tone = 'neutral',
  testID,
}: {
  label: string;
  tone?: BadgeTone;
  testID?: string;
}) {
  const t = TONES[tone];
  return (
    <View style={[styles.badge, { backgroundColor: t.bg }]} testID={testID}>
      <AppText variant="caption" style={[styles.text, { color: t.ink }]}>
        {label}
      </AppText>
    </View>
  );
}

/** Worst open severity as its number and word on the severity fill: never colour alone. */
export function SeverityBadge({ severity, testID }: { severity: number | null; testID?: string }) {
  if (severity === null) return <Badge label="No open findings" testID={testID} />;
  const title = SEVERITY_LABELS[severity]?.title ?? '';
  return (
    <View
      style={[styles.badge, styles.severity, { backgroundColor: severityFill[severity] }]}
      accessibilityLabel={`Worst severity ${severity}, ${title}`}
      testID={testID}
    >
      <AppText variant="label" style={{ color: severityInk[severity] }}>
        {severity}
      </AppText>
      <AppText variant="caption" style={[styles.text, { color: severityInk[severity] }]}>
        {title}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    paddingHorizontal: spacing.sm,
    paddingVertical: 2,
    borderRadius: radius.pill,
  },
  severity: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    borderWidth: 1,
    borderColor: colors.ink,
  },
  text: { fontFamily: fonts.bold },
});
