import { StyleSheet, View } from 'react-native';
import { formatTemperature } from '@/shared/wood';
import { AppText } from '@/src/components/ui';
import { speciesLabel } from '@/src/components/findings/labels';
import { colors, radius, spacing } from '@/src/theme';
import type { Units } from './labels';
import { mc, readMoisture, type ShopClimate } from './moisture';
import { RiskScale } from './risk-scale';

type Props = {
  meterReading: string;
  woodTempC: string;
  species: string | null;
  /** The survey's shop climate; null when the survey is not known. */
  climate: ShopClimate | null;
  units: Units;
};

/**
 * What a moisture reading means, recomputed as it is typed: the reading corrected for wood
 * temperature and species, its decay-risk level, and the shop's equilibrium moisture content
 * to tell the climate from a water source.
 */
export function MoisturePanel({ meterReading, woodTempC, species, climate, units }: Props) {
  const view = readMoisture({ meterReading, woodTempC, species, climate });
  const r = view.reading;
  return (
    <View style={styles.panel} testID="moisture-panel" accessibilityLiveRegion="polite">
      {r ? (
        <View style={styles.block}>
          <AppText variant="caption" muted>
            Corrected moisture content
          </AppText>
          <AppText variant="heading" testID="moisture-corrected">
            {mc(r.corrected)}
          </AppText>
          <AppText variant="caption" testID="moisture-steps">
            Meter {r.meter} %
            {r.woodTempC === null
              ? ' (no wood temperature: not corrected for temperature)'
              : ` → ${mc(r.temperatureCorrected)} at ${formatTemperature(r.woodTempC, units)}`}
            {species ? ` → ${mc(r.corrected)} for ${speciesLabel(species).toLowerCase()}` : ''}
          </AppText>
          {r.notes.map((n) => (
            <AppText key={n} variant="caption" muted>
              {n}
            </AppText>
          ))}
          <RiskScale risk={r.risk} testID="moisture-risk" />
        </View>
      ) : (
        <AppText variant="caption" muted testID="moisture-empty">
          Type the meter reading to see the corrected moisture content and its decay risk.
        </AppText>
      )}

      <AppText variant="caption" testID="moisture-emc">
        {view.emc
          ? `Shop climate ${formatTemperature(view.emc.airTempC, units)}, ${view.emc.relativeHumidity} % relative humidity: wood settles near ${mc(view.emc.percent)} (equilibrium moisture content).`
          : 'No shop climate recorded for this survey, so the reading cannot be compared with the equilibrium moisture content.'}
      </AppText>

      {view.hint ? (
        <View style={styles.hint} accessibilityRole="alert" testID="moisture-hint">
          <AppText variant="label">Wetter than the shop explains</AppText>
          <AppText>{view.hint}</AppText>
        </View>
      ) : null}
      {view.problem ? (
        <AppText variant="caption" style={styles.problem} testID="moisture-problem">
          {view.problem}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surfaceSunken,
  },
  block: { gap: spacing.xs },
  hint: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radius.md,
    borderLeftWidth: 6,
    borderLeftColor: colors.caution,
    backgroundColor: colors.cautionSoft,
  },
  problem: { color: colors.danger },
});
