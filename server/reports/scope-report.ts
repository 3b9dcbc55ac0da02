/** The repair scope, page by page, in the order an owner reads it. */
import type { RepairScope, ReportSnapshot } from '@/shared/reports/types';
import { REPORT_KIND_LABELS } from '@/shared/schemas/report';
import { drawPhotoAppendix, type AppendixGroup } from './appendix';
import { drawCautions, drawLimitations, drawNotInspected } from './common-sections';
import { drawConditionBox, drawCover } from './cover';
import { drawBodyDiagram } from './diagram';
import { hours, money } from './format';
import { heading, type Doc } from './layout';
import { drawMonitor, drawStructuralAndCosmetic, drawUndecided } from './scope-items';
import { drawCutList, drawTotals, drawTreatments, drawWorkOrder } from './scope-tables';
import type { RenderDeps, RenderIdentity, RenderProgress } from './types';

export function photoCaptions(snapshot: ReportSnapshot): Map<string, string> {
  const captions = new Map<string, string>();
  for (const f of snapshot.findings)
    for (const p of f.photos) captions.set(p.id, p.caption || `Finding of ${f.surveyDate}`);
  return captions;
}

/** One group per zone, in the order the zones appear in the report. */
export function photoGroups(
  items: { zoneLabel: string; photoIds: string[] }[],
  captions: Map<string, string>,
): AppendixGroup[] {
  return items
    .filter((i) => i.photoIds.length)
    .map((i) => ({
      title: i.zoneLabel,
      photos: i.photoIds.map((id) => ({ photoId: id, caption: captions.get(id) ?? '' })),
    }));
}

/** The open findings' photos of a zone with damage but no decision yet. */
export const undecidedPhotos =
  (snapshot: ReportSnapshot) => (u: RepairScope['undecided'][number]) => ({
    zoneLabel: u.zoneLabel,
    photoIds: snapshot.findings
      .filter((f) => f.zoneKey === u.zoneKey)
      .flatMap((f) => f.photos.map((p) => p.id)),
  });

export async function drawRepairScope(
  doc: Doc,
  scope: RepairScope,
  snapshot: ReportSnapshot,
  identity: RenderIdentity,
  deps: RenderDeps,
  onProgress: RenderProgress,
): Promise<number> {
  drawCover(doc, scope.cover, identity, REPORT_KIND_LABELS['repair-scope']);
  const t = scope.totals;
  drawConditionBox(doc, scope.condition, {
    extra: [`Estimated work: ${hours(t.hours)}, ${money(t.totalCost, t.currency)} in all.`],
  });
  await onProgress(15, 'Drawing the body diagram');
  heading(doc, 'Body diagram', 2);
  drawBodyDiagram(doc, scope.bodyPlanKey, scope.zoneSeverity, {
    watched: scope.monitor.map((m) => m.zoneKey),
  });
  await onProgress(30, 'Writing the sections');
  doc.addPage();
  drawStructuralAndCosmetic(doc, scope);
  drawMonitor(doc, scope);
  drawUndecided(doc, scope);
  drawTotals(doc, scope);
  drawCutList(doc, scope);
  drawWorkOrder(doc, scope);
  drawTreatments(doc, scope);
  drawNotInspected(doc, scope.notInspected);
  drawLimitations(doc, scope.limitations);
  drawCautions(doc, scope.cautions);
  await onProgress(50, 'Embedding photos');
  const items = [
    ...scope.structural,
    ...scope.cosmetic,
    ...scope.monitor.flatMap((m) => (m.decision ? [m.decision] : [])),
    ...scope.undecided.map(undecidedPhotos(snapshot)),
  ];
  return drawPhotoAppendix(
    doc,
    photoGroups(items, photoCaptions(snapshot)),
    deps,
    onProgress,
    { from: 50, to: 90 },
    'Photographs of the zones in this scope, grouped by zone in the order they appear above.',
  );
}
