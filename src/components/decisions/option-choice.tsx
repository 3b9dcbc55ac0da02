import { StyleSheet, View } from 'react-native';
import { VERDICT_OPTIONS, type VerdictOption } from '@/shared/wood/types';
import { AppText, Select, TextField } from '@/src/components/ui';
import { OPTION_LABELS } from '@/src/components/wood/labels';
import { spacing } from '@/src/theme';

type Props = {
  recommended: VerdictOption;
  value: VerdictOption;
  onChange(option: VerdictOption): void;
  reason: string;
  onReasonChange(reason: string): void;
  errors: { chosenOption?: string; overrideReason?: string };
};

/** The inspector's choice: the recommendation unless they pick another and say why. */
export function OptionChoice({
  recommended,
  value,
  onChange,
  reason,
  onReasonChange,
  errors,
}: Props) {
  const options = VERDICT_OPTIONS.map((o) => ({
    value: o,
    label: o === recommended ? `${OPTION_LABELS[o].label} (recommended)` : OPTION_LABELS[o].label,
    description: OPTION_LABELS[o].description,
  }));
  const overriding = value !== recommended;
  return (
    <View style={styles.wrap}>
      <Select
        label="What will be done"
        options={options}
        value={value}
        onChange={onChange}
        error={errors.chosenOption}
        testID="decision-option"
      />
      <AppText variant="caption" testID="decision-choice-status">
        {overriding
          ? `Chosen: ${OPTION_LABELS[value].label.toLowerCase()}, instead of the recommended ${OPTION_LABELS[recommended].label.toLowerCase()}.`
          : 'Following the recommendation.'}
      </AppText>
      {overriding ? (
        <View style={styles.reason}>
          <AppText variant="caption" muted>
            You chose differently from the recommendation; the reason is kept with the decision and
            shown in the repair scope.
          </AppText>
          <TextField
            label="Why this option"
            multiline
            value={reason}
            onChangeText={onReasonChange}
            error={errors.overrideReason}
            placeholder="e.g. the owner wants the original timber kept; a plate will carry the hinge"
            testID="decision-override-reason"
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  reason: { gap: spacing.sm },
});
