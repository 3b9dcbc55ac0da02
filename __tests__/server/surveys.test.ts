import crypto from 'node:crypto';
import request from 'supertest';
import { AuditEntry, Survey } from '@/server/models';
import { surveyResponse } from '@/shared/schemas/survey';
import {
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
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
const surveyBody = (partial: Record<string, unknown> = {}) => ({
  date: '2026-11-02',
  purpose: 'baseline',
  airTempC: 17.5,
  relativeHumidity: 58,
  ...partial,
});

describe('GET /api/workshops/:wid/vehicles/:vid/surveys', () => {
  it('lists the vehicle’s surveys newest first with inspector and open finding count', async () => {
    const v = await createVehicle(team.workshop);
    const older = await createSurvey(v, {
      date: '2026-01-10',
      inspectorId: team.inspector.user.id,
    });
    const newer = await createSurvey(v, { date: '2026-06-01' });
    await createFinding(older);
    await createFinding(older);
    const deleted = await createFinding(older);
    await deleted.destroy();
    await createSurvey(await createVehicle(team.workshop));

    const res = await api()
      .get(`${w()}/vehicles/${v.id}/surveys`)
      .set(team.applicator.auth)
      .expect(200);
    const items = res.body.items.map((s: unknown) => surveyResponse.parse(s));
    expect(items.map((s: { id: string }) => s.id)).toEqual([newer.id, older.id]);
    expect(items[1]).toMatchObject({
      findingCount: 2,
      inspectorId: team.inspector.user.id,
      inspectorName: team.inspector.user.name,
    });
    expect(items[0]).toMatchObject({ findingCount: 0, airTempC: 18, relativeHumidity: 60 });
  });

  it('lets a client read surveys of a shared vehicle only', async () => {
    const shared = await createVehicle(team.workshop);
    const unshared = await createVehicle(team.workshop);
    await grantAccess(shared, team.client.user.id);
    await createSurvey(shared);
    await api().get(`${w()}/vehicles/${shared.id}/surveys`).set(team.client.auth).expect(200);
    await api().get(`${w()}/vehicles/${unshared.id}/surveys`).set(team.client.auth).expect(404);
  });
});

describe('POST /api/workshops/:wid/vehicles/:vid/surveys', () => {
  it('creates the survey (201) with the caller as inspector and an audit entry', async () => {
    const v = await createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' });
    const res = await api()
      .post(`${w()}/vehicles/${v.id}/surveys`)
      .set(team.inspector.auth)
      .send(
        surveyBody({
          notAccessibleZones: ['heel-board', 'floor-board-2', 'heel-board'],
          notAccessibleNotes: 'Seat fixed',
        }),
      )
      .expect(201);
    const s = surveyResponse.parse(res.body);
    expect(s).toMatchObject({
      vehicleId: v.id,
      date: '2026-11-02',
      airTempC: 17.5,
      relativeHumidity: 58,
      notAccessibleZones: ['heel-board', 'floor-board-2'],
      inspectorId: team.inspector.user.id,
      findingCount: 0,
    });
    const row = await Survey.findByPk(s.id);
    expect(row!.notAccessibleZones).toEqual(['heel-board', 'floor-board-2']);
    expect(
      await AuditEntry.count({
        where: { entityId: s.id, action: 'survey.create', actorId: team.inspector.user.id },
      }),
    ).toBe(1);
  });

  it('returns the first row (200) for a retried id and keeps one row', async () => {
    const v = await createVehicle(team.workshop);
    const id = crypto.randomUUID();
    const url = `${w()}/vehicles/${v.id}/surveys`;
    await api().post(url).set(team.owner.auth).send(surveyBody({ id })).expect(201);
    const [a, b] = await Promise.all([
      api().post(url).set(team.owner.auth).send(surveyBody({ id })),
      api().post(url).set(team.owner.auth).send(surveyBody({ id })),
    ]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(await Survey.count({ where: { id } })).toBe(1);
  });

  it('answers 409 when the id belongs to a survey of another vehicle', async () => {
    const v1 = await createVehicle(team.workshop);
    const v2 = await createVehicle(team.workshop);
    const s = await createSurvey(v1);
    await api()
      .post(`${w()}/vehicles/${v2.id}/surveys`)
      .set(team.owner.auth)
      .send(surveyBody({ id: s.id }))
      .expect(409);
    expect((await Survey.findByPk(s.id))!.vehicleId).toBe(v1.id);
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    ['an empty body', { date: undefined, purpose: undefined }, ['date', 'purpose']],
    ['a date that is not a date', { date: '2026-13-40' }, ['date']],
    ['an unknown purpose', { purpose: 'valuation' }, ['purpose']],
    ['humidity over 100 %', { relativeHumidity: 120 }, ['relativeHumidity']],
    ['an impossible shop temperature', { airTempC: 99 }, ['airTempC']],
    [
      'zones that are not on the plan',
      { notAccessibleZones: ['sill-left', 'engine-bay'] },
      ['notAccessibleZones'],
    ],
    [
      'not-accessible zones that are not strings',
      { notAccessibleZones: [4] },
      ['notAccessibleZones.0'],
    ],
  ])('answers 400 naming the fields for %s, and creates nothing', async (_label, patch, fields) => {
    const v = await createVehicle(team.workshop);
    const res = await api()
      .post(`${w()}/vehicles/${v.id}/surveys`)
      .set(team.owner.auth)
      .send(surveyBody(patch))
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([...fields].sort());
    expect(await Survey.count({ where: { vehicleId: v.id } })).toBe(0);
  });

  it('answers 403 to an applicator and a client', async () => {
    const v = await createVehicle(team.workshop);
    await grantAccess(v, team.client.user.id);
    for (const who of [team.applicator, team.client])
      await api()
        .post(`${w()}/vehicles/${v.id}/surveys`)
        .set(who.auth)
        .send(surveyBody())
        .expect(403);
    expect(await Survey.count({ where: { vehicleId: v.id } })).toBe(0);
  });
});

describe('PATCH /api/workshops/:wid/surveys/:sid', () => {
  it('changes only the fields sent and audits the diff', async () => {
    const v = await createVehicle(team.workshop);
    const s = await createSurvey(v, { notes: 'Keep me', airTempC: 15 });
    const res = await api()
      .patch(`${w()}/surveys/${s.id}`)
      .set(team.inspector.auth)
      .send({ relativeHumidity: 71, notAccessibleZones: ['sill-right'] })
      .expect(200);
    expect(surveyResponse.parse(res.body)).toMatchObject({
      relativeHumidity: 71,
      airTempC: 15,
      notes: 'Keep me',
      notAccessibleZones: ['sill-right'],
    });
    const entry = await AuditEntry.findOne({ where: { entityId: s.id, action: 'survey.update' } });
    expect(entry!.changes).toEqual({
      relativeHumidity: { from: 60, to: 71 },
      notAccessibleZones: { from: [], to: ['sill-right'] },
    });
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    ['a bad date', { date: 'yesterday' }, ['date']],
    ['a zone not on the plan', { notAccessibleZones: ['bonnet'] }, ['notAccessibleZones']],
    ['an unknown purpose', { purpose: 'other' }, ['purpose']],
  ])('answers 400 naming the fields for %s, and changes nothing', async (_label, body, fields) => {
    const s = await createSurvey(await createVehicle(team.workshop));
    const res = await api()
      .patch(`${w()}/surveys/${s.id}`)
      .set(team.owner.auth)
      .send(body)
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(fields);
    await s.reload();
    expect(s.notAccessibleZones).toEqual([]);
    expect(s.date).toBe('2026-11-20');
  });

  it('answers 404 for a survey of a deleted vehicle', async () => {
    const v = await createVehicle(team.workshop);
    const s = await createSurvey(v);
    await v.destroy();
    await api()
      .patch(`${w()}/surveys/${s.id}`)
      .set(team.owner.auth)
      .send({ notes: 'x' })
      .expect(404);
  });
});
