import crypto from 'node:crypto';
import request from 'supertest';
import { createReportQueue, reportPdfKey } from '@/server/jobs/report-queue';
import { AuditEntry, Report } from '@/server/models';
import { renderReport } from '@/server/reports/render';
import type { RenderReport } from '@/server/reports/types';
import type { StorageAdapter } from '@/server/storage';
import { z } from 'zod';
import { reportResponse, SHORT_ID_PATTERN } from '@/shared/schemas/report';
import { createMember, createWorkshopWithTeam } from '../factories';
import { createStructuralDecision } from '../factories/decisions';
import { appStorage } from '../factories/photos';
import {
  downloadPdf,
  generateReport,
  insertQueuedReport,
  waitForReport,
} from '../factories/reports';
import { createVehicleScenario } from '../factories/scenario';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let storage: StorageAdapter;
type Scenario = Awaited<ReturnType<typeof createVehicleScenario>>;

beforeAll(() => {
  t = buildTestApp();
  storage = appStorage(t.app);
});
afterAll(async () => {
  await t.close();
});

/** A shared vehicle with a finding, its photo, and a structural member decision on that zone. */
async function scenario(): Promise<Scenario> {
  const s = await createVehicleScenario(t.config, storage, { shared: true });
  await createStructuralDecision(s.vehicle);
  return s;
}

const base = (s: Scenario) => `/api/workshops/${s.workshop.id}`;
const listReportsResponse = z.object({ items: z.array(reportResponse) });
const sha256 = (b: Buffer) => crypto.createHash('sha256').update(b).digest('hex');

describe('generating a report', () => {
  let s: Scenario;
  beforeAll(async () => {
    s = await scenario();
  });

  it('answers 202 queued, then the job stores the PDF with the SHA-256 of its exact bytes', async () => {
    const res = await request(t.app)
      .post(`${base(s)}/vehicles/${s.vehicle.id}/reports`)
      .set(s.inspector.auth)
      .send({ kind: 'repair-scope' });
    expect(res.status).toBe(202);
    const queued = reportResponse.parse(res.body);
    expect(queued).toMatchObject({ version: 1, status: 'queued', pdfUrl: null, latest: false });
    expect(queued.shortId).toMatch(SHORT_ID_PATTERN);
    expect(queued.createdByName).toBe(s.inspector.user.name);

    const audit = await AuditEntry.findOne({
      where: { entityId: queued.id, action: 'report.create' },
    });
    expect(audit?.actorId).toBe(s.inspector.user.id);

    const ready = await waitForReport(t.app, s.inspector, queued);
    expect(ready).toMatchObject({ status: 'ready', progress: 100, latest: true });
    expect(ready.summary?.kind).toBe('repair-scope');

    const { res: download, pdf } = await downloadPdf(t.app, s.inspector, ready);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(download.headers['content-disposition']).toBe(
      `attachment; filename="soundframe-repair-scope-${ready.shortId}-v1.pdf"`,
    );
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(ready.sha256).toBe(sha256(pdf));
    expect(ready.byteSize).toBe(pdf.length);

    const row = await Report.findByPk(ready.id);
    expect(row).toMatchObject({
      status: 'ready',
      sha256: sha256(pdf),
      byteSize: pdf.length,
    });
    // One key per render attempt, under the workshop and report.
    expect(row!.storageKey).toMatch(
      new RegExp(`^${reportPdfKey(s.workshop.id, ready.id, '[0-9a-f]{8}')}$`),
    );
    expect(row!.claimedBy).toBe(t.config.instanceId);
    expect(row!.pageCount).toBeGreaterThanOrEqual(1);
    expect(row!.startedAt!.getTime()).toBeLessThanOrEqual(row!.finishedAt!.getTime());
    // The inputs are frozen on the row: the vehicle and the decision the inspector saw.
    expect(row!.snapshot.vehicle.id).toBe(s.vehicle.id);
    expect(row!.snapshot.decisions.map((d) => d.zoneKey)).toEqual(['sill-left']);
  });

  it('makes a new version on regenerating; the old one stays downloadable and unchanged', async () => {
    const v = await scenario();
    const first = await generateReport(t.app, v.owner, v.vehicle.id, 'condition');
    const second = await generateReport(t.app, v.owner, v.vehicle.id, 'condition');
    const scope = await generateReport(t.app, v.owner, v.vehicle.id, 'repair-scope');
    expect([first.version, second.version, scope.version]).toEqual([1, 2, 1]);
    expect(second.shortId).not.toBe(first.shortId);

    const list = await request(t.app)
      .get(`${base(v)}/vehicles/${v.vehicle.id}/reports`)
      .set(v.client.auth);
    expect(list.status).toBe(200);
    const items = listReportsResponse.parse(list.body).items;
    expect(items.map((i) => [i.kind, i.version, i.latest])).toEqual([
      ['repair-scope', 1, true],
      ['condition', 2, true],
      ['condition', 1, false],
    ]);

    const old = await downloadPdf(t.app, v.owner, first);
    expect(old.res.status).toBe(200);
    expect(sha256(old.pdf)).toBe(first.sha256);
    expect(first.sha256).not.toBe(second.sha256);
  });

  it('answers a retried id with the first request’s report (200) and stores one row', async () => {
    const id = crypto.randomUUID();
    const url = `${base(s)}/vehicles/${s.vehicle.id}/reports`;
    const a = await request(t.app).post(url).set(s.owner.auth).send({ id, kind: 'condition' });
    const b = await request(t.app).post(url).set(s.owner.auth).send({ id, kind: 'condition' });
    expect([a.status, b.status]).toEqual([202, 200]);
    expect(b.body.id).toBe(id);
    expect(b.body.version).toBe(a.body.version);
    expect(await Report.count({ where: { id } })).toBe(1);
    await waitForReport(t.app, s.owner, { id });
  });

  it('names the field of a bad request', async () => {
    const res = await request(t.app)
      .post(`${base(s)}/vehicles/${s.vehicle.id}/reports`)
      .set(s.owner.auth)
      .send({ kind: 'brochure' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['kind']);
  });

  it('answers 409 for the PDF of a report still being made', async () => {
    const row = await insertQueuedReport(s.owner, s.vehicle.id);
    const res = await request(t.app)
      .get(`${base(s)}/reports/${row.id}/pdf`)
      .set(s.owner.auth);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/not ready/);
    await row.update({ status: 'failed' });
  });
});

describe('limits', () => {
  it('refuses a workshop’s fourth report in flight with 429 naming the limit, inserting nothing', async () => {
    const s = await scenario();
    const queued = [];
    for (let i = 0; i < t.config.reports.maxInFlight; i++)
      queued.push(await insertQueuedReport(s.owner, s.vehicle.id));
    const rows = await Report.count({ where: { workshopId: s.workshop.id } });
    const audits = await AuditEntry.count({ where: { workshopId: s.workshop.id } });

    const url = `${base(s)}/vehicles/${s.vehicle.id}/reports`;
    const refused = await request(t.app).post(url).set(s.owner.auth).send({ kind: 'condition' });
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toContain(`${t.config.reports.maxInFlight} reports`);
    expect(await Report.count({ where: { workshopId: s.workshop.id } })).toBe(rows);
    expect(await AuditEntry.count({ where: { workshopId: s.workshop.id } })).toBe(audits);

    // One finishing (here: failing) frees a place.
    await queued[0].update({ status: 'failed' });
    const accepted = await request(t.app).post(url).set(s.owner.auth).send({ kind: 'condition' });
    expect(accepted.status).toBe(202);
    await Report.update({ status: 'failed' }, { where: { id: queued.map((q) => q.id) } });
    await waitForReport(t.app, s.owner, accepted.body);
  });

  it('renders at most REPORT_CONCURRENCY reports at once across workshops, then every one', async () => {
    const [a, b] = [await scenario(), await scenario()];
    const rows = [
      await insertQueuedReport(a.owner, a.vehicle.id),
      await insertQueuedReport(b.owner, b.vehicle.id),
      await insertQueuedReport(a.owner, a.vehicle.id, 'condition'),
      await insertQueuedReport(b.owner, b.vehicle.id, 'condition'),
    ];
    let active = 0;
    let most = 0;
    const measured: RenderReport = async (...args) => {
      most = Math.max(most, ++active);
      try {
        return await renderReport(...args);
      } finally {
        active--;
      }
    };
    const { concurrency } = t.config.reports;
    expect(concurrency).toBe(2);
    const queue = createReportQueue({ storage, concurrency, render: measured });
    for (const r of rows) queue.enqueue(r.id);
    await queue.idle();
    await queue.stop();
    expect(most).toBe(concurrency);
    const after = await Report.findAll({ where: { id: rows.map((r) => r.id) } });
    expect(after.map((r) => r.status)).toEqual(['ready', 'ready', 'ready', 'ready']);
  });

  it('records a failed render on the row in plain words', async () => {
    const s = await scenario();
    const row = await insertQueuedReport(s.owner, s.vehicle.id);
    const failing: RenderReport = async () => {
      throw new Error('the page size is unknown');
    };
    const queue = createReportQueue({
      storage,
      concurrency: 1,
      render: failing,
      onError: () => {},
    });
    queue.enqueue(row.id);
    await queue.idle();
    await row.reload();
    expect(row.status).toBe('failed');
    expect(row.error).toContain('the page size is unknown');
    expect(row.sha256).toBeNull();
  });

  /** A render that waits until the test lets it finish. */
  function heldRender() {
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    let started!: () => void;
    const running = new Promise<void>((r) => (started = r));
    const render: RenderReport = async (...args) => {
      started();
      await gate;
      return renderReport(...args);
    };
    return { render, running, release };
  }

  it('keeps the heartbeat of a render going while it works, under this process’s claim', async () => {
    const s = await scenario();
    const row = await insertQueuedReport(s.owner, s.vehicle.id);
    const held = heldRender();
    const queue = createReportQueue({
      storage,
      concurrency: 1,
      instanceId: 'heartbeat-test',
      heartbeatMs: 50,
      render: held.render,
    });
    queue.enqueue(row.id);
    await held.running;
    await row.reload();
    expect(row).toMatchObject({ status: 'rendering', claimedBy: 'heartbeat-test' });
    const first = row.heartbeatAt!.getTime();
    await new Promise((r) => setTimeout(r, 400));
    await row.reload();
    expect(row.heartbeatAt!.getTime()).toBeGreaterThan(first);
    held.release();
    await queue.idle();
    await row.reload();
    expect(row.status).toBe('ready');
  });

  it('a render whose claim another process took over records nothing and removes its file', async () => {
    const s = await scenario();
    const row = await insertQueuedReport(s.owner, s.vehicle.id);
    const puts: string[] = [];
    const deletes: string[] = [];
    const watched: StorageAdapter = {
      ...storage,
      put: async (key, body, type) => {
        puts.push(key);
        return storage.put(key, body, type);
      },
      delete: async (key) => {
        deletes.push(key);
        return storage.delete(key);
      },
    };
    const held = heldRender();
    const queue = createReportQueue({
      storage: watched,
      concurrency: 1,
      instanceId: 'went-quiet',
      render: held.render,
    });
    queue.enqueue(row.id);
    await held.running;
    // Meanwhile another process judged this one gone and is rendering the report itself.
    await Report.update({ claimedBy: 'took-over', progress: 10 }, { where: { id: row.id } });
    held.release();
    await queue.idle();

    await row.reload();
    expect(row).toMatchObject({ status: 'rendering', claimedBy: 'took-over', sha256: null });
    expect(row.storageKey).toBeNull();
    expect(puts).toHaveLength(1);
    expect(deletes).toEqual(puts);
    expect(await storage.get(puts[0])).toBeNull();
  });
});

describe('who may see reports', () => {
  let s: Scenario;
  let ready: Awaited<ReturnType<typeof generateReport>>;
  beforeAll(async () => {
    s = await scenario();
    ready = await generateReport(t.app, s.inspector, s.vehicle.id);
  });

  it('lets a client read and download the reports of a vehicle shared with them', async () => {
    const one = await request(t.app)
      .get(`${base(s)}/reports/${ready.id}`)
      .set(s.client.auth);
    expect(one.status).toBe(200);
    expect(one.body.sha256).toBe(ready.sha256);
    const { res, pdf } = await downloadPdf(t.app, s.client, ready);
    expect(res.status).toBe(200);
    expect(sha256(pdf)).toBe(ready.sha256);
  });

  it('answers 404 to a client the vehicle is not shared with, on every read', async () => {
    const other = await createMember(t.config, s.workshop, 'client');
    for (const url of [
      `${base(s)}/vehicles/${s.vehicle.id}/reports`,
      `${base(s)}/reports/${ready.id}`,
      `${base(s)}/reports/${ready.id}/pdf`,
    ]) {
      const res = await request(t.app).get(url).set(other.auth);
      expect({ url, status: res.status }).toEqual({ url, status: 404 });
    }
  });

  it('answers 404 to another workshop’s owner on every route, and 403 to roles without the action', async () => {
    const outsider = (await createWorkshopWithTeam(t.config)).owner;
    const calls: [string, string, object?][] = [
      ['get', `${base(s)}/vehicles/${s.vehicle.id}/reports`],
      ['post', `${base(s)}/vehicles/${s.vehicle.id}/reports`, { kind: 'condition' }],
      ['get', `${base(s)}/reports/${ready.id}`],
      ['get', `${base(s)}/reports/${ready.id}/pdf`],
      ['get', `${base(s)}/reports/${ready.id}/shares`],
      ['post', `${base(s)}/reports/${ready.id}/shares`, {}],
    ];
    // The outsider's own workshop id does not reach this workshop's report either.
    const own = `/api/workshops/${outsider.membership.workshopId}`;
    calls.push(['get', `${own}/reports/${ready.id}`], ['get', `${own}/reports/${ready.id}/pdf`]);
    for (const [method, url, body] of calls) {
      const res = await (request(t.app) as never as Record<string, (u: string) => request.Test>)
        [method](url)
        .set(outsider.auth)
        .send(body);
      expect({ url, method, status: res.status }).toEqual({ url, method, status: 404 });
    }
    for (const who of [s.applicator, s.client]) {
      const post = await request(t.app)
        .post(`${base(s)}/vehicles/${s.vehicle.id}/reports`)
        .set(who.auth)
        .send({ kind: 'condition' });
      const share = await request(t.app)
        .post(`${base(s)}/reports/${ready.id}/shares`)
        .set(who.auth)
        .send({});
      expect([post.status, share.status]).toEqual([403, 403]);
    }
    expect(await Report.count({ where: { vehicleId: s.vehicle.id } })).toBe(1);
  });
});
