import crypto from 'node:crypto';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { ERROR_CODES } from '@/shared/schemas/common';
import {
  REPORT_KIND_LABELS,
  type CreateReportRequest,
  type ReportKind,
  type ReportResponse,
} from '@/shared/schemas/report';
import { AppError, conflict, notFound } from '../errors';
import type { ReportQueue } from '../jobs/report-queue';
import type { MemberContext } from '../middleware/workshop';
import { Report, User, Workshop } from '../models';
import type { StorageAdapter } from '../storage';
import { audit } from './audit';
import { collectReportSnapshot } from './report-snapshot';
import { describeVehicle, findVehicleFor, isUuid, renameNotFound } from './vehicle-access';
import { idTaken } from './vehicles';

/** Crockford base-32: no I, L, O or U, so an identifier read aloud or typed is not misread. */
const CROCKFORD = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';
const SHORT_ID_ATTEMPTS = 5;

export function newShortId(): string {
  const group = () =>
    Array.from({ length: 4 }, () => CROCKFORD[crypto.randomInt(CROCKFORD.length)]).join('');
  return `SF-${group()}-${group()}`;
}

/** Everything but the snapshot, which only the job reads. */
const LIGHT = { exclude: ['snapshot'] };
const CREATED_BY = { model: User, as: 'createdBy', attributes: ['id', 'name'] };

export function toReportResponse(r: Report, latest: boolean): ReportResponse {
  const ready = r.status === 'ready';
  return {
    id: r.id,
    vehicleId: r.vehicleId,
    kind: r.kind,
    version: r.version,
    shortId: r.shortId,
    status: r.status,
    progress: r.progress,
    stage: r.stage,
    error: r.error ?? null,
    sha256: r.sha256 ?? null,
    byteSize: r.byteSize ?? null,
    pageCount: r.pageCount ?? null,
    summary: r.summary ?? null,
    pdfUrl: ready ? `/api/workshops/${r.workshopId}/reports/${r.id}/pdf` : null,
    latest,
    createdByName: r.createdBy?.name ?? null,
    createdAt: r.createdAt.toISOString(),
    finishedAt: r.finishedAt ? r.finishedAt.toISOString() : null,
  };
}

/** The highest ready version of a (vehicle, kind): the one a reader should have. */
export async function latestReadyVersion(vehicleId: string, kind: ReportKind) {
  const max = (await Report.max('version', {
    where: { vehicleId, kind, status: 'ready' },
  })) as number | null;
  return max ?? 0;
}

/** The version a new report of a (vehicle, kind) gets: one past the highest made so far. */
export async function nextReportVersion(
  vehicleId: string,
  kind: ReportKind,
  transaction?: Transaction,
) {
  const where = { vehicleId, kind };
  const last = (await Report.max('version', { where, transaction })) as number | null;
  return (last ?? 0) + 1;
}

/** A report row as responses read it: LIGHT, with who made it. */
const findLight = (id: string) => Report.findByPk(id, { attributes: LIGHT, include: [CREATED_BY] });

/** A row loaded as findLight and findReportFor load it, as the API answers it. */
async function responseOf(r: Report) {
  return toReportResponse(
    r,
    r.status === 'ready' && (await latestReadyVersion(r.vehicleId, r.kind)) === r.version,
  );
}

/** A report through its vehicle's gate: another workshop's, or an unshared client's, is a 404. */
export async function findReportFor(
  member: MemberContext,
  reportId: string,
  opts: { transaction?: Transaction } = {},
) {
  if (!isUuid(reportId)) throw notFound('Report');
  const report = await Report.findOne({
    where: { id: reportId, workshopId: member.workshopId },
    attributes: LIGHT,
    include: [CREATED_BY],
    transaction: opts.transaction,
  });
  if (!report) throw notFound('Report');
  await findVehicleFor(member, report.vehicleId, opts).catch(renameNotFound('Report'));
  return report;
}

const tooMany = (limit: number) =>
  new AppError(
    429,
    ERROR_CODES.rateLimited,
    `This workshop already has ${limit} reports being generated, the most allowed at once. Wait until one is ready, then try again.`,
  );

/**
 * Freezes what the inspector sees now (the snapshot is read on the request), stores the report
 * row queued with the next version number, and hands it to the job. The workshop row is locked
 * so the in-flight limit and the version count hold under concurrent requests. A retried `id`
 * answers the first request's row.
 */
export async function createReport(
  member: MemberContext,
  vehicleId: string,
  body: CreateReportRequest,
  deps: { queue: ReportQueue; maxInFlight: number },
): Promise<{ report: ReportResponse; created: boolean }> {
  if (body.id) {
    const existing = await existingForRetry(member, body.id, vehicleId);
    if (existing) return { report: existing, created: false };
  }
  const snapshot = await collectReportSnapshot(member, vehicleId, body.kind);
  let id: string | null = null;
  for (let attempt = 0; !id; attempt++) {
    try {
      id = await insertQueued(member, vehicleId, body, snapshot, deps.maxInFlight);
    } catch (err) {
      if (!(err instanceof UniqueConstraintError)) throw err;
      if (body.id) {
        const winner = await existingForRetry(member, body.id, vehicleId);
        if (winner) return { report: winner, created: false };
      }
      // A short id drawn twice (1 in 2^40 per pair): draw again.
      if (attempt + 1 >= SHORT_ID_ATTEMPTS) throw err;
    }
  }
  deps.queue.enqueue(id);
  const report = await findLight(id);
  if (!report) throw notFound('Report');
  return { report: await responseOf(report), created: true };
}

function insertQueued(
  member: MemberContext,
  vehicleId: string,
  body: CreateReportRequest,
  snapshot: Report['snapshot'],
  maxInFlight: number,
) {
  return Report.sequelize!.transaction(async (transaction) => {
    await Workshop.findByPk(member.workshopId, {
      attributes: ['id'],
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    const vehicle = await findVehicleFor(member, vehicleId, { transaction });
    const inFlight = await Report.count({
      where: { workshopId: member.workshopId, status: { [Op.in]: ['queued', 'rendering'] } },
      transaction,
    });
    if (inFlight >= maxInFlight) throw tooMany(maxInFlight);
    const report = await Report.create(
      {
        ...(body.id ? { id: body.id } : {}),
        workshopId: member.workshopId,
        vehicleId: vehicle.id,
        kind: body.kind,
        version: await nextReportVersion(vehicle.id, body.kind, transaction),
        shortId: newShortId(),
        stage: 'Waiting to start',
        snapshot,
        createdById: member.userId,
      },
      { transaction },
    );
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'report.create',
      entityType: 'report',
      entityId: report.id,
      summary: `Started ${REPORT_KIND_LABELS[body.kind]} ${report.shortId} (version ${report.version}) for ${describeVehicle(vehicle)}`,
      changes: { kind: body.kind, version: report.version, shortId: report.shortId },
    });
    return report.id;
  });
}

async function existingForRetry(member: MemberContext, id: string, vehicleId: string) {
  const row = await findLight(id);
  if (!row) return null;
  if (row.workshopId !== member.workshopId || row.vehicleId !== vehicleId) throw idTaken();
  await findVehicleFor(member, vehicleId);
  return responseOf(row);
}

/** Every report of the vehicle, newest first; `latest` marks the newest ready version per kind. */
export async function listReports(member: MemberContext, vehicleId: string) {
  const vehicle = await findVehicleFor(member, vehicleId);
  const rows = await Report.findAll({
    where: { vehicleId: vehicle.id },
    attributes: LIGHT,
    include: [CREATED_BY],
    order: [
      ['createdAt', 'DESC'],
      ['version', 'DESC'],
    ],
  });
  const newest = new Map<ReportKind, number>();
  for (const r of rows)
    if (r.status === 'ready') newest.set(r.kind, Math.max(newest.get(r.kind) ?? 0, r.version));
  return rows.map((r) =>
    toReportResponse(r, r.status === 'ready' && newest.get(r.kind) === r.version),
  );
}

export async function getReport(member: MemberContext, reportId: string) {
  return responseOf(await findReportFor(member, reportId));
}

const notReady = () => conflict('This report is not ready yet. Wait until it is generated.');

export const reportFileName = (r: Pick<Report, 'kind' | 'shortId' | 'version'>) =>
  `soundframe-${r.kind}-${r.shortId}-v${r.version}.pdf`;

/** The stored PDF bytes of a ready report (409 while it is being made). */
export async function readReportPdf(report: Report, storage: StorageAdapter) {
  if (report.status !== 'ready' || !report.storageKey) throw notReady();
  const pdf = await storage.get(report.storageKey);
  if (!pdf) throw notFound('Report file');
  return { pdf, fileName: reportFileName(report) };
}

export async function downloadReport(
  member: MemberContext,
  reportId: string,
  storage: StorageAdapter,
) {
  return readReportPdf(await findReportFor(member, reportId), storage);
}
