import crypto from 'node:crypto';
import type { Request } from 'express';
import { Op } from 'sequelize';
import { Photo, Report } from '../models';
import { renderReport } from '../reports/render';
import type { RenderReport } from '../reports/types';
import type { StorageAdapter } from '../storage';

export type ReportQueue = {
  /** Renders the queued report soon (at most `concurrency` at once in this process). */
  enqueue(reportId: string): void;
  /**
   * Offers again the queued reports, and the rendering ones whose process has gone quiet (no
   * heartbeat for `staleAfterMs`); returns how many were offered. Safe to run from every process.
   */
  recover(): Promise<number>;
  /** Resolves once nothing is waiting or rendering. */
  idle(): Promise<void>;
  /** No new renders start; resolves once those in progress are stored. Waiting ones stay queued. */
  stop(): Promise<void>;
};

/** Each render attempt stores under its own key, so a displaced attempt never overwrites the PDF. */
export const reportPdfKey = (workshopId: string, reportId: string, attempt: string) =>
  `reports/${workshopId}/${reportId}-${attempt}.pdf`;

/** How often a render says it is still at work, and how long a silent one is trusted. */
export const REPORT_HEARTBEAT_MS = 10_000;
export const REPORT_STALE_AFTER_MS = 60_000;

/** Progress writes are at most this often per report (the client polls about once a second). */
const PROGRESS_EVERY_MS = 400;

export function reportQueueOf(req: Request): ReportQueue {
  return req.app.locals.reportQueue as ReportQueue;
}

/**
 * The in-process report job. Its state is the `reports` table: a row is claimed by moving it from
 * queued to rendering under this process's `instanceId`, so a report offered twice (or by two
 * processes) is rendered once. A render refreshes its heartbeat while it works; only the claiming
 * process may record the outcome. Work starts when a report is enqueued or one finishes; the only
 * timer is a render's heartbeat, so an idle queue keeps nothing alive.
 */
export function createReportQueue({
  storage,
  concurrency,
  instanceId = `reports-${crypto.randomBytes(4).toString('hex')}`,
  heartbeatMs = REPORT_HEARTBEAT_MS,
  staleAfterMs = REPORT_STALE_AFTER_MS,
  render = renderReport,
  verifyUrl = () => null,
  onError = (error) => console.error('Report generation failed:', error),
}: {
  storage: StorageAdapter;
  concurrency: number;
  /** Names this process in claims (config.instanceId). */
  instanceId?: string;
  heartbeatMs?: number;
  staleAfterMs?: number;
  render?: RenderReport;
  /** The verification page's address, printed on each report (known once the server listens). */
  verifyUrl?: () => string | null;
  onError?: (error: unknown) => void;
}): ReportQueue {
  const waiting: string[] = [];
  const active = new Set<Promise<void>>();
  let idleWaiters: (() => void)[] = [];
  let stopped = false;

  const settleIdle = () => {
    if (waiting.length > 0 || active.size > 0) return;
    for (const resolve of idleWaiters) resolve();
    idleWaiters = [];
  };

  const pump = () => {
    while (!stopped && active.size < concurrency && waiting.length > 0) {
      const id = waiting.shift()!;
      const run: Promise<void> = generate(id, {
        storage,
        render,
        verifyUrl: verifyUrl(),
        instanceId,
        heartbeatMs,
      })
        .catch(onError)
        .finally(() => {
          active.delete(run);
          pump();
          settleIdle();
        });
      active.add(run);
    }
    settleIdle();
  };

  return {
    enqueue(reportId) {
      if (stopped || waiting.includes(reportId)) return;
      waiting.push(reportId);
      pump();
    },
    async recover() {
      // A rendering row whose heartbeat went quiet was cut off (a restart, a crash, another
      // process gone); a live one belongs to a process still at work and is left alone.
      await Report.update(
        {
          status: 'queued',
          progress: 0,
          stage: 'Waiting to start again',
          startedAt: null,
          claimedBy: null,
          heartbeatAt: null,
        },
        {
          where: {
            status: 'rendering',
            [Op.or]: [
              { heartbeatAt: null },
              { heartbeatAt: { [Op.lt]: new Date(Date.now() - staleAfterMs) } },
            ],
          },
        },
      );
      const rows = await Report.findAll({
        where: { status: 'queued' },
        attributes: ['id'],
        order: [['createdAt', 'ASC']],
      });
      for (const r of rows) this.enqueue(r.id);
      return rows.length;
    },
    idle() {
      if (waiting.length === 0 && active.size === 0) return Promise.resolve();
      return new Promise((resolve) => idleWaiters.push(resolve));
    },
    async stop() {
      stopped = true;
      waiting.length = 0;
      await Promise.allSettled([...active]);
      settleIdle();
    },
  };
}

/**
 * Claims, renders, stores and records one report; a failure is recorded on the row in plain words.
 * Every write after the claim names the claim, so a process whose claim was taken over (it went
 * quiet for too long) records nothing and removes the file it stored.
 */
async function generate(
  reportId: string,
  {
    storage,
    render,
    verifyUrl,
    instanceId,
    heartbeatMs,
  }: {
    storage: StorageAdapter;
    render: RenderReport;
    verifyUrl: string | null;
    instanceId: string;
    heartbeatMs: number;
  },
) {
  const [claimed] = await Report.update(
    {
      status: 'rendering',
      startedAt: new Date(),
      progress: 0,
      stage: 'Starting',
      claimedBy: instanceId,
      heartbeatAt: new Date(),
    },
    { where: { id: reportId, status: 'queued' } },
  );
  if (claimed === 0) return;
  const report = await Report.findByPk(reportId);
  if (!report) return;
  const ours = { id: reportId, status: 'rendering' as const, claimedBy: instanceId };
  const attempt = crypto.randomBytes(4).toString('hex');
  const heartbeat = setInterval(() => {
    Report.update({ heartbeatAt: new Date() }, { where: ours }).catch(() => undefined);
  }, heartbeatMs);
  heartbeat.unref();

  let lastWrite = 0;
  let lastStage = '';
  let writing: Promise<unknown> = Promise.resolve();
  const onProgress = (progress: number, stage: string) => {
    const now = Date.now();
    if (stage === lastStage && now - lastWrite < PROGRESS_EVERY_MS) return;
    lastWrite = now;
    lastStage = stage;
    const value = Math.max(0, Math.min(99, Math.round(progress)));
    writing = writing.then(() =>
      Report.update(
        { progress: value, stage: stage.slice(0, 120), heartbeatAt: new Date() },
        { where: { ...ours, progress: { [Op.lte]: value } } },
      ),
    );
  };

  try {
    const photoIds = new Set(report.snapshot.findings.flatMap((f) => f.photos.map((p) => p.id)));
    // Only this workshop's photos, however the snapshot came to name them.
    const photos = await Photo.findAll({
      where: { id: [...photoIds], workshopId: report.workshopId },
      attributes: ['id', 'displayKey'],
    });
    const displayKeys = new Map(photos.map((p) => [p.id, p.displayKey]));
    const loadPhoto = async (photoId: string) => {
      const key = displayKeys.get(photoId);
      return key ? storage.get(key) : null;
    };
    const rendered = await render(
      report.snapshot,
      { shortId: report.shortId, version: report.version, verifyUrl },
      { loadPhoto },
      onProgress,
    );
    await writing;
    const key = reportPdfKey(report.workshopId, report.id, attempt);
    await storage.put(key, rendered.pdf, 'application/pdf');
    const [recorded] = await Report.update(
      {
        status: 'ready',
        progress: 100,
        stage: 'Ready',
        error: null,
        storageKey: key,
        sha256: crypto.createHash('sha256').update(rendered.pdf).digest('hex'),
        byteSize: rendered.pdf.length,
        pageCount: rendered.pageCount,
        summary: rendered.summary,
        finishedAt: new Date(),
      },
      { where: ours },
    );
    // Another process took the report over: its PDF is the one on record, not this one.
    if (recorded === 0) await storage.delete(key);
  } catch (error) {
    await writing.catch(() => undefined);
    await Report.update(
      {
        status: 'failed',
        stage: 'Failed',
        error: `The PDF could not be made (${
          error instanceof Error ? error.message : String(error)
        }). Generate the report again; the failed attempt is kept for reference.`.slice(0, 1000),
        finishedAt: new Date(),
      },
      { where: ours },
    );
    throw error;
  } finally {
    clearInterval(heartbeat);
  }
}
