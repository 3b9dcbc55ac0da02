/**
 * The buyer's condition report: plain words on one or two pages, then the photographs of
 * what must be fixed. It is drawn from the same repair scope, so no structural item is missing.
 */
import type { ConditionReport, RepairScope, ReportSnapshot } from '@/shared/reports/types';
import { REPORT_KIND_LABELS } from '@/shared/schemas/report';
import { drawPhotoAppendix } from './appendix';
import { drawCautions, drawLimitations, drawNotInspected } from './common-sections';
import { drawConditionBox, drawCover } from './cover';
import { drawBodyDiagram } from './diagram';
import { longDate } from './format';
import { MUTED, bullets, emptyNote, heading, para, type Doc } from './layout';
import { photoCaptions, photoGroups, undecidedPhotos } from './scope-report';
import type { RenderDeps, RenderIdentity, RenderProgress } from './types';

function drawWho(doc: Doc, snapshot: ReportSnapshot) {
  heading(doc, 'Who looked at the body, and when', 2);
  if (!snapshot.surveys.length) return emptyNote(doc, 'No survey has been recorded.');
  bullets(
    doc,
    snapshot.surveys.map(
      (s) =>
        `${longDate(s.date)}: surveyed by ${s.inspectorName ?? 'an inspector no longer listed'} of ${snapshot.workshop.name}.`,
    ),
  );
}

export async function drawConditionReport(
  doc: Doc,
  report: ConditionReport,
  scope: RepairScope,
  snapshot: ReportSnapshot,
  identity: RenderIdentity,
  deps: RenderDeps,
  onProgress: RenderProgress,
): Promise<number> {
  drawCover(doc, report.cover, identity, REPORT_KIND_LABELS.condition);
  // headline[0] repeats the grade the box's title and first line already give.
  drawConditionBox(doc, report.condition, { body: report.headline.slice(1) });
  await onProgress(15, 'Drawing the body diagram');
  drawBodyDiagram(doc, report.bodyPlanKey, report.zoneSeverity, {
    scale: 0.62,
    watched: scope.monitor.map((m) => m.zoneKey),
  });
  await onProgress(30, 'Writing the sections');
  heading(doc, 'What must be fixed before the body can be relied on', 2);
  if (report.mustFix.length)
    bullets(
      doc,
      report.mustFix.map((m) => m.plain),
    );
  else emptyNote(doc, 'No structural member was found that must be fixed.');
  if (scope.undecided.length) {
    heading(doc, 'Damage not yet assessed for repair', 2);
    bullets(
      doc,
      scope.undecided.map(
        (u) =>
          `${u.zoneLabel}: ${u.findings[0] ?? `severity ${u.worstSeverity}`}. Ask the workshop for its verdict before relying on this member.`,
      ),
    );
  }
  heading(doc, 'Insects and decay: live or recent attack', 2);
  if (report.infestations.length)
    bullets(
      doc,
      report.infestations.map((i) => i.plain),
    );
  else emptyNote(doc, 'No live or recently treated attack was found.');
  drawWho(doc, snapshot);
  drawNotInspected(doc, report.notInspected, 'What could not be inspected', true);
  drawLimitations(doc, report.limitations, 'What a visual survey cannot tell you', true);
  drawCautions(doc, report.cautions, 'Safety and the law', true);
  para(
    doc,
    'The full repair scope, with costs and the order of work, is available from the workshop.',
    {
      color: MUTED,
    },
  );
  await onProgress(50, 'Embedding photos');
  return drawPhotoAppendix(
    doc,
    photoGroups(
      [...scope.structural, ...scope.undecided.map(undecidedPhotos(snapshot))],
      photoCaptions(snapshot),
    ),
    deps,
    onProgress,
    { from: 50, to: 90 },
    'Photographs of the members that must be fixed, then of damage not yet assessed, in the order listed above.',
  );
}
