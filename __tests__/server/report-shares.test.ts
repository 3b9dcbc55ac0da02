import crypto from 'node:crypto';
import request from 'supertest';
import { waitForMail } from '@/server/mail/outbox';
import { AuditEntry, Report, ReportShare } from '@/server/models';
import {
  createShareResponse,
  publicShareResponse,
  shareResponse,
  type ReportResponse,
} from '@/shared/schemas/report';
import { createWorkshopWithTeam } from '../factories';
import { appStorage } from '../factories/photos';
import { generateReport, insertQueuedReport } from '../factories/reports';
import { createVehicleScenario } from '../factories/scenario';
import { buildTestAppWithMail, type TestAppWithMail } from './support/test-app';

let t: TestAppWithMail;
type Scenario = Awaited<ReturnType<typeof createVehicleScenario>>;
let s: Scenario;
let report: ReportResponse;

beforeAll(async () => {
  t = await buildTestAppWithMail();
  s = await createVehicleScenario(t.config, appStorage(t.app), { shared: true });
  report = await generateReport(t.app, s.inspector, s.vehicle.id, 'condition');
});
afterAll(() => t.close());

const sha256 = (b: Buffer | string) => crypto.createHash('sha256').update(b).digest('hex');
const GONE = {
  error: {
    code: 'not_found',
    message: 'This link is not available. It may have expired or been withdrawn.',
  },
};

async function share(body: Record<string, unknown> = {}, r: { id: string } = report) {
  const res = await request(t.app)
    .post(`/api/workshops/${s.workshop.id}/reports/${r.id}/shares`)
    .set(s.inspector.auth)
    .send(body);
  expect(res.status).toBe(201);
  return createShareResponse.parse(res.body);
}

/** GET as a stranger: no session, no cookies. */
const open = (token: string) => request(t.app).get(`/api/public/shares/${token}`);
function openPdf(token: string) {
  return request(t.app)
    .get(`/api/public/shares/${token}/pdf`)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
}

describe('making a link', () => {
  it('e-mails the link with its expiry and message, and stores only the token’s hash', async () => {
    const email = `buyer-${crypto.randomBytes(4).toString('hex')}@example.test`;
    const created = await share({
      recipientEmail: email,
      expiresInDays: 10,
      message: 'Here is the report we talked about.',
    });
    expect(created.token).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 bytes = 256 bits
    expect(created.url).toMatch(
      new RegExp(`^http://127\\.0\\.0\\.1:\\d+/shared/${created.token}$`),
    );
    expect(created).toMatchObject({ status: 'active', viewCount: 0, recipientEmail: email });
    expect(created.emailedAt).not.toBeNull();
    const days = (Date.parse(created.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(9.99);
    expect(days).toBeLessThan(10.01);

    const mail = await waitForMail(t.mailDir, (m) => m.to.includes(email));
    expect(mail.links).toContain(created.url);
    expect(mail.text).toContain(created.expiresAt.slice(0, 10));
    expect(mail.text).toContain('Here is the report we talked about.');
    expect(mail.text).toContain(report.shortId);

    const row = await ReportShare.findByPk(created.id, { raw: true });
    expect(row!.tokenHash).toBe(sha256(created.token));
    expect(JSON.stringify(row)).not.toContain(created.token);
    const audits = await AuditEntry.findAll({ where: { workshopId: s.workshop.id }, raw: true });
    expect(audits.map((a) => a.action)).toContain('report-share.create');
    expect(JSON.stringify(audits)).not.toContain(created.token);
  });

  it('makes a link without e-mail, and lists the report’s links newest first', async () => {
    const a = await share();
    const b = await share({ expiresInDays: 1 });
    expect(a.emailedAt).toBeNull();
    const list = await request(t.app)
      .get(`/api/workshops/${s.workshop.id}/reports/${report.id}/shares`)
      .set(s.owner.auth);
    expect(list.status).toBe(200);
    const ids = list.body.items.map((i: unknown) => shareResponse.parse(i).id);
    expect(ids.indexOf(b.id)).toBeLessThan(ids.indexOf(a.id));
  });

  it('refuses a report still being made (409) and a bad expiry (400 naming it)', async () => {
    const queued = await insertQueuedReport(s.owner, s.vehicle.id);
    const url = `/api/workshops/${s.workshop.id}/reports/${queued.id}/shares`;
    const res = await request(t.app).post(url).set(s.owner.auth).send({});
    expect(res.status).toBe(409);
    await queued.update({ status: 'failed' });
    const bad = await request(t.app)
      .post(`/api/workshops/${s.workshop.id}/reports/${report.id}/shares`)
      .set(s.owner.auth)
      .send({ expiresInDays: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['expiresInDays']);
    expect(await ReportShare.count({ where: { reportId: queued.id } })).toBe(0);
  });
});

describe('opening a link without an account', () => {
  it('shows the summary, counts each view atomically and serves the PDF of that report', async () => {
    const { token, id } = await share();
    const first = await open(token);
    expect(first.status).toBe(200);
    expect(first.headers['set-cookie']).toBeUndefined();
    const body = publicShareResponse.strict().parse(first.body);
    expect(body.report).toMatchObject({
      shortId: report.shortId,
      version: report.version,
      sha256: report.sha256,
      newerVersionExists: false,
    });
    expect(body.summary).toEqual(report.summary);
    // A stale session on the stranger's side does not get in the way.
    const stale = await open(token).set('Authorization', 'Bearer not-a-session');
    expect(stale.status).toBe(200);
    await open(token);
    const row = await ReportShare.findByPk(id);
    expect(row!.viewCount).toBe(3);
    expect(row!.lastViewedAt).not.toBeNull();

    const pdf = await openPdf(token);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(sha256(pdf.body as Buffer)).toBe(report.sha256);
    // Downloading is not a view of the page; it is counted on its own.
    const after = (await ReportShare.findByPk(id))!;
    expect(after.viewCount).toBe(3);
    expect(after.downloadCount).toBe(1);
    expect(after.lastDownloadedAt).not.toBeNull();
    await openPdf(token).expect(200);
    expect((await ReportShare.findByPk(id))!.downloadCount).toBe(2);
  });

  it('tells an older version’s reader that a newer one exists', async () => {
    const { token } = await share();
    const newer = await generateReport(t.app, s.owner, s.vehicle.id, 'condition');
    const res = await open(token);
    expect(res.body.report).toMatchObject({ version: report.version, newerVersionExists: true });
    expect(newer.version).toBe(report.version + 1);
  });

  it('answers an expired link with the same 404 body, and counts nothing', async () => {
    const { token, id } = await share();
    await ReportShare.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id } });
    for (const res of [await open(token), await openPdf(token)]) {
      expect(res.status).toBe(404);
      expect(JSON.parse(res.text ?? (res.body as Buffer).toString())).toEqual(GONE);
    }
    expect((await ReportShare.findByPk(id))!.viewCount).toBe(0);
  });

  it('stops a revoked link at once; revoking again changes nothing', async () => {
    const { token, id } = await share();
    expect((await open(token)).status).toBe(200);
    const url = `/api/workshops/${s.workshop.id}/shares/${id}/revoke`;
    const first = await request(t.app).post(url).set(s.owner.auth);
    expect(first.status).toBe(200);
    expect(shareResponse.parse(first.body)).toMatchObject({ status: 'revoked', viewCount: 1 });
    const again = await request(t.app).post(url).set(s.owner.auth);
    expect(again.body.revokedAt).toBe(first.body.revokedAt);
    expect(await AuditEntry.count({ where: { entityId: id, action: 'report-share.revoke' } })).toBe(
      1,
    );
    const row = await ReportShare.findByPk(id);
    expect(row!.revokedById).toBe(s.owner.user.id);
    for (const res of [await open(token), await openPdf(token)]) {
      expect(res.status).toBe(404);
      expect(JSON.parse(res.text ?? (res.body as Buffer).toString())).toEqual(GONE);
    }
  });

  it('answers unknown, malformed and look-alike tokens with the same 404', async () => {
    const { token } = await share();
    const hash = sha256(token);
    const candidates = [
      crypto.randomBytes(32).toString('base64url'), // well formed, never issued
      'short',
      `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`, // one character off
      hash, // the stored digest is not a key
    ];
    for (const c of candidates) {
      const res = await open(c);
      expect({ c, status: res.status, body: res.body }).toEqual({ c, status: 404, body: GONE });
    }
  });

  it('never reaches another report with a link: each token serves its own report only', async () => {
    const other = await createVehicleScenario(t.config, appStorage(t.app));
    const otherReport = await generateReport(t.app, other.owner, other.vehicle.id);
    const mine = await share();
    const pdf = await openPdf(mine.token);
    expect(sha256(pdf.body as Buffer)).toBe(report.sha256);
    expect(sha256(pdf.body as Buffer)).not.toBe(otherReport.sha256);
    // A share token is not a session: the signed-in download of the other report refuses it.
    const asBearer = await request(t.app)
      .get(`/api/workshops/${other.workshop.id}/reports/${otherReport.id}/pdf`)
      .set('Authorization', `Bearer ${mine.token}`);
    expect(asBearer.status).toBe(401);
    // Nor does this workshop's revoke route reach another workshop's link.
    const theirs = await request(t.app)
      .post(`/api/workshops/${other.workshop.id}/reports/${otherReport.id}/shares`)
      .set(other.owner.auth)
      .send({});
    const cross = await request(t.app)
      .post(`/api/workshops/${s.workshop.id}/shares/${theirs.body.id}/revoke`)
      .set(s.owner.auth);
    expect(cross.status).toBe(404);
    expect((await ReportShare.findByPk(theirs.body.id))!.revokedAt).toBeNull();
  });

  it('takes the links of a deleted vehicle’s reports with it', async () => {
    const v = await createVehicleScenario(t.config, appStorage(t.app));
    const r = await generateReport(t.app, v.owner, v.vehicle.id);
    const res = await request(t.app)
      .post(`/api/workshops/${v.workshop.id}/reports/${r.id}/shares`)
      .set(v.owner.auth)
      .send({});
    expect((await open(res.body.token)).status).toBe(200);
    await v.vehicle.destroy();
    const after = await open(res.body.token);
    expect({ status: after.status, body: after.body }).toEqual({ status: 404, body: GONE });
    expect(await Report.count({ where: { id: r.id } })).toBe(1);
  });

  it('refuses another workshop’s member on the share routes (404)', async () => {
    const outsider = (await createWorkshopWithTeam(t.config)).owner;
    const { id } = await share();
    for (const [method, url] of [
      ['get', `/api/workshops/${s.workshop.id}/reports/${report.id}/shares`],
      ['post', `/api/workshops/${s.workshop.id}/shares/${id}/revoke`],
      ['post', `/api/workshops/${outsider.membership.workshopId}/shares/${id}/revoke`],
    ] as const) {
      const res = await request(t.app)[method](url).set(outsider.auth);
      expect({ url, status: res.status }).toEqual({ url, status: 404 });
    }
    expect((await ReportShare.findByPk(id))!.revokedAt).toBeNull();
  });
});
