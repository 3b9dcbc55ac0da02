import { MemberDecision, type Vehicle } from '@/server/models';
import type { DecisionInputs } from '@/shared/schemas/decision';
import type { VerdictOption } from '@/shared/wood';

type InputsPartial = Partial<Omit<DecisionInputs, 'decayMm'>> & {
  decayMm?: Partial<DecisionInputs['decayMm']>;
};

/** Measurements of a sound left sill of the saloon plan (95 × 50 mm, 1720 mm long). */
export function buildDecisionInputs(partial: InputsPartial = {}): DecisionInputs {
  const { decayMm, ...rest } = partial;
  return {
    widthMm: 95,
    depthMm: 50,
    affectedLengthMm: 300,
    memberLengthMm: 1720,
    atJointOrFitting: false,
    species: 'white-ash',
    ...rest,
    decayMm: { top: 0, bottom: 0, left: 0, right: 0, ...decayMm },
  };
}

/** A PUT body; `inputs` overrides are merged into the default measurements. */
export function buildSaveDecision(
  partial: {
    inputs?: InputsPartial;
    chosenOption?: VerdictOption;
    overrideReason?: string;
    notes?: string;
    version?: number;
  } = {},
) {
  const { inputs, ...rest } = partial;
  return { chosenOption: 'keep' as VerdictOption, ...rest, inputs: buildDecisionInputs(inputs) };
}

/**
 * A stored decision row as the service would leave it for a member kept as it is. Only the
 * fields a test names differ; for a computed recommendation go through the PUT route.
 */
export async function createDecision(
  vehicle: Vehicle,
  partial: Partial<MemberDecision['_creationAttributes']> = {},
) {
  return MemberDecision.create({
    workshopId: vehicle.workshopId,
    vehicleId: vehicle.id,
    decidedById: null,
    zoneKey: 'sill-left',
    inputs: buildDecisionInputs(),
    recommendedOption: 'keep',
    recommendationReasons: ['Sound'],
    chosenOption: 'keep',
    overrideReason: '',
    decisionClass: 'monitor',
    estimatedHours: 0.25,
    labourCost: 0,
    materialCost: 0,
    totalCost: 0,
    materials: [],
    splice: null,
    notes: '',
    ...partial,
  });
}

/** A structural must-fix decision to replace the left sill: 6 h, 300 labour + 80 timber = 380. */
export function createStructuralDecision(vehicle: Vehicle, zoneKey = 'sill-left') {
  return createDecision(vehicle, {
    zoneKey,
    chosenOption: 'replace-member',
    recommendedOption: 'replace-member',
    decisionClass: 'structural-must-fix',
    estimatedHours: 6,
    labourCost: 300,
    materialCost: 80,
    totalCost: 380,
  });
}
