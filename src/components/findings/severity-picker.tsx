import { Pressable, StyleSheet, View } from 'react-native';
import { SEVERITIES, SEVERITY_LABELS } from '@/shared/schemas';
import { AppText } from '@/src/components/ui';
import { colors, radius, severityFill, severityInk, spacing } from '@/src/theme';

/** Five large choices, each with its number, word and plain description (never colour alone). */
export function SeverityPicker({
  value,
  onChange,
  error,
}: {
  value: number | null;
  onChange(severity: number): void;
  error?: string;
}) {
  return (
    <View
      style={styles.group}
      accessibilityRole="radiogroup"
      accessibilityLabel="Severity"
      testID="severity"
    >
      <AppText variant="label">Severity</AppText>
      {error ? (
        <AppText
          variant="caption"
          style={styles.error}
          accessibilityRole="alert"
          testID="severity-error"
        >
          {error}
        </AppText>
      ) : null}
      {SEVERITIES.map((s) => {
        const selected = value === s;
        const { title, description } = SEVERITY_LABELS[s];
        return (
          <Pressable
            key={s}
            testID={'severity-' + s}
            accessibilityRole="radio"
            accessibilityState={{ checked: selected }}
            accessibilityLabel={`Severity ${s}, ${title}. ${description}`}
            onPress={() => onChange(s)}
            style={({ pressed }) => [
              styles.option,
              selected && styles.selected,
              pressed && !selected && styles.pressed,
            ]}
          >
            <View style={[styles.number, { backgroundColor: severityFill[s] }]}>
              <AppText variant="title" style={{ color: severityInk[s] }}>
                {s}
              </AppText>
            </View>
            <View style={styles.text}>
              <AppText variant="label">{title}</AppText>
              <AppText variant="caption" muted>
                {description}
              </AppText>
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  error: { color: colors.danger, fontWeight: 'bold' },
  option: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: 60,
    padding: spacing.sm,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  selected: { borderColor: colors.accent, borderWidth: 3, backgroundColor: colors.accentSoft },
  pressed: { backgroundColor: colors.surfaceSunken },
  number: {
    width: 44,
    height: 44,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.ink,
    alignItems: 'center',
    justifyContent: 'center',
  },
  text: { flex: 1, gap: 2 },
});
