import { Pressable, StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { colors, radius, spacing } from '@/src/theme';
import { AppText } from './app-text';

export type Option<T extends string> = { value: T; label: string; description?: string };

type GroupProps<T extends string> = {
  label: string;
  options: readonly Option<T>[];
  value: T | null;
  onChange: (value: T) => void;
  error?: string | null;
  testID?: string;
};

/** One choice from a short list, each option a full-width row with an optional explanation. */
export function Select<T extends string>({
  label,
  options,
  value,
  onChange,
  error,
  testID,
}: GroupProps<T>) {
  return (
    <View
      style={styles.group}
      accessibilityRole="radiogroup"
      accessibilityLabel={label}
      testID={testID}
    >
      <AppText variant="label">{label}</AppText>
      {error ? (
        <AppText variant="caption" style={styles.error} accessibilityRole="alert">
          {error}
        </AppText>
      ) : null}
      {options.map((o) => {
        const selected = o.value === value;
        return (
          <Pressable
            key={o.value}
            testID={testID ? `${testID}-${o.value}` : undefined}
            accessibilityRole="radio"
            accessibilityState={{ checked: selected }}
            aria-checked={selected}
            accessibilityLabel={o.description ? `${o.label}. ${o.description}` : o.label}
            onPress={() => onChange(o.value)}
            style={[styles.row, selected && styles.rowSelected]}
          >
            <View style={[styles.radio, selected && styles.radioSelected]}>
              {selected ? <View style={styles.radioDot} /> : null}
            </View>
            <View style={styles.rowText}>
              <AppText variant="label">{o.label}</AppText>
              {o.description ? (
                <AppText variant="caption" muted>
                  {o.description}
                </AppText>
              ) : null}
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

/** One choice from two to five short options, side by side. */
export function SegmentedControl<T extends string>({
  label,
  options,
  value,
  onChange,
  testID,
}: GroupProps<T>) {
  return (
    <View style={styles.group}>
      <AppText variant="label">{label}</AppText>
      <View
        style={styles.segments}
        accessibilityRole="radiogroup"
        accessibilityLabel={label}
        testID={testID}
      >
        {options.map((o, i) => {
          const selected = o.value === value;
          return (
            <Pressable
              key={o.value}
              testID={testID ? `${testID}-${o.value}` : undefined}
              accessibilityRole="radio"
              accessibilityState={{ checked: selected }}
              aria-checked={selected}
              onPress={() => onChange(o.value)}
              style={[
                styles.segment,
                i > 0 && styles.segmentDivider,
                selected && styles.segmentSelected,
              ]}
            >
              <AppText
                variant="label"
                style={selected ? styles.segmentInkSelected : styles.segmentInk}
              >
                {o.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

type ToggleProps = {
  label: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  description?: string;
  testID?: string;
};

/** A drawn tick: the app's typeface has no check-mark glyph. */
function Tick({ color }: { color: string }) {
  return (
    <Svg width={16} height={16} viewBox="0 0 16 16">
      <Path
        d="M3 8.5 L6.5 12 L13 4.5"
        stroke={color}
        strokeWidth={2.5}
        fill="none"
        strokeLinecap="round"
      />
    </Svg>
  );
}

export function Checkbox({ label, checked, onChange, description, testID }: ToggleProps) {
  return (
    <Pressable
      testID={testID}
      accessibilityRole="checkbox"
      accessibilityState={{ checked }}
      aria-checked={checked}
      accessibilityLabel={label}
      onPress={() => onChange(!checked)}
      style={styles.checkRow}
    >
      <View style={[styles.box, checked && styles.boxChecked]}>
        {checked ? <Tick color={colors.accentInk} /> : null}
      </View>
      <View style={styles.rowText}>
        <AppText>{label}</AppText>
        {description ? (
          <AppText variant="caption" muted>
            {description}
          </AppText>
        ) : null}
      </View>
    </Pressable>
  );
}

/** A compact on/off pill for filters and multi-select lists. */
export function ChipToggle({ label, checked, onChange, testID }: ToggleProps) {
  return (
    <Pressable
      testID={testID}
      accessibilityRole="checkbox"
      accessibilityState={{ checked }}
      aria-checked={checked}
      accessibilityLabel={label}
      onPress={() => onChange(!checked)}
      style={[styles.chip, checked && styles.chipChecked]}
    >
      {checked ? <Tick color={colors.accentInk} /> : null}
      <AppText variant="label" style={checked ? styles.segmentInkSelected : styles.segmentInk}>
        {label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  error: { color: colors.danger },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: 48,
    padding: spacing.md,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  rowSelected: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  rowText: { flex: 1, gap: 2 },
  radio: {
    width: 22,
    height: 22,
    borderRadius: 11,
    borderWidth: 2,
    borderColor: colors.inkMuted,
    alignItems: 'center',
    justifyContent: 'center',
  },
  radioSelected: { borderColor: colors.accent },
  radioDot: { width: 10, height: 10, borderRadius: 5, backgroundColor: colors.accent },
  segments: {
    flexDirection: 'row',
    borderWidth: 2,
    borderColor: colors.accent,
    borderRadius: radius.md,
    overflow: 'hidden',
  },
  segment: {
    flex: 1,
    minHeight: 44,
    alignItems: 'center',
    justifyContent: 'center',
    paddingHorizontal: spacing.sm,
    backgroundColor: colors.surface,
  },
  segmentDivider: { borderLeftWidth: 1, borderLeftColor: colors.accent },
  segmentSelected: { backgroundColor: colors.accent },
  segmentInk: { color: colors.accent, textAlign: 'center' },
  segmentInkSelected: { color: colors.accentInk, textAlign: 'center' },
  checkRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, minHeight: 44 },
  box: {
    width: 24,
    height: 24,
    borderRadius: radius.sm,
    borderWidth: 2,
    borderColor: colors.inkMuted,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.surface,
  },
  boxChecked: { backgroundColor: colors.accent, borderColor: colors.accent },
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    minHeight: 44,
    paddingHorizontal: spacing.md,
    borderRadius: radius.pill,
    borderWidth: 2,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
  },
  chipChecked: { backgroundColor: colors.accent },
});
