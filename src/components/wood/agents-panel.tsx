import { StyleSheet, View } from 'react-native';
import type { DECAY_TYPES, INSECT_EVIDENCE } from '@/shared/schemas';
import { DomainError, evidenceFromFinding, likelyAgents } from '@/shared/wood';
import type { AgentCandidate } from '@/shared/wood/types';
import { AppText } from '@/src/components/ui';
import { colors, fonts, radius, spacing } from '@/src/theme';

/** Our own wording; shown with every suggestion, including when nothing matches. */
export const CONFIRM_NOTE =
  'Suggestions only — have a licensed pest-control operator confirm before treating.';
const SHOWN = 3;

type Props = {
  insectEvidence: (typeof INSECT_EVIDENCE)[number][];
  holeDiameterMm: number | null;
  decayType: (typeof DECAY_TYPES)[number];
  moisturePercent: number | null;
  species: string | null;
};

/** Whether there is anything for the agent suggestions to work from. */
export function hasAgentEvidence(
  p: Pick<Props, 'insectEvidence' | 'holeDiameterMm' | 'decayType'>,
) {
  return p.insectEvidence.length > 0 || p.holeDiameterMm !== null || p.decayType !== 'none';
}

function candidates(p: Props): AgentCandidate[] {
  try {
    return likelyAgents(
      evidenceFromFinding({
        insectEvidence: p.insectEvidence,
        holeDiameterMm: p.holeDiameterMm,
        decayType: p.decayType,
        moisturePercent: p.moisturePercent,
        species: p.species,
      }),
    );
  } catch (e) {
    // A half-typed hole size is reported beside its field; suggest nothing until it is usable.
    if (e instanceof DomainError) return [];
    throw e;
  }
}

/** The agents the evidence points to, closest match first, each with the evidence that matched. */
export function AgentsPanel(props: Props) {
  const list = candidates(props).slice(0, SHOWN);
  return (
    <View style={styles.panel} testID="agents-panel">
      <AppText variant="label">What may be at work</AppText>
      {list.length === 0 ? (
        <AppText variant="caption" muted testID="agents-none">
          Nothing in this evidence points to a particular agent yet.
        </AppText>
      ) : (
        list.map((c, i) => (
          <View key={c.agent} style={styles.item} testID={`agent-${c.agent}`}>
            <AppText variant="label">
              {i === 0 ? 'Closest match: ' : 'Also possible: '}
              {c.label}
            </AppText>
            {c.reasons.map((r) => (
              <AppText key={r} variant="caption">
                • {r}
              </AppText>
            ))}
          </View>
        ))
      )}
      <AppText variant="caption" style={styles.note} testID="agents-confirm-note">
        {CONFIRM_NOTE}
      </AppText>
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
  item: { gap: 2 },
  note: { fontFamily: fonts.bold, color: colors.caution },
});
