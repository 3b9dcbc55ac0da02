/**
 * PRODUCT.md §4 item 10: the condition summary. The five-step grade is our own scale, with
 * our own wording; its thresholds are common practice (judgement of the trade), not a
 * published standard. The rules are data, checked worst first; the first rule that holds
 * gives the grade. Every rule is "a damage count is at least N" or "the sound share is at
 * most X", so more damage can never give a better grade.
 */
import type { BodyPlan } from '../body-plans/schema';
import type { DecisionResponse } from '../schemas/decision';
import { CONDITION_GRADES, type ConditionGrade, type ConditionSummary } from '../schemas/report';
import type { ZoneStateResponse } from '../schemas/recheck';

export interface ConditionInput {
  plan: BodyPlan;
  /** Zone key → worst open severity (absent: 0). */
  worstSeverity: Record<string, number>;
  decisions: Pick<DecisionResponse, 'zoneKey' | 'decisionClass' | 'chosenOption'>[];
  zoneStates: Pick<ZoneStateResponse, 'zoneKey' | 'state'>[];
}

/** What the grade rules look at; each grows (or, for the share, shrinks) with damage. */
export interface ConditionMetrics {
  mustFix: number;
  cosmeticOrMonitor: number;
  undecided: number;
  active: number;
  watched: number;
  worstSeverity: number;
  /** Primary members with severity 4 (lost). */
  primaryLost: number;
  /** 1 − primarySoundShare. */
  primaryUnsoundShare: number;
}

type Rule = { metric: keyof ConditionMetrics; atLeast: number };

/** Worst grade first; a grade applies when any of its rules holds. Common practice thresholds. */
export const CONDITION_RULES: readonly { grade: ConditionGrade; any: Rule[] }[] = [
  {
    grade: 'rebuild',
    any: [
      { metric: 'primaryUnsoundShare', atLeast: 0.5 },
      { metric: 'primaryLost', atLeast: 4 },
    ],
  },
  {
    grade: 'major-repair',
    any: [
      { metric: 'primaryUnsoundShare', atLeast: 0.25 },
      { metric: 'primaryLost', atLeast: 2 },
      { metric: 'mustFix', atLeast: 6 },
      { metric: 'active', atLeast: 4 },
    ],
  },
  {
    grade: 'needs-repair',
    any: [
      { metric: 'mustFix', atLeast: 1 },
      { metric: 'active', atLeast: 1 },
      { metric: 'undecided', atLeast: 1 },
      { metric: 'primaryUnsoundShare', atLeast: Number.MIN_VALUE },
      { metric: 'worstSeverity', atLeast: 3 },
    ],
  },
  {
    grade: 'serviceable',
    any: [
      { metric: 'cosmeticOrMonitor', atLeast: 1 },
      { metric: 'watched', atLeast: 1 },
      { metric: 'worstSeverity', atLeast: 1 },
    ],
  },
];

/** Our own labels and one-sentence texts for the scale. */
export const CONDITION_GRADE_TEXT: Record<ConditionGrade, { label: string; text: string }> = {
  sound: {
    label: 'Sound',
    text: 'No damage needing work was found in the frame; routine care is enough.',
  },
  serviceable: {
    label: 'Serviceable',
    text: 'The frame does its job; there are minor or cosmetic faults, or areas being watched.',
  },
  'needs-repair': {
    label: 'Repair needed',
    text: 'Some members need repair or treatment before the body can be relied on.',
  },
  'major-repair': {
    label: 'Major repair',
    text: 'A large part of the load-bearing frame needs work; budget for a substantial repair.',
  },
  rebuild: {
    label: 'Re-framing',
    text: 'Half or more of the main frame is unsound or lost; plan to re-frame the body.',
  },
};

/**
 * A primary member is *sound* when its zone's worst open severity is at most 1 (surface
 * only), its zone state is not active, and it has no member decision other than keep.
 */
export function isPrimarySound(
  zoneKey: string,
  input: Pick<ConditionInput, 'worstSeverity' | 'decisions' | 'zoneStates'>,
): boolean {
  if ((input.worstSeverity[zoneKey] ?? 0) > 1) return false;
  if (input.zoneStates.some((s) => s.zoneKey === zoneKey && s.state === 'active')) return false;
  const d = input.decisions.find((x) => x.zoneKey === zoneKey);
  return !d || d.chosenOption === 'keep';
}

export function conditionMetrics(input: ConditionInput): ConditionMetrics & {
  primaryMembers: number;
  primarySound: number;
} {
  const zoneKeys = new Set(input.plan.zones.map((z) => z.key));
  const primary = input.plan.zones.filter((z) => z.structuralClass === 'primary');
  const primarySound = primary.filter((z) => isPrimarySound(z.key, input)).length;
  const share = primary.length === 0 ? 1 : primarySound / primary.length;
  const decided = new Set(input.decisions.map((d) => d.zoneKey));
  const sev = (k: string) => input.worstSeverity[k] ?? 0;
  const states = input.zoneStates.filter((s) => zoneKeys.has(s.zoneKey));
  return {
    mustFix: input.decisions.filter((d) => d.decisionClass === 'structural-must-fix').length,
    cosmeticOrMonitor: input.decisions.filter((d) => d.decisionClass !== 'structural-must-fix')
      .length,
    undecided: [...zoneKeys].filter((k) => sev(k) >= 2 && !decided.has(k)).length,
    active: states.filter((s) => s.state === 'active').length,
    watched: states.filter((s) => s.state === 'treated-watching').length,
    worstSeverity: Math.max(0, ...[...zoneKeys].map(sev)),
    primaryLost: primary.filter((z) => sev(z.key) >= 4).length,
    primaryUnsoundShare: 1 - share,
    primaryMembers: primary.length,
    primarySound,
  };
}

export function gradeFor(metrics: ConditionMetrics): ConditionGrade {
  const hit = CONDITION_RULES.find((r) => r.any.some((x) => metrics[x.metric] >= x.atLeast));
  return hit ? hit.grade : 'sound';
}

export function conditionSummary(input: ConditionInput): ConditionSummary {
  const m = conditionMetrics(input);
  const grade = gradeFor(m);
  const count = (c: string) => input.decisions.filter((d) => d.decisionClass === c).length;
  return {
    grade,
    gradeLabel: CONDITION_GRADE_TEXT[grade].label,
    gradeRank: CONDITION_GRADES.indexOf(grade) + 1,
    gradeText: CONDITION_GRADE_TEXT[grade].text,
    primaryMembers: m.primaryMembers,
    primarySound: m.primarySound,
    primarySoundShare: m.primaryMembers === 0 ? 1 : m.primarySound / m.primaryMembers,
    countsByClass: {
      'structural-must-fix': count('structural-must-fix'),
      cosmetic: count('cosmetic'),
      monitor: count('monitor'),
    },
    undecidedZones: m.undecided,
    activeZones: m.active,
    watchedZones: m.watched,
  };
}
