import type { ZoneStateResponse } from '@/shared/schemas/recheck';
import type { ZoneStateCue } from '@/src/components/body-diagram';

/** The server's list of zone states keyed by zone, as the diagram and sheet read them. */
export function zoneStateMap(items: ZoneStateResponse[] | undefined): Record<string, ZoneStateCue> {
  const out: Record<string, ZoneStateCue> = {};
  for (const s of items ?? [])
    out[s.zoneKey] = { state: s.state, flagged: s.flagged, reason: s.reason };
  return out;
}
