import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { BodyPlan, ViewKey } from '@/shared/body-plans';
import { colors, radius, spacing, type } from '@/src/theme';

export const VIEW_LABELS: Record<ViewKey, string> = {
  left: 'Left',
  right: 'Right',
  top: 'Top',
  underside: 'Underside',
  front: 'Front',
  rear: 'Rear',
};

/** One button per view the plan has, in the plan's order. */
export function ViewSwitcher({
  plan,
  value,
  onChange,
}: {
  plan: BodyPlan;
  value: ViewKey;
  onChange(view: ViewKey): void;
}) {
  return (
    <View style={styles.row} role="tablist" accessibilityLabel="Diagram view">
      {plan.views.map((v) => {
        const active = v.key === value;
        return (
          <Pressable
            key={v.key}
            testID={'view-' + v.key}
            role="tab"
            aria-selected={active}
            accessibilityState={{ selected: active }}
            accessibilityLabel={v.title}
            onPress={() => onChange(v.key)}
            style={({ pressed }) => [
              styles.item,
              active && styles.active,
              pressed && !active && styles.pressed,
            ]}
          >
            <Text style={[styles.text, active && styles.activeText]}>{VIEW_LABELS[v.key]}</Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: spacing.xs,
    padding: spacing.xs,
    backgroundColor: colors.surfaceSunken,
    borderRadius: radius.md,
  },
  item: {
    flexGrow: 1,
    minHeight: 44,
    minWidth: 72,
    paddingHorizontal: spacing.md,
    alignItems: 'center',
    justifyContent: 'center',
    borderRadius: radius.sm,
  },
  active: { backgroundColor: colors.accent },
  pressed: { backgroundColor: colors.accentSoft },
  text: { ...type.label, color: colors.ink },
  activeText: { color: colors.accentInk },
});
