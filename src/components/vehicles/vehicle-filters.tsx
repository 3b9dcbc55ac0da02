import { ScrollView, StyleSheet, View } from 'react-native';
import { VEHICLE_STAGES, type VehicleStage } from '@/shared/schemas';
import { ChipToggle, TextField } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { STAGE_LABELS } from './vehicle-labels';

type Props = {
  search: string;
  onSearch: (q: string) => void;
  stage: VehicleStage | null;
  onStage: (stage: VehicleStage | null) => void;
  /** Owners also see a "Removed" filter. */
  removed?: boolean;
  onRemoved?: (on: boolean) => void;
};

export function VehicleFilters({ search, onSearch, stage, onStage, removed, onRemoved }: Props) {
  return (
    <View style={styles.wrap}>
      <TextField
        label="Search"
        hint="Year, make, model, client, chassis or body number"
        value={search}
        onChangeText={onSearch}
        autoCapitalize="none"
        autoCorrect={false}
        inputMode="search"
        testID="vehicle-search"
      />
      <ScrollView
        horizontal
        showsHorizontalScrollIndicator={false}
        contentContainerStyle={styles.chips}
      >
        <ChipToggle
          label="Every stage"
          checked={stage === null}
          onChange={() => onStage(null)}
          testID="stage-all"
        />
        {VEHICLE_STAGES.map((s) => (
          <ChipToggle
            key={s}
            label={STAGE_LABELS[s]}
            checked={stage === s}
            onChange={(on) => onStage(on ? s : null)}
            testID={`stage-${s}`}
          />
        ))}
        {onRemoved ? (
          <ChipToggle
            label="Removed"
            checked={!!removed}
            onChange={onRemoved}
            testID="stage-removed"
          />
        ) : null}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  chips: { gap: spacing.sm, paddingVertical: 2 },
});
