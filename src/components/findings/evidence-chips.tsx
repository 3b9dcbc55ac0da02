import { StyleSheet, View } from 'react-native';
import { INSECT_EVIDENCE, INSECT_EVIDENCE_LABELS } from '@/shared/schemas';
import { AppText, ChipToggle } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import type { InsectEvidence } from './form-values';

/** Every kind of insect evidence seen, as on/off chips (frass kinds first, as found first). */
export function EvidenceChips({
  value,
  onChange,
  error,
}: {
  value: InsectEvidence[];
  onChange(next: InsectEvidence[]): void;
  error?: string;
}) {
  const toggle = (key: InsectEvidence, on: boolean) =>
    onChange(
      on
        ? INSECT_EVIDENCE.filter((k) => k === key || value.includes(k))
        : value.filter((k) => k !== key),
    );
  return (
    <View style={styles.group} accessibilityLabel="Insect evidence">
      <AppText variant="label">Insect evidence</AppText>
      <AppText variant="caption" muted>
        Choose all that you saw. Leave empty when there is none.
      </AppText>
      {error ? (
        <AppText variant="caption" style={styles.error} accessibilityRole="alert">
          {error}
        </AppText>
      ) : null}
      <View style={styles.chips}>
        {INSECT_EVIDENCE.map((key) => (
          <ChipToggle
            key={key}
            testID={'evidence-' + key}
            label={INSECT_EVIDENCE_LABELS[key]}
            checked={value.includes(key)}
            onChange={(on) => toggle(key, on)}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  error: { color: colors.danger },
});
