import { parseISO } from 'date-fns';
import type { RecheckStatus, ZoneState, ZoneStateResponse } from '../schemas/recheck';
import { addCalendarDays, calendarDaysBetween, localDate, spokenDate } from './dates';
import type { ClearanceRule } from './settings';

export interface ZoneFindingInput {
  zoneKey: string;
  /** The survey's date. */
  date: string;
  /** When it was recorded: what orders it against a treatment. */
  createdAt: string;
  severity: number;
  activity: string;
  insectEvidence: readonly string[];
}

export interface ZoneTreatmentInput {
  appliedAt: string;
  zoneKeys: readonly string[];
}

export interface ZoneRecheckInput {
  zoneKeys: readonly string[];
  dueDate: string;
  status: RecheckStatus;
  completedAt: string | null;
}

export interface ZoneStatesInput {
  zoneKeys: readonly string[];
  findings: readonly ZoneFindingInput[];
  treatments: readonly ZoneTreatmentInput[];
  rechecks: readonly ZoneRecheckInput[];
}

export interface ZoneStateResult {
  state: ZoneState;
  flagged: boolean;
  reason: string;
}

export const TREATMENT_FAILURE_ADVICE = 'possible treatment failure — call a licensed operator';

const time = (iso: string) => parseISO(iso).getTime();

/** Live insects are activity whatever the activity field says. */
const showsActivity = (f: ZoneFindingInput) =>
  f.activity === 'active' || f.insectEvidence.includes('live-insects');

/**
 * After a treatment the old frass is cleaned away (common practice), so frass seen later is
 * fresh unless the finding says it is inactive.
 */
const FRASS = ['frass-powder', 'frass-pellets', 'frass-fibrous'];
const freshAfterTreatment = (f: ZoneFindingInput) =>
  showsActivity(f) ||
  (f.activity !== 'inactive' && f.insectEvidence.some((e) => FRASS.includes(e)));

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

function untreatedState(findings: ZoneFindingInput[]): ZoneStateResult {
  const active = findings.filter(showsActivity);
  if (active.length > 0) {
    const latest = active.reduce((a, b) => (time(b.createdAt) > time(a.createdAt) ? b : a));
    return {
      state: 'active',
      flagged: false,
      reason: `Active evidence recorded in the survey of ${spokenDate(latest.date)}; no treatment recorded since.`,
    };
  }
  const worst = Math.max(0, ...findings.map((f) => f.severity));
  if (worst >= 1) {
    return {
      state: 'old-damage',
      flagged: false,
      reason: `Damage up to severity ${worst} without active evidence.`,
    };
  }
  return {
    state: 'no-evidence',
    flagged: false,
    reason: findings.length > 0 ? 'Findings show no damage or activity.' : 'No findings recorded.',
  };
}

/** The zone's latest treatment (of equal times, the first listed), or null when untreated. */
export function latestTreatment<T extends ZoneTreatmentInput>(
  zoneKey: string,
  treatments: readonly T[],
): T | null {
  return treatments
    .filter((t) => t.zoneKeys.includes(zoneKey))
    .reduce<T | null>((a, b) => (a && time(a.appliedAt) >= time(b.appliedAt) ? a : b), null);
}

/** The zone's re-checks completed with `status` after `appliedAt`, oldest first. */
function rechecksSince<R extends ZoneRecheckInput>(
  zoneKey: string,
  rechecks: readonly R[],
  appliedAt: string,
  status: Exclude<RecheckStatus, 'pending'>,
): R[] {
  const since = time(appliedAt);
  return rechecks
    .filter(
      (r) =>
        r.zoneKeys.includes(zoneKey) &&
        r.status === status &&
        r.completedAt !== null &&
        time(r.completedAt) > since,
    )
    .sort((a, b) => time(a.completedAt!) - time(b.completedAt!));
}

/** The clean re-checks of the zone completed after `appliedAt` (its latest treatment), oldest first. */
export const cleanRechecksSince = <R extends ZoneRecheckInput>(
  zoneKey: string,
  rechecks: readonly R[],
  appliedAt: string,
) => rechecksSince(zoneKey, rechecks, appliedAt, 'clean');

function zoneState(
  zoneKey: string,
  input: ZoneStatesInput,
  clearance: ClearanceRule,
  timeZone: string,
): ZoneStateResult {
  const findings = input.findings.filter((f) => f.zoneKey === zoneKey);
  const treatment = latestTreatment(zoneKey, input.treatments);
  if (!treatment) return untreatedState(findings);

  const treatedAt = time(treatment.appliedAt);
  const treatedOn = localDate(treatment.appliedAt, timeZone, 'appliedAt');
  const cleanChecks = cleanRechecksSince(zoneKey, input.rechecks, treatment.appliedAt);

  // Any sign of life after the latest treatment reopens the zone until it is treated again.
  const fresh = [
    ...findings
      .filter((f) => freshAfterTreatment(f) && time(f.createdAt) > treatedAt)
      .map((f) => ({ at: f.createdAt, what: 'a finding' })),
    ...rechecksSince(zoneKey, input.rechecks, treatment.appliedAt, 'fresh-evidence').map((r) => ({
      at: r.completedAt!,
      what: 'a re-check',
    })),
  ].sort((a, b) => time(a.at) - time(b.at));
  if (fresh.length > 0) {
    const first = fresh[0];
    return {
      state: 'active',
      flagged: true,
      reason: `Fresh evidence in ${first.what} on ${spokenDate(localDate(first.at, timeZone))} after the treatment of ${spokenDate(treatedOn)}: ${TREATMENT_FAILURE_ADVICE}.`,
    };
  }

  const { cleanChecksRequired: needed, minSpanDays } = clearance;
  const clean = cleanChecks.length;
  const lastCleanOn =
    clean > 0 ? localDate(cleanChecks[clean - 1].completedAt!, timeZone) : treatedOn;
  const span = calendarDaysBetween(treatedOn, lastCleanOn);
  const rule = `${plural(needed, 'clean re-check')} over at least ${plural(minSpanDays, 'day')}`;
  if (clean >= needed && span >= minSpanDays) {
    return {
      state: 'cleared',
      flagged: false,
      reason: `${plural(clean, 'clean re-check')} in a row over ${plural(span, 'day')} since the treatment of ${spokenDate(treatedOn)} (rule: ${rule}).`,
    };
  }

  const missing: string[] = [];
  if (clean < needed) missing.push(`${needed - clean} more clean`);
  if (span < minSpanDays)
    missing.push(
      `a clean re-check on or after ${spokenDate(addCalendarDays(treatedOn, minSpanDays))}`,
    );
  const next = input.rechecks
    .filter((r) => r.zoneKeys.includes(zoneKey) && r.status === 'pending')
    .map((r) => r.dueDate)
    .sort()[0];
  return {
    state: 'treated-watching',
    flagged: false,
    reason: `Treated on ${spokenDate(treatedOn)}; ${clean} of ${needed} clean re-checks so far. Clearance needs ${missing.join(' and ')} (rule: ${rule}).${next ? ` Next re-check due ${spokenDate(next)}.` : ''}`,
  };
}

/**
 * The state of each zone, derived from its records: active (activity not yet answered by a
 * later treatment), treated-watching, cleared (the clearance rule holds for the re-checks done
 * after the latest treatment, spanning from its local date to the last clean one), back to
 * active and flagged when a finding or re-check shows fresh evidence after the treatment;
 * old-damage for damage without activity. `timeZone` decides the calendar dates.
 */
export function zoneStates(
  input: ZoneStatesInput,
  clearance: ClearanceRule,
  timeZone = 'UTC',
): Record<string, ZoneStateResult> {
  return Object.fromEntries(
    input.zoneKeys.map((key) => [key, zoneState(key, input, clearance, timeZone)]),
  );
}

/** zoneStates() as API items, in the order of `input.zoneKeys`. */
export function zoneStateItems(
  input: ZoneStatesInput,
  clearance: ClearanceRule,
  timeZone = 'UTC',
): ZoneStateResponse[] {
  const states = zoneStates(input, clearance, timeZone);
  return input.zoneKeys.map((zoneKey) => ({ zoneKey, ...states[zoneKey] }));
}
