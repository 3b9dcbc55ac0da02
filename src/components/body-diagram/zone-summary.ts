import type { FindingResponse } from '@/shared/schemas';

export type ZoneSummary = { worstSeverity: number | null; count: number };
export type DiagramPin = { id: string; zoneKey: string; x: number; y: number; severity: number };

/** Worst severity and count per zone, from the open (not removed) findings given. */
export function summarizeZones(findings: FindingResponse[]): Record<string, ZoneSummary> {
  const out: Record<string, ZoneSummary> = {};
  for (const f of findings) {
    if (f.deletedAt) continue;
    const s = out[f.zoneKey] ?? { worstSeverity: null, count: 0 };
    s.count += 1;
    s.worstSeverity = s.worstSeverity === null ? f.severity : Math.max(s.worstSeverity, f.severity);
    out[f.zoneKey] = s;
  }
  return out;
}

/** Pins of the open findings that were placed on this view. */
export function pinsForView(findings: FindingResponse[], view: string): DiagramPin[] {
  return findings
    .filter((f) => !f.deletedAt && f.pin && f.pin.view === view)
    .map((f) => ({ id: f.id, zoneKey: f.zoneKey, x: f.pin!.x, y: f.pin!.y, severity: f.severity }));
}

/** "Left sill, severity 3, 2 findings" — what a screen reader announces for a zone. */
export function zoneAccessibilityLabel(label: string, summary: ZoneSummary | undefined): string {
  if (!summary || summary.count === 0 || summary.worstSeverity === null)
    return `${label}, nothing logged`;
  const n = summary.count === 1 ? '1 finding' : `${summary.count} findings`;
  return `${label}, severity ${summary.worstSeverity}, ${n}`;
}
