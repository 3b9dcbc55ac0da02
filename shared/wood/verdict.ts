/**
 * Member verdict: keep, consolidate, splice, replace the member or replace its assembly. The
 * thresholds are common practice (rules of thumb of the trade, workshop-configurable in
 * settings), not published rules; every verdict says so.
 *
 * The verdict is built as a base option from the remaining section modulus, then raised by
 * each further kind of damage (severity, a joint or fitting, a long affected length, other
 * members of the assembly). Every step only ever raises the option, so more damage can never
 * give a milder verdict, all else equal.
 */
import { STRUCTURAL_CLASSES } from '../body-plans/schema';
import { DomainError, requireInRange, requireNonNegative, requirePositive } from './errors';
import { DEFAULT_VERDICT_RULES, type VerdictRules } from './settings';
import {
  VERDICT_OPTIONS,
  type DecisionClass,
  type Verdict,
  type VerdictInput,
  type VerdictOption,
} from './types';

/** Order of severity of the options: keep < consolidate < splice < replace-member < replace-assembly. */
export function verdictRank(option: VerdictOption): number {
  return VERDICT_OPTIONS.indexOf(option);
}

/** Whole percent, rounded down so 89.6 % never shows as the 90 % it failed to reach. */
export function percent(ratio: number): string {
  return `${Math.floor(ratio * 100 + 1e-9)} %`;
}

/** A ratio beside its threshold: one decimal when whole percents would look equal (35.2 % vs 35 %). */
function against(ratio: number, threshold: number): string {
  if (ratio === threshold || percent(ratio) !== percent(threshold)) return percent(ratio);
  const tenths =
    ratio > threshold ? Math.ceil(ratio * 1000 - 1e-9) : Math.floor(ratio * 1000 + 1e-9);
  return `${(tenths / 10).toFixed(1)} %`;
}

export const VERDICT_OPTION_LABELS: Record<VerdictOption, string> = {
  keep: 'Keep',
  consolidate: 'Consolidate',
  splice: 'Splice in new wood',
  'replace-member': 'Replace the member',
  'replace-assembly': 'Replace the assembly',
};

export const DECISION_CLASS_LABELS: Record<DecisionClass, string> = {
  'structural-must-fix': 'Structural, must fix',
  cosmetic: 'Cosmetic',
  monitor: 'Monitor',
};

function validate(input: VerdictInput, rules: VerdictRules): void {
  if (!(STRUCTURAL_CLASSES as readonly string[]).includes(input.structuralClass)) {
    throw new DomainError(
      'structuralClass',
      `Unknown structural class "${input.structuralClass}".`,
    );
  }
  requireInRange('sectionModulusRatio', input.sectionModulusRatio, 0, 1);
  requireInRange('areaRatio', input.areaRatio, 0, 1);
  requireNonNegative('affectedLengthMm', input.affectedLengthMm);
  requirePositive('memberLengthMm', input.memberLengthMm);
  requireInRange('severity', input.severity, 0, 4);
  requireNonNegative('assemblyMembersNeedingReplacement', input.assemblyMembersNeedingReplacement);
  if (input.scarfLengthMm != null) requireNonNegative('scarfLengthMm', input.scarfLengthMm);
  requireInRange('rules.keepMinSectionModulusRatio', rules.keepMinSectionModulusRatio, 0, 1);
  requireInRange(
    'rules.consolidateMinSectionModulusRatio',
    rules.consolidateMinSectionModulusRatio,
    0,
    rules.keepMinSectionModulusRatio,
  );
  requireInRange('rules.spliceMaxAffectedLengthRatio', rules.spliceMaxAffectedLengthRatio, 0, 1);
  requireInRange('rules.replaceAssemblyMinMembers', rules.replaceAssemblyMinMembers, 1, 50);
}

/** Recommended option, its plain reasons (with the numbers) and its class. */
export function recommendVerdict(
  input: VerdictInput,
  rules: VerdictRules = DEFAULT_VERDICT_RULES,
): Verdict {
  validate(input, rules);
  const structural = input.structuralClass !== 'non-structural';
  const smr = input.sectionModulusRatio;
  const lengthRatio = Math.min(1, input.affectedLengthMm / input.memberLengthMm);
  const reasons: string[] = [];
  const { keepMinSectionModulusRatio: keepAt, consolidateMinSectionModulusRatio: consolidateAt } =
    rules;
  const nearest = Math.abs(smr - keepAt) <= Math.abs(smr - consolidateAt) ? keepAt : consolidateAt;
  const remains = `${against(smr, nearest)} of the section modulus remains (${percent(input.areaRatio)} of the area)`;

  let option: VerdictOption;
  if (smr >= rules.keepMinSectionModulusRatio) {
    option = 'keep';
    reasons.push(
      `${remains}: at least the ${percent(rules.keepMinSectionModulusRatio)} needed to keep the member.`,
    );
  } else if (smr >= rules.consolidateMinSectionModulusRatio) {
    option = 'consolidate';
    reasons.push(
      `${remains}: below the ${percent(rules.keepMinSectionModulusRatio)} to keep it as it is, at least the ${percent(rules.consolidateMinSectionModulusRatio)} to consolidate.`,
    );
  } else {
    option = 'splice';
    reasons.push(
      `${remains}: below the ${percent(rules.consolidateMinSectionModulusRatio)} needed to consolidate, so the decayed wood must be cut out and new wood let in.`,
    );
  }

  if (input.severity >= 4 && verdictRank(option) < verdictRank('splice')) {
    option = 'splice';
    reasons.push(
      'Severity 4 (lost): the wood no longer carries load and must be cut out whatever was measured.',
    );
  } else if (input.severity >= 3 && option === 'keep') {
    option = 'consolidate';
    reasons.push('Severity 3 (deep): the damage needs at least consolidating.');
  }

  if (
    option === 'consolidate' &&
    input.atJointOrFitting &&
    structural &&
    rules.jointDamageRulesOutConsolidation
  ) {
    option = 'splice';
    reasons.push(
      'The damage is at a joint or fitting of a structural member, where filler cannot carry the load: new wood instead of consolidation.',
    );
  }

  const scarf = input.scarfLengthMm ?? 0;
  const spliceLength = input.affectedLengthMm + 2 * scarf;
  if (option === 'splice') {
    if (scarf > 0 && spliceLength > input.memberLengthMm) {
      option = 'replace-member';
      reasons.push(
        `A splice would need ${Math.round(spliceLength)} mm of new wood (the affected length and a ${Math.round(scarf)} mm scarf at each end), more than the ${Math.round(input.memberLengthMm)} mm member: replace it.`,
      );
    } else if (lengthRatio > rules.spliceMaxAffectedLengthRatio) {
      option = 'replace-member';
      reasons.push(
        `The affected length is ${against(lengthRatio, rules.spliceMaxAffectedLengthRatio)} of the member, more than the ${percent(rules.spliceMaxAffectedLengthRatio)} a splice should cover: replace the member.`,
      );
    } else {
      reasons.push(
        `The affected length is ${against(lengthRatio, rules.spliceMaxAffectedLengthRatio)} of the member, within the ${percent(rules.spliceMaxAffectedLengthRatio)} a splice can cover.`,
      );
    }
  }

  if (option === 'replace-member') {
    const members = input.assemblyMembersNeedingReplacement + 1;
    if (members >= rules.replaceAssemblyMinMembers) {
      option = 'replace-assembly';
      reasons.push(
        `With this one, ${members} members of the assembly need replacing (the rule is ${rules.replaceAssemblyMinMembers} or more): rebuild the assembly.`,
      );
    }
  }

  const decisionClass = classify(option, structural, input.activeAgent);
  reasons.push(...classReasons(option, structural, input.activeAgent));
  reasons.push(
    `These thresholds are common practice defaults that the workshop can change in its settings (keep at ${percent(rules.keepMinSectionModulusRatio)}, consolidate at ${percent(rules.consolidateMinSectionModulusRatio)} of the section modulus; splice up to ${percent(rules.spliceMaxAffectedLengthRatio)} of the length), not published rules.`,
  );
  return { option, decisionClass, reasons };
}

function classify(option: VerdictOption, structural: boolean, activeAgent: boolean): DecisionClass {
  if (option === 'keep') return activeAgent || structural ? 'monitor' : 'cosmetic';
  return structural ? 'structural-must-fix' : 'cosmetic';
}

function classReasons(option: VerdictOption, structural: boolean, activeAgent: boolean): string[] {
  const out: string[] = [];
  if (option !== 'keep' && structural) {
    out.push('This member is structural: the repair must be done before the body is relied on.');
  }
  if (option === 'keep' && !activeAgent) {
    out.push('Nothing to do now beyond finishing the surface: check it again at the next survey.');
  }
  if (activeAgent) {
    out.push(
      option === 'keep'
        ? 'An agent is still active: treat it and re-check this member.'
        : 'An agent is still active: treat it before the repair, or the new wood is at risk too.',
    );
  }
  return out;
}
