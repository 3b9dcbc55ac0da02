import { Pressable, StyleSheet, View } from 'react-native';
import type { BodyPlan } from '@/shared/body-plans';
import { BodyPlanPreview } from '@/src/components/body-plan-preview';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

type Props = {
  plans: readonly BodyPlan[];
  value: string;
  onChange: (key: string) => void;
  error?: string | null;
};

/** Choose the body style whose zoned diagram the survey will use; each shown as a small side view. */
export function BodyPlanPicker({ plans, value, onChange, error }: Props) {
  return (
    <View
      style={styles.wrap}
      accessibilityRole="radiogroup"
      accessibilityLabel="Body plan"
      testID="body-plan-picker"
    >
      <AppText variant="label">Body plan</AppText>
      <AppText variant="caption" muted>
        The drawing used for this vehicle&apos;s survey. Pick the closest body style.
      </AppText>
      {error ? (
        <AppText
          variant="caption"
          style={styles.error}
          accessibilityRole="alert"
          testID="body-plan-error"
        >
          {error}
        </AppText>
      ) : null}
      {plans.length === 0 ? (
        <AppText muted>No body plans are installed yet.</AppText>
      ) : (
        <View style={styles.grid}>
          {plans.map((p) => {
            const selected = p.key === value;
            return (
              <Pressable
                key={p.key}
                testID={`body-plan-${p.key}`}
                accessibilityRole="radio"
                accessibilityState={{ checked: selected }}
                accessibilityLabel={`${p.name}. ${p.description}`}
                onPress={() => onChange(p.key)}
                style={[styles.option, selected && styles.selected]}
              >
                <BodyPlanPreview plan={p} width={150} selected={selected} />
                <AppText variant="label">{p.name}</AppText>
                <AppText variant="caption" muted numberOfLines={3}>
                  {p.description}
                </AppText>
              </Pressable>
            );
          })}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  error: { color: colors.danger },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  option: {
    flexGrow: 1,
    flexBasis: 160,
    maxWidth: 260,
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    alignItems: 'flex-start',
  },
  selected: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
});
