import crypto from 'node:crypto';
import request from 'supertest';
import { AuditEntry, Finding } from '@/server/models';
import { findingResponse } from '@/shared/schemas/finding';
import {
  buildFinding,
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
import { appStorage, createPhoto } from '../factories/photos';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let team: Awaited<ReturnType<typeof createWorkshopWithTeam>>;
beforeAll(async () => {
  t = buildTestApp();
  team = await createWorkshopWithTeam(t.config);
});
afterAll(() => t.close());

const api = () => request(t.app);
const w = () => `/api/workshops/${team.workshop.id}`;
const newSurvey = async () =>
  createSurvey(await createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' }));

describe('POST /api/workshops/:wid/surveys/:sid/findings', () => {
  it('logs a finding (201) with every field, the caller as author and an audit entry', async () => {
    const survey = await newSurvey();
    const body = buildFinding({
      zoneKey: 'roof-rail-left',
      severity: 3,
      insectEvidence: ['frass-powder', 'exit-holes-round'],
      holeDiameterMm: 1.5,
      activity: 'active',
      moisture: { meterReading: 24.5, woodTempC: 12, species: 'white-ash' },
      pickTest: 'brash-break',
      decayDepthMm: { top: 12, bottom: 3, left: 0, right: 5 },
      affectedLengthMm: 420,
      atJointOrFitting: true,
      pin: { view: 'left', x: 400.5, y: 80 },
      notes: 'Under the gutter joint',
    });
    const res = await api()
      .post(`${w()}/surveys/${survey.id}/findings`)
      .set(team.inspector.auth)
      .send(body)
      .expect(201);
    const f = findingResponse.parse(res.body);
    expect(f).toMatchObject({
      ...body,
      surveyId: survey.id,
      vehicleId: survey.vehicleId,
      surveyDate: survey.date,
      version: 0,
      photos: [],
    });
    expect(f.authorName).toBe(team.inspector.user.name);
    const row = await Finding.findByPk(f.id);
    expect(row).toMatchObject({
      zoneKey: 'roof-rail-left',
      severity: 3,
      holeDiameterMm: 1.5,
      authorId: team.inspector.user.id,
    });
    expect(row!.moisture).toEqual({ meterReading: 24.5, woodTempC: 12, species: 'white-ash' });
    expect(await AuditEntry.count({ where: { entityId: f.id, action: 'finding.create' } })).toBe(1);
  });

  it('returns the first row (200) for a retried id and keeps one row', async () => {
    const survey = await newSurvey();
    const body = { ...buildFinding(), id: crypto.randomUUID() };
    const url = `${w()}/surveys/${survey.id}/findings`;
    const [a, b] = await Promise.all([
      api().post(url).set(team.inspector.auth).send(body),
      api().post(url).set(team.inspector.auth).send(body),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    await api().post(url).set(team.inspector.auth).send(body).expect(200);
    expect(await Finding.count({ where: { id: body.id } })).toBe(1);
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    ['a zone that is not on the plan', { zoneKey: 'tailgate-frame' }, ['zoneKey']],
    [
      'a missing zone and severity',
      { zoneKey: undefined, severity: undefined },
      ['zoneKey', 'severity'],
    ],
    ['severity 5', { severity: 5 }, ['severity']],
    ['a fractional severity', { severity: 2.5 }, ['severity']],
    ['an unknown decay type', { decayType: 'dry-rot-ish' }, ['decayType']],
    [
      'unknown insect evidence',
      { insectEvidence: ['frass-powder', 'termite-hats'] },
      ['insectEvidence.1'],
    ],
    ['an unknown activity', { activity: 'maybe' }, ['activity']],
    [
      'a moisture reading over 100 %',
      { moisture: { meterReading: 140 } },
      ['moisture.meterReading'],
    ],
    ['an unknown pick-test result', { pickTest: 'snapped' }, ['pickTest']],
    ['a negative decay depth', { decayDepthMm: { top: -1 } }, ['decayDepthMm.top']],
    [
      'a pin on a view the plan does not have',
      { pin: { view: 'front', x: 10, y: 10 } },
      ['pin.view'],
    ],
    ['a pin outside the drawing', { pin: { view: 'left', x: 5000, y: -3 } }, ['pin.x', 'pin.y']],
    ['a hole diameter as text', { holeDiameterMm: '2mm' }, ['holeDiameterMm']],
  ])('answers 400 naming the fields for %s, and creates nothing', async (_label, patch, fields) => {
    const survey = await newSurvey();
    const res = await api()
      .post(`${w()}/surveys/${survey.id}/findings`)
      .set(team.owner.auth)
      .send({ ...buildFinding(), ...patch })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([...fields].sort());
    expect(await Finding.count({ where: { surveyId: survey.id } })).toBe(0);
  });

  it('answers 403 to an applicator and 404 for an unknown survey', async () => {
    const survey = await newSurvey();
    await api()
      .post(`${w()}/surveys/${survey.id}/findings`)
      .set(team.applicator.auth)
      .send(buildFinding())
      .expect(403);
    await api()
      .post(`${w()}/surveys/${crypto.randomUUID()}/findings`)
      .set(team.owner.auth)
      .send(buildFinding())
      .expect(404);
    expect(await Finding.count({ where: { surveyId: survey.id } })).toBe(0);
  });
});

describe('GET /api/workshops/:wid/vehicles/:vid/findings', () => {
  it('lists findings newest survey first, with photos and authorised rendition URLs', async () => {
    const v = await createVehicle(team.workshop);
    const older = await createSurvey(v, { date: '2026-02-01' });
    const newer = await createSurvey(v, { date: '2026-08-01' });
    const a = await createFinding(older, { zoneKey: 'sill-left' });
    const b = await createFinding(newer, { zoneKey: 'sill-right' });
    const photo = await createPhoto(b, appStorage(t.app), { caption: 'Underside' });

    const res = await api()
      .get(`${w()}/vehicles/${v.id}/findings`)
      .set(team.applicator.auth)
      .expect(200);
    const items = res.body.items.map((i: unknown) => findingResponse.parse(i));
    expect(items.map((i: { id: string }) => i.id)).toEqual([b.id, a.id]);
    expect(items[0].surveyDate).toBe('2026-08-01');
    expect(items[0].photos).toEqual([
      expect.objectContaining({
        id: photo.id,
        caption: 'Underside',
        thumbUrl: `${w()}/photos/${photo.id}/thumb`,
        displayUrl: `${w()}/photos/${photo.id}/display`,
      }),
    ]);
  });

  it('filters by zone and survey, and shows deleted findings only to writers', async () => {
    const v = await createVehicle(team.workshop);
    const s1 = await createSurvey(v);
    const s2 = await createSurvey(v);
    const left = await createFinding(s1, { zoneKey: 'sill-left' });
    const right = await createFinding(s2, { zoneKey: 'sill-right' });
    const gone = await createFinding(s2, { zoneKey: 'sill-left' });
    await gone.destroy();
    const ids = async (q: string, who = team.owner) =>
      (await api().get(`${w()}/vehicles/${v.id}/findings${q}`).set(who.auth).expect(200)).body.items
        .map((i: { id: string }) => i.id)
        .sort();
    expect(await ids('?zone=sill-left')).toEqual([left.id]);
    expect(await ids(`?surveyId=${s2.id}`)).toEqual([right.id]);
    expect(await ids('?deleted=only', team.inspector)).toEqual([gone.id]);
    expect(await ids('?zone=sill-left&deleted=include')).toEqual([left.id, gone.id].sort());
    await api()
      .get(`${w()}/vehicles/${v.id}/findings?deleted=only`)
      .set(team.applicator.auth)
      .expect(403);
    const bad = await api()
      .get(`${w()}/vehicles/${v.id}/findings?surveyId=nope`)
      .set(team.owner.auth)
      .expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['surveyId']);
  });

  it('lets a client read findings of a shared vehicle and answers 404 for others', async () => {
    const shared = await createVehicle(team.workshop);
    const unshared = await createVehicle(team.workshop);
    await grantAccess(shared, team.client.user.id);
    const f = await createFinding(await createSurvey(shared));
    const other = await createFinding(await createSurvey(unshared));
    const res = await api()
      .get(`${w()}/vehicles/${shared.id}/findings`)
      .set(team.client.auth)
      .expect(200);
    expect(res.body.items.map((i: { id: string }) => i.id)).toEqual([f.id]);
    await api().get(`${w()}/vehicles/${unshared.id}/findings`).set(team.client.auth).expect(404);
    await api().get(`${w()}/findings/${other.id}`).set(team.client.auth).expect(404);
    await api().get(`${w()}/findings/${f.id}`).set(team.client.auth).expect(200);
  });
});

describe('PATCH /api/workshops/:wid/findings/:fid', () => {
  it('changes only the fields sent, bumps the version and audits the diff', async () => {
    const f = await createFinding(await newSurvey(), {
      severity: 2,
      notes: 'Keep',
      decayType: 'brown-rot',
    });
    const res = await api()
      .patch(`${w()}/findings/${f.id}`)
      .set(team.inspector.auth)
      .send({ version: 0, severity: 3, moisture: { meterReading: 22 } })
      .expect(200);
    expect(findingResponse.parse(res.body)).toMatchObject({
      severity: 3,
      notes: 'Keep',
      decayType: 'brown-rot',
      moisture: { meterReading: 22, woodTempC: null, species: null },
      version: 1,
    });
    const entry = await AuditEntry.findOne({ where: { entityId: f.id, action: 'finding.update' } });
    expect(entry!.changes).toEqual({
      severity: { from: 2, to: 3 },
      moisture: { from: null, to: { meterReading: 22, woodTempC: null, species: null } },
    });
  });

  it('answers 409 stale_version for an old version and keeps the other writer’s values', async () => {
    const f = await createFinding(await newSurvey(), { severity: 1 });
    await api()
      .patch(`${w()}/findings/${f.id}`)
      .set(team.owner.auth)
      .send({ version: 0, severity: 4 })
      .expect(200);
    const res = await api()
      .patch(`${w()}/findings/${f.id}`)
      .set(team.inspector.auth)
      .send({ version: 0, severity: 0 })
      .expect(409);
    expect(res.body.error.code).toBe('stale_version');
    await f.reload();
    expect(f.severity).toBe(4);
    expect(f.version).toBe(1);
  });

  it('of two concurrent edits from the same version, exactly one wins and nothing is lost', async () => {
    const f = await createFinding(await newSurvey(), { severity: 1, notes: '' });
    const url = `${w()}/findings/${f.id}`;
    const [a, b] = await Promise.all([
      api()
        .patch(url)
        .set(team.owner.auth)
        .send({ version: 0, severity: 3, notes: 'Owner says deep' }),
      api()
        .patch(url)
        .set(team.inspector.auth)
        .send({ version: 0, severity: 2, notes: 'Inspector says shallow' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? a : b;
    await f.reload();
    expect({ severity: f.severity, notes: f.notes, version: f.version }).toEqual({
      severity: winner.body.severity,
      notes: winner.body.notes,
      version: 1,
    });
    expect(await AuditEntry.count({ where: { entityId: f.id, action: 'finding.update' } })).toBe(1);
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    ['no version', { severity: 2 }, ['version']],
    ['a zone not on the plan', { version: 0, zoneKey: 'bonnet-hinge' }, ['zoneKey']],
    ['a pin on an unknown view', { version: 0, pin: { view: 'inside', x: 1, y: 1 } }, ['pin.view']],
    ['severity -1', { version: 0, severity: -1 }, ['severity']],
    ['notes that are not text', { version: 0, notes: 12 }, ['notes']],
  ])('answers 400 naming the fields for %s, and changes nothing', async (_label, body, fields) => {
    const f = await createFinding(await newSurvey());
    const res = await api()
      .patch(`${w()}/findings/${f.id}`)
      .set(team.owner.auth)
      .send(body)
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(fields);
    await f.reload();
    expect(f.version).toBe(0);
  });
});

describe('DELETE /api/workshops/:wid/findings/:fid and POST …/restore', () => {
  it('soft-deletes, hides it from readers, and restores it', async () => {
    const v = await createVehicle(team.workshop);
    await grantAccess(v, team.client.user.id);
    const f = await createFinding(await createSurvey(v));
    const url = `${w()}/findings/${f.id}`;
    await api().delete(url).set(team.inspector.auth).expect(204);
    expect((await Finding.findByPk(f.id, { paranoid: false }))!.deletedAt).toBeInstanceOf(Date);
    await api().get(url).set(team.client.auth).expect(404);
    await api().get(url).set(team.applicator.auth).expect(404);
    const seen = await api().get(url).set(team.owner.auth).expect(200);
    expect(seen.body.deletedAt).not.toBeNull();
    await api().patch(url).set(team.owner.auth).send({ version: 0, severity: 1 }).expect(404);

    const res = await api().post(`${url}/restore`).set(team.inspector.auth).expect(200);
    expect(res.body.deletedAt).toBeNull();
    await api().get(url).set(team.client.auth).expect(200);
    const actions = (await AuditEntry.findAll({ where: { entityId: f.id } }))
      .map((e) => e.action)
      .sort();
    expect(actions).toEqual(['finding.delete', 'finding.restore']);
  });

  it('answers 403 to an applicator and keeps the finding', async () => {
    const f = await createFinding(await newSurvey());
    await api().delete(`${w()}/findings/${f.id}`).set(team.applicator.auth).expect(403);
    expect(await Finding.count({ where: { id: f.id } })).toBe(1);
  });
});
