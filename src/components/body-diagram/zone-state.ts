/**
 * A zone's treatment state as drawn: an outline pattern and a short word on the drawing, a
 * longer label in the sheet. Never colour alone. The words are Soundframe's own.
 */
import { ZONE_STATE_LABELS, type ZoneState as ZoneStateKey } from '@/shared/schemas/recheck';

export { ZONE_STATE_LABELS, type ZoneStateKey };
export type ZoneStateCue = { state: ZoneStateKey; flagged: boolean; reason?: string };
export const FLAGGED_LABEL = 'Possible treatment failure — call a licensed operator';

/** The word drawn under the zone's number (kept short to fit a sill). */
export const ZONE_STATE_SHORT: Record<ZoneStateKey, string | null> = {
  'no-evidence': null,
  active: 'ACTIVE',
  'treated-watching': 'WATCH',
  cleared: 'CLEAR',
  'old-damage': 'OLD',
};

/** Outline dash pattern in screen pixels (null: no extra outline). */
export const ZONE_STATE_DASH: Record<ZoneStateKey, number[] | null> = {
  'no-evidence': null,
  active: [],
  'treated-watching': [7, 4],
  cleared: [1.5, 4],
  'old-damage': [10, 3, 2, 3],
};

export function zoneStateLabel(cue: ZoneStateCue | undefined): string | null {
  if (!cue || cue.state === 'no-evidence') return null;
  return cue.flagged
    ? `${ZONE_STATE_LABELS[cue.state]}, ${FLAGGED_LABEL}`
    : ZONE_STATE_LABELS[cue.state];
}
