import type { Express } from 'express';
import request from 'supertest';
import { Report } from '@/server/models';
import { collectReportSnapshot } from '@/server/services/report-snapshot';
import { newShortId, nextReportVersion } from '@/server/services/reports';
import type { ReportKind, ReportResponse } from '@/shared/schemas/report';
import { contextOf, type createMember } from './index';

type Member = Awaited<ReturnType<typeof createMember>>;

/** Polls the report until the job is done with it (ready or failed). */
export async function waitForReport(
  app: Express,
  member: Member,
  report: Pick<ReportResponse, 'id'>,
  timeoutMs = 60_000,
): Promise<ReportResponse> {
  const workshopId = member.membership.workshopId;
  const until = Date.now() + timeoutMs;
  for (;;) {
    const res = await request(app)
      .get(`/api/workshops/${workshopId}/reports/${report.id}`)
      .set(member.auth);
    if (res.status !== 200) throw new Error(`GET report answered ${res.status}`);
    const body = res.body as ReportResponse;
    if (body.status === 'ready' || body.status === 'failed') return body;
    if (Date.now() > until) throw new Error(`Report still ${body.status} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Generates a report through the API (202) and waits until it is ready; a failure throws. */
export async function generateReport(
  app: Express,
  member: Member,
  vehicleId: string,
  kind: ReportKind = 'repair-scope',
): Promise<ReportResponse> {
  const res = await request(app)
    .post(`/api/workshops/${member.membership.workshopId}/vehicles/${vehicleId}/reports`)
    .set(member.auth)
    .send({ kind });
  if (res.status !== 202) throw new Error(`POST report answered ${res.status}: ${res.text}`);
  const done = await waitForReport(app, member, res.body as ReportResponse);
  if (done.status !== 'ready') throw new Error(`Report failed: ${done.error}`);
  return done;
}

/** The downloaded bytes of a ready report, as a member gets them. */
export async function downloadPdf(app: Express, member: Member, report: ReportResponse) {
  const res = await request(app)
    .get(report.pdfUrl!)
    .set(member.auth)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
  return { res, pdf: res.body as Buffer };
}

/**
 * A report row left queued as a request leaves it (real snapshot, next version), without telling
 * any queue: for the in-flight limit and for driving a queue of the test's own.
 */
export async function insertQueuedReport(
  member: Member,
  vehicleId: string,
  kind: ReportKind = 'repair-scope',
) {
  const snapshot = await collectReportSnapshot(contextOf(member.membership), vehicleId, kind);
  return Report.create({
    workshopId: member.membership.workshopId,
    vehicleId,
    kind,
    version: await nextReportVersion(vehicleId, kind),
    shortId: newShortId(),
    snapshot,
    createdById: member.user.id,
  });
}

/**
 * A ready report on another vehicle of the same workshop that points at an already generated
 * report's stored PDF: a row as the job leaves it, without rendering again (for wide role tables).
 */
export async function cloneReadyReport(fromId: string, vehicleId: string) {
  const from = await Report.findByPk(fromId);
  if (from?.status !== 'ready') throw new Error('cloneReadyReport needs a ready report');
  const { id: _id, shortId: _s, createdAt: _c, updatedAt: _u, ...fields } = from.get();
  return Report.create({
    ...fields,
    vehicleId,
    version: await nextReportVersion(vehicleId, from.kind),
    shortId: newShortId(),
  });
}
