import type { Zone } from '../body-plans/schema';
import type { DecisionInputs } from '../schemas/decision';
import type { WorkshopSettings } from '../schemas/workshop';
import { assessMember, type MemberContext } from './assess';
import { estimateRepair } from './estimate';
import type { DecisionClass, VerdictOption } from './types';

/**
 * The class of an option chosen over the recommendation, on the same terms as the verdict's
 * own: work beyond keeping a structural member must be done; anything on a non-structural
 * member is cosmetic; keeping a structural member, or one with an active agent, means watching it.
 */
export function classForChosen(
  chosen: VerdictOption,
  zone: Pick<Zone, 'structuralClass'>,
  activeAgent: boolean,
): DecisionClass {
  const structural = zone.structuralClass !== 'non-structural';
  if (chosen === 'keep') return structural || activeAgent ? 'monitor' : 'cosmetic';
  return structural ? 'structural-must-fix' : 'cosmetic';
}

/** The estimate for doing `option` to the measured member at the workshop's rates. */
export function estimateForOption(
  option: VerdictOption,
  inputs: DecisionInputs,
  settings: Pick<WorkshopSettings, 'wood' | 'labourRatePerHour'>,
) {
  return estimateRepair({
    option,
    widthMm: inputs.widthMm,
    depthMm: inputs.depthMm,
    memberLengthMm: inputs.memberLengthMm,
    affectedLengthMm: inputs.affectedLengthMm,
    species: inputs.species,
    settings: settings.wood,
    labourRatePerHour: settings.labourRatePerHour,
  });
}

/**
 * The stored fields of a decision: the rules' recommendation from the measurements and the zone's
 * context, the chosen option (the recommendation unless `choice` differs), its class and its
 * estimate. The server's saveDecision() and the demo seed both store exactly this.
 */
export function decisionFields(
  zone: Pick<Zone, 'structuralClass'>,
  inputs: DecisionInputs,
  context: MemberContext,
  settings: Pick<WorkshopSettings, 'wood' | 'labourRatePerHour'>,
  choice: { option: VerdictOption; reason: string } | null,
) {
  const { verdict } = assessMember(inputs, context, settings.wood);
  const chosen = choice?.option ?? verdict.option;
  const overridden = chosen !== verdict.option;
  const estimate = estimateForOption(chosen, inputs, settings);
  return {
    inputs,
    recommendedOption: verdict.option,
    recommendationReasons: verdict.reasons,
    chosenOption: chosen,
    // A reason is only kept for an override; a stale one would explain a choice no longer made.
    overrideReason: overridden ? (choice?.reason ?? '') : '',
    decisionClass: overridden
      ? classForChosen(chosen, zone, context.activeAgent)
      : verdict.decisionClass,
    estimatedHours: estimate.hours,
    labourCost: estimate.labourCost,
    materialCost: estimate.materialCost,
    totalCost: estimate.totalCost,
    materials: estimate.cutList,
    splice: estimate.splice,
  };
}
