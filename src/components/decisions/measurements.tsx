import { StyleSheet, View } from 'react-native';
import { SPECIES_KEYS } from '@/shared/body-plans';
import { SPECIES_LABELS } from '@/src/components/findings/labels';
import { FACES, type Face } from '@/src/components/findings/form-values';
import { AppText, Checkbox, NUMERIC_INPUT, Select, TextField } from '@/src/components/ui';
import type { Units } from '@/src/components/wood/labels';
import { spacing } from '@/src/theme';
import { lengthUnit, type DecisionErrors, type DecisionFormValues } from './decision-values';

const FACE_LABELS: Record<Face, string> = {
  top: 'Top face',
  bottom: 'Bottom face',
  left: 'Left face',
  right: 'Right face',
};
const speciesOptions = SPECIES_KEYS.map((v) => ({ value: v, label: SPECIES_LABELS[v] }));

type Props = {
  values: DecisionFormValues;
  onChange(patch: Partial<DecisionFormValues>, face?: Face): void;
  errors: DecisionErrors;
  units: Units;
  /** Where the prefilled values came from, in a sentence. */
  source: string;
};

/** The member's size, decay per face, lengths, species and joint flag, in the workshop's units. */
export function Measurements({ values, onChange, errors, units, source }: Props) {
  const unit = lengthUnit(units);
  const err = (path: string) => errors[path];
  return (
    <View style={styles.wrap}>
      <AppText variant="caption" muted testID="decision-prefill-source">
        {source}
      </AppText>
      <View style={styles.grid}>
        <View style={styles.cell}>
          <TextField
            label="Width"
            hint="Across the face you see."
            suffix={unit}
            value={values.width}
            onChangeText={(width) => onChange({ width })}
            error={err('inputs.widthMm')}
            testID="decision-width"
            {...NUMERIC_INPUT}
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Depth"
            hint="Into the body; the member bends this way."
            suffix={unit}
            value={values.depth}
            onChangeText={(depth) => onChange({ depth })}
            error={err('inputs.depthMm')}
            testID="decision-depth"
            {...NUMERIC_INPUT}
          />
        </View>
      </View>
      <AppText variant="label">Decayed wood, measured in from each face</AppText>
      <View style={styles.grid}>
        {FACES.map((face) => (
          <View key={face} style={styles.cell}>
            <TextField
              label={FACE_LABELS[face]}
              suffix={unit}
              value={values.decay[face]}
              onChangeText={(v) => onChange({ decay: { ...values.decay, [face]: v } }, face)}
              error={err(`inputs.decayMm.${face}`)}
              placeholder="0"
              testID={`decision-decay-${face}`}
              {...NUMERIC_INPUT}
            />
          </View>
        ))}
      </View>
      <View style={styles.grid}>
        <View style={styles.cell}>
          <TextField
            label="Affected length"
            suffix={unit}
            value={values.affectedLength}
            onChangeText={(affectedLength) => onChange({ affectedLength })}
            error={err('inputs.affectedLengthMm')}
            testID="decision-affected-length"
            {...NUMERIC_INPUT}
          />
        </View>
        <View style={styles.cell}>
          <TextField
            label="Member length"
            suffix={unit}
            value={values.memberLength}
            onChangeText={(memberLength) => onChange({ memberLength })}
            error={err('inputs.memberLengthMm')}
            testID="decision-member-length"
            {...NUMERIC_INPUT}
          />
        </View>
      </View>
      <Checkbox
        label="Damage at a joint or fitting"
        description="Hinges, lock plates, seat or belt mountings, or where members meet."
        checked={values.atJointOrFitting}
        onChange={(atJointOrFitting) => onChange({ atJointOrFitting })}
        testID="decision-joint"
      />
      <Select
        label="Species for new wood"
        options={speciesOptions}
        value={values.species}
        onChange={(species) => onChange({ species })}
        error={err('inputs.species')}
        testID="decision-species"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  // Two to a row at every width, so the four faces read as a square.
  cell: { flexGrow: 1, flexBasis: '40%', minWidth: 0 },
});
