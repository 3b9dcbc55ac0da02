import request from 'supertest';
import { verifyResponse, type ReportResponse } from '@/shared/schemas/report';
import { appStorage } from '../factories/photos';
import { downloadPdf, generateReport } from '../factories/reports';
import { createVehicleScenario } from '../factories/scenario';
import { buildTestApp, type TestApp } from './support/test-app';

let limited: TestApp;
let t: TestApp;
type Scenario = Awaited<ReturnType<typeof createVehicleScenario>>;
let s: Scenario;
let v1: ReportResponse;
let v1Pdf: Buffer;

beforeAll(async () => {
  // Built first: models bind to the last Sequelize instance made, which must be the main app's.
  limited = buildTestApp({ PUBLIC_RATE_LIMIT: '2' });
  t = buildTestApp();
  s = await createVehicleScenario(t.config, appStorage(t.app));
  v1 = await generateReport(t.app, s.inspector, s.vehicle.id);
  v1Pdf = (await downloadPdf(t.app, s.inspector, v1)).pdf;
});
afterAll(async () => {
  await limited.close();
  await t.close();
});

const upload = (pdf: Buffer, app = t.app) =>
  request(app).post('/api/public/verify').attach('pdf', pdf, 'report.pdf');
const check = (res: request.Response) => {
  expect(res.status).toBe(200);
  return verifyResponse.strict().parse(res.body);
};

describe('checking a PDF file', () => {
  it('finds the stored PDF genuine by its SHA-256, with nothing else of the workshop', async () => {
    const body = check(await upload(v1Pdf));
    expect(body).toMatchObject({ genuine: true, matchedBy: 'hash' });
    expect(body.report).toEqual({
      shortId: v1.shortId,
      kind: 'repair-scope',
      version: 1,
      latestVersion: 1,
      newerVersionExists: false,
      generatedAt: v1.createdAt,
      sha256: v1.sha256,
      workshopName: s.workshop.name,
    });
    expect(body.message).toContain('newest version');
  });

  it('finds a copy with one byte changed not genuine, and says which report it claims to be', async () => {
    const changed = Buffer.from(v1Pdf);
    // A byte in the middle of the file (page content), away from the identifier it carries.
    let at = Math.floor(changed.length / 2);
    while (
      changed
        .subarray(at - 12, at + 12)
        .toString('latin1')
        .includes('SF-')
    )
      at += 32;
    changed[at] ^= 0x01;
    const body = check(await upload(changed));
    expect(body).toEqual({
      genuine: false,
      matchedBy: null,
      claimedShortId: v1.shortId,
      report: null,
      message: expect.stringContaining(`claims to be report ${v1.shortId}`),
    });
    expect(body.message).toContain('changed');
  });

  it('says an older version’s file is genuine and that a newer version exists', async () => {
    const v2 = await generateReport(t.app, s.owner, s.vehicle.id);
    const old = check(await upload(v1Pdf));
    expect(old).toMatchObject({ genuine: true, matchedBy: 'hash' });
    expect(old.report).toMatchObject({ version: 1, latestVersion: 2, newerVersionExists: true });
    expect(old.message).toContain('newer version (2)');
    const newest = check(await upload((await downloadPdf(t.app, s.owner, v2)).pdf));
    expect(newest.report).toMatchObject({ version: 2, newerVersionExists: false });
  });

  it('finds a file that names no report not genuine', async () => {
    const body = check(await upload(Buffer.from('%PDF-1.7\n% nothing issued\n%%EOF\n')));
    expect(body).toMatchObject({
      genuine: false,
      matchedBy: null,
      claimedShortId: null,
      report: null,
    });
    expect(body.message).toBe('This file does not match any report issued through Soundframe.');
  });

  it('answers 415 for a file that is not a PDF or a body that is not multipart, 400 without a file', async () => {
    const notPdf = await upload(Buffer.from('GIF89a not a report'));
    expect(notPdf.status).toBe(415);
    expect(notPdf.body.error.fields).toEqual({ pdf: 'Not a PDF file.' });
    const json = await request(t.app).post('/api/public/verify').send({ pdf: 'x' });
    expect(json.status).toBe(415);
    const empty = await request(t.app).post('/api/public/verify').field('note', 'no file');
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.error.fields)).toEqual(['pdf']);
  });

  it('answers 413 for a file over 25 MB', async () => {
    const big = Buffer.alloc(25 * 1024 * 1024 + 1, 0x20);
    big.write('%PDF-1.7\n');
    const res = await upload(big);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
  });
});

describe('checking an identifier', () => {
  it('finds an issued identifier, typed in lower case too, genuine by id', async () => {
    const body = check(await request(t.app).get(`/api/public/verify/${v1.shortId.toLowerCase()}`));
    expect(body).toMatchObject({ genuine: true, matchedBy: 'id' });
    expect(body.report).toMatchObject({ shortId: v1.shortId, version: 1, sha256: v1.sha256 });
    expect(body.message).toContain('drop the PDF');
  });

  it('answers an identifier never issued with genuine false (200)', async () => {
    const body = check(await request(t.app).get('/api/public/verify/SF-0000-0000'));
    expect(body).toEqual({
      genuine: false,
      matchedBy: null,
      claimedShortId: null,
      report: null,
      message: expect.stringContaining('SF-0000-0000'),
    });
  });

  it('answers 400 naming shortId for a malformed identifier', async () => {
    for (const bad of ['SF-1234', 'SF-IIII-LLLL', 'XX-1234-5678']) {
      const res = await request(t.app).get(`/api/public/verify/${bad}`);
      expect({ bad, status: res.status, fields: Object.keys(res.body.error.fields) }).toEqual({
        bad,
        status: 400,
        fields: ['shortId'],
      });
    }
  });
});

it('rate limits the public routes per address', async () => {
  const url = `/api/public/verify/${v1.shortId}`;
  const statuses = [];
  for (let i = 0; i < 3; i++) statuses.push((await request(limited.app).get(url)).status);
  expect(statuses).toEqual([200, 200, 429]);
  const share = await request(limited.app).get(`/api/public/shares/${'a'.repeat(43)}`);
  expect(share.status).toBe(429);
  expect(share.body.error.code).toBe('rate_limited');
});
