/**
 * renderReport(): snapshot → PDF bytes. Both kinds start from the same repair scope (the buyer's
 * report is derived from it), set the document info the verifier reads back, then stamp
 * "Page N of M" and the identifier on every page once all pages exist.
 */
import { getBodyPlan } from '@/shared/body-plans';
import { buildRepairScope, conditionReportFromScope, reportSummary } from '@/shared/reports';
import { REPORT_KIND_LABELS } from '@/shared/schemas/report';
import { drawConditionReport } from './condition-report';
import { createDoc, footers, type Doc } from './layout';
import { drawRepairScope } from './scope-report';
import type { RenderReport } from './types';

function toBuffer(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
}

export const renderReport: RenderReport = async (snapshot, identity, deps, onProgress) => {
  await onProgress(5, 'Reading the survey records');
  const plan = getBodyPlan(snapshot.vehicle.bodyPlanKey);
  if (!plan) throw new Error(`Unknown body plan ${snapshot.vehicle.bodyPlanKey}`);
  const scope = buildRepairScope(snapshot, plan);
  const kindLabel = REPORT_KIND_LABELS[snapshot.kind];
  const { vehicleTitle } = scope.cover;
  const doc = createDoc(snapshot.workshop.settings.paperSize, {
    title: `${kindLabel}: ${vehicleTitle}`,
    author: snapshot.workshop.name,
    subject: `${kindLabel} for the ${vehicleTitle}, report ${identity.shortId} version ${identity.version}`,
    keywords: `${identity.shortId}, version ${identity.version}, ${snapshot.kind}`,
    reportId: identity.shortId,
  });
  const bytes = toBuffer(doc);
  const buyer = snapshot.kind === 'condition' ? conditionReportFromScope(scope) : undefined;
  const photoCount = buyer
    ? await drawConditionReport(doc, buyer, scope, snapshot, identity, deps, onProgress)
    : await drawRepairScope(doc, scope, snapshot, identity, deps, onProgress);
  await onProgress(95, 'Finishing');
  footers(
    doc,
    `${kindLabel} · ${vehicleTitle} · ${identity.shortId} · version ${identity.version}`,
  );
  const pageCount = doc.bufferedPageRange().count;
  doc.end();
  const pdf = await bytes;
  await onProgress(100, 'Ready');
  return { pdf, pageCount, summary: reportSummary(snapshot.kind, scope, buyer), photoCount };
};
