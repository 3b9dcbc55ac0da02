import type { BodyPlan, SpeciesKey, Zone } from '@/shared/body-plans';
import {
  decisionInputs,
  type DecisionInputs,
  type DecisionResponse,
  type FindingResponse,
  type SaveDecisionRequest,
  type WorkshopSettings,
} from '@/shared/schemas';
import {
  DomainError,
  estimateForOption,
  formatLength,
  inToMm,
  mmToIn,
  assessMember,
  type RepairEstimate,
  type ResidualSection,
  type Verdict,
  type VerdictOption,
} from '@/shared/wood';
import { parseNumber, type Face, FACES } from '@/src/components/findings/form-values';
import type { Units } from '@/src/components/wood/labels';

/** What the decision form edits: lengths stay text in the workshop's units until saved. */
export type DecisionFormValues = {
  width: string;
  depth: string;
  decay: Record<Face, string>;
  affectedLength: string;
  memberLength: string;
  atJointOrFitting: boolean;
  species: SpeciesKey;
  /** null follows the recommendation as the measurements change. */
  chosen: VerdictOption | null;
  overrideReason: string;
  notes: string;
};

/** Error messages keyed by request path ("inputs.widthMm", "overrideReason"). */
export type DecisionErrors = Record<string, string>;

/** What the zone's open findings say, as the server reads them for the verdict. */
export type ZoneContext = {
  zone: Zone;
  findings: FindingResponse[];
  /** Other members of the same assembly already decided for replacement. */
  assemblyReplacements: number;
};

const REPLACING: VerdictOption[] = ['replace-member', 'replace-assembly'];

/** A length in mm as the text an input shows in the workshop's units. */
export function lengthText(mm: number, units: Units): string {
  if (units === 'metric') return String(Math.round(mm * 10) / 10);
  return String(Math.round(mmToIn(mm) * 100) / 100);
}

export const lengthUnit = (units: Units) => (units === 'metric' ? 'mm' : 'in');

function lengthMm(text: string, units: Units): number | null {
  const n = parseNumber(text);
  if (n === null || Number.isNaN(n)) return n;
  return units === 'metric' ? n : inToMm(n);
}

/** The worst open finding (highest severity, newest first among equals). */
export function worstFinding(findings: FindingResponse[]): FindingResponse | null {
  return (
    [...findings].sort(
      (a, b) => b.severity - a.severity || b.createdAt.localeCompare(a.createdAt),
    )[0] ?? null
  );
}

/**
 * The form's starting point: a saved decision's own inputs, else the zone's nominal section,
 * length and usual species with the decay depths and affected length of its worst open finding.
 */
export function prefillValues(
  ctx: ZoneContext,
  decision: DecisionResponse | null,
  units: Units,
): DecisionFormValues {
  const t = (mm: number) => lengthText(mm, units);
  const depthText = (mm: number) => (mm > 0 ? t(mm) : '');
  if (decision) {
    const i = decision.inputs;
    return {
      width: t(i.widthMm),
      depth: t(i.depthMm),
      decay: {
        top: depthText(i.decayMm.top),
        bottom: depthText(i.decayMm.bottom),
        left: depthText(i.decayMm.left),
        right: depthText(i.decayMm.right),
      },
      affectedLength: t(i.affectedLengthMm),
      memberLength: t(i.memberLengthMm),
      atJointOrFitting: i.atJointOrFitting,
      species: i.species,
      chosen: decision.chosenOption,
      overrideReason: decision.overrideReason,
      notes: decision.notes,
    };
  }
  const { zone, findings } = ctx;
  const worst = worstFinding(findings);
  const d = worst?.decayDepthMm ?? { top: 0, bottom: 0, left: 0, right: 0 };
  return {
    width: t(zone.nominalSection.widthMm),
    depth: t(zone.nominalSection.depthMm),
    decay: {
      top: depthText(d.top),
      bottom: depthText(d.bottom),
      left: depthText(d.left),
      right: depthText(d.right),
    },
    affectedLength: t(worst?.affectedLengthMm ?? 0),
    memberLength: t(zone.lengthMm),
    atJointOrFitting: findings.some((f) => f.atJointOrFitting),
    species: zone.defaultSpecies,
    chosen: null,
    overrideReason: '',
    notes: '',
  };
}

/** Members of the zone's assembly (other than it) whose decision replaces them. */
export function assemblyReplacements(
  plan: BodyPlan,
  zone: Zone,
  decisions: DecisionResponse[],
): number {
  if (!zone.assembly) return 0;
  const siblings = new Set(
    plan.zones.filter((z) => z.assembly === zone.assembly && z.key !== zone.key).map((z) => z.key),
  );
  return decisions.filter((d) => siblings.has(d.zoneKey) && REPLACING.includes(d.chosenOption))
    .length;
}

const NOT_A_NUMBER = 'Enter a number, e.g. 45 or 12.5';

/** The measured inputs in mm, or the message for each field that cannot be used. */
export function parseInputs(
  values: DecisionFormValues,
  units: Units,
): { inputs: DecisionInputs | null; errors: DecisionErrors } {
  const errors: DecisionErrors = {};
  const num = (path: string, text: string, empty: number | null) => {
    const n = lengthMm(text, units);
    if (Number.isNaN(n)) errors[path] = NOT_A_NUMBER;
    return n === null ? empty : Number.isNaN(n) ? null : n;
  };
  const raw = {
    widthMm: num('inputs.widthMm', values.width, null),
    depthMm: num('inputs.depthMm', values.depth, null),
    decayMm: Object.fromEntries(
      FACES.map((f) => [f, num(`inputs.decayMm.${f}`, values.decay[f], 0)]),
    ),
    affectedLengthMm: num('inputs.affectedLengthMm', values.affectedLength, 0),
    memberLengthMm: num('inputs.memberLengthMm', values.memberLength, null),
    atJointOrFitting: values.atJointOrFitting,
    species: values.species,
  };
  const parsed = decisionInputs.safeParse(raw);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = ['inputs', ...issue.path.map(String)].join('.');
      errors[key] ??= friendly(issue, units);
    }
  }
  if (!parsed.success || Object.keys(errors).length) return { inputs: null, errors };
  Object.assign(errors, measurementErrors(parsed.data, units));
  return { inputs: Object.keys(errors).length ? null : parsed.data, errors };
}

function friendly(
  issue: { code: string; message: string; minimum?: unknown; maximum?: unknown },
  units: Units,
) {
  if (issue.code === 'invalid_type') return 'Enter this measurement';
  if (issue.code === 'too_small') return 'Must be more than 0';
  if (issue.code === 'too_big' && typeof issue.maximum === 'number')
    return `At most ${formatLength(issue.maximum, units)}`;
  return issue.message;
}

/** The same physical checks the server makes: no decay past the opposite face, no length past the member. */
function measurementErrors(i: DecisionInputs, units: Units): DecisionErrors {
  const errors: DecisionErrors = {};
  const across = { top: i.depthMm, bottom: i.depthMm, left: i.widthMm, right: i.widthMm };
  for (const face of FACES)
    if (i.decayMm[face] > across[face])
      errors[`inputs.decayMm.${face}`] =
        `Deeper than the member (${formatLength(across[face], units)})`;
  if (i.affectedLengthMm > i.memberLengthMm)
    errors['inputs.affectedLengthMm'] =
      `Longer than the member (${formatLength(i.memberLengthMm, units)})`;
  return errors;
}

export type DecisionModel = {
  inputs: DecisionInputs;
  section: ResidualSection;
  verdict: Verdict;
  /** The option that will be saved: the inspector's choice, else the recommendation. */
  option: VerdictOption;
  overriding: boolean;
  estimate: RepairEstimate;
};

/** The live recommendation and estimate, computed with the same shared functions as the server. */
export function computeDecision(
  inputs: DecisionInputs,
  chosen: VerdictOption | null,
  ctx: ZoneContext,
  settings: WorkshopSettings,
): DecisionModel {
  const { section, verdict } = assessMember(
    inputs,
    {
      structuralClass: ctx.zone.structuralClass,
      worstSeverity: Math.max(0, ...ctx.findings.map((f) => f.severity)),
      activeAgent: ctx.findings.some((f) => f.activity === 'active'),
      assemblyMembersNeedingReplacement: ctx.assemblyReplacements,
    },
    settings.wood,
  );
  const option = chosen ?? verdict.option;
  const estimate = estimateForOption(option, inputs, settings);
  return { inputs, section, verdict, option, overriding: option !== verdict.option, estimate };
}

/** computeDecision, with a domain refusal turned into a message for the field it names. */
export function tryComputeDecision(...args: Parameters<typeof computeDecision>): {
  model: DecisionModel | null;
  errors: DecisionErrors;
} {
  try {
    return { model: computeDecision(...args), errors: {} };
  } catch (e) {
    if (!(e instanceof DomainError)) throw e;
    return { model: null, errors: { [requestField(e.field)]: e.message } };
  }
}

/** A shared function's parameter name as the request path the form shows it under. */
function requestField(field: string): string {
  const [head, ...rest] = field.split('.');
  if (head === 'width') return 'inputs.widthMm';
  if (head === 'depth') return 'inputs.depthMm';
  if (head === 'decay') return ['inputs.decayMm', ...rest].join('.');
  if (head in decisionInputs.shape) return `inputs.${field}`;
  return 'form';
}

/** The PUT body; an override carries its reason, following the recommendation carries none. */
export function saveBody(
  inputs: DecisionInputs,
  model: DecisionModel,
  values: DecisionFormValues,
  version: number | undefined,
): SaveDecisionRequest {
  return {
    version,
    inputs,
    chosenOption: model.option,
    overrideReason: model.overriding ? values.overrideReason.trim() : '',
    notes: values.notes,
  };
}

/** Which request paths each form value feeds, so editing a value clears its message. */
export function pathsOf(key: keyof DecisionFormValues, face?: Face): string[] {
  switch (key) {
    case 'width':
      return ['inputs.widthMm', 'inputs.decayMm.left', 'inputs.decayMm.right'];
    case 'depth':
      return ['inputs.depthMm', 'inputs.decayMm.top', 'inputs.decayMm.bottom'];
    case 'decay':
      return face ? [`inputs.decayMm.${face}`] : [];
    case 'affectedLength':
    case 'memberLength':
      return ['inputs.affectedLengthMm', 'inputs.memberLengthMm'];
    case 'species':
      return ['inputs.species'];
    case 'chosen':
      return ['chosenOption', 'overrideReason'];
    default:
      return [key];
  }
}
