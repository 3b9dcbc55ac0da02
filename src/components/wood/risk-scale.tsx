import { StyleSheet, View } from 'react-native';
import type { DecayRisk } from '@/shared/wood/types';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { DECAY_RISK_LABELS } from './labels';

const STEPS = [1, 2, 3, 4] as const;
const FILL = { 1: colors.ok, 2: colors.caution, 3: colors.danger, 4: colors.danger };

/**
 * The decay-risk level as a word and a four-step bar whose filled steps grow with the risk,
 * so the level reads without colour; the reason says which threshold it crossed.
 */
export function RiskScale({ risk, testID }: { risk: DecayRisk; testID?: string }) {
  const { label, step } = DECAY_RISK_LABELS[risk.level];
  return (
    <View
      style={styles.wrap}
      accessible
      accessibilityLabel={`Decay risk: ${label}, step ${step} of 4. ${risk.reason}`}
      testID={testID}
    >
      <View style={styles.row}>
        <View style={styles.steps}>
          {STEPS.map((s) => (
            <View
              key={s}
              style={[
                styles.step,
                { height: 8 + s * 4 },
                s <= step ? { backgroundColor: FILL[step], borderColor: colors.ink } : null,
              ]}
            />
          ))}
        </View>
        <AppText variant="label" testID={testID ? `${testID}-level` : undefined}>
          {label}
        </AppText>
        <AppText variant="caption" muted>
          step {step} of 4
        </AppText>
      </View>
      <AppText variant="caption">{risk.reason}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.sm, flexWrap: 'wrap' },
  steps: { flexDirection: 'row', alignItems: 'flex-end', gap: 3 },
  step: {
    width: 10,
    borderRadius: radius.sm / 3,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
});
