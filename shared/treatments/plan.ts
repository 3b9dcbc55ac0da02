import type { TreatmentMethod, TreatmentTarget } from '../schemas/treatment';
import type { AgentKey } from '../wood/types';
import { addCalendarDays, localDate } from './dates';
import type { PlanGroup, TreatmentSettings } from './settings';

const AGENT_GROUPS: Record<AgentKey, PlanGroup> = {
  'brown-rot-fungi': 'fungi',
  'white-rot-fungi': 'fungi',
  'soft-rot-fungi': 'fungi',
  'drywood-termites': 'termites',
  'subterranean-termites': 'termites',
  'lyctid-beetles': 'beetles',
  'anobiid-beetles': 'beetles',
  'bostrichid-beetles': 'beetles',
  'old-house-borer': 'beetles',
  'carpenter-ants': 'ants',
};

/**
 * Which of the workshop's re-check plans follows a treatment. The agent decides; when it is not
 * known, a bait points to termites (bait stations against wood-destroying insects are termite
 * colony baits in common practice) and everything else follows the "other" plan. Fumigation of
 * drywood termites follows the termite plan, whose first check at 7 days allows for termites
 * that live up to a week after a lethal dose.
 */
export function planGroupFor(agent: TreatmentTarget, method: TreatmentMethod): PlanGroup {
  if (agent !== 'unknown') return AGENT_GROUPS[agent];
  return method === 'bait' ? 'termites' : 'other';
}

/**
 * The due dates ('YYYY-MM-DD', ascending) of the re-checks a treatment creates: the plan's day
 * offsets counted from the calendar date of `appliedAt` in the workshop's time zone.
 */
export function recheckDueDates(
  appliedAt: string,
  agent: TreatmentTarget,
  method: TreatmentMethod,
  settings: Pick<TreatmentSettings, 'recheckPlans' | 'timeZone'>,
): string[] {
  const start = localDate(appliedAt, settings.timeZone, 'appliedAt');
  const offsets = [...new Set(settings.recheckPlans[planGroupFor(agent, method)])].sort(
    (a, b) => a - b,
  );
  return offsets.map((days) => addCalendarDays(start, days));
}
