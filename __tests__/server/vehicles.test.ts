import crypto from 'node:crypto';
import request from 'supertest';
import { AuditEntry, Vehicle } from '@/server/models';
import { vehicleResponse } from '@/shared/schemas/vehicle';
import {
  buildVehicle,
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
  unique,
} from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';
import { createDecision } from '../factories/decisions';

let t: TestApp;
let team: Awaited<ReturnType<typeof createWorkshopWithTeam>>;
beforeAll(async () => {
  t = buildTestApp();
  team = await createWorkshopWithTeam(t.config);
});
afterAll(() => t.close());

const base = () => `/api/workshops/${team.workshop.id}/vehicles`;
const api = () => request(t.app);

describe('GET /api/workshops/:wid/vehicles', () => {
  it('lists the workshop’s vehicles with a summary of surveys and open findings', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const worn = await createVehicle(workshop, { make: 'Aldermoor' });
    const early = await createSurvey(worn, { date: '2026-03-01' });
    const late = await createSurvey(worn, { date: '2026-07-14' });
    await createFinding(early, { severity: 2 });
    await createFinding(late, { severity: 3 });
    const gone = await createFinding(late, { severity: 4 });
    await gone.destroy();
    const bare = await createVehicle(workshop, { make: 'Pellworth' });

    const res = await api()
      .get(`/api/workshops/${workshop.id}/vehicles`)
      .set(owner.auth)
      .expect(200);
    const items = res.body.items.map((i: unknown) => vehicleResponse.parse(i));
    const byId = Object.fromEntries(items.map((v: { id: string }) => [v.id, v]));
    expect(Object.keys(byId).sort()).toEqual([worn.id, bare.id].sort());
    // The deleted severity-4 finding is not open, so the worst open one is 3.
    expect(byId[worn.id].summary).toEqual({
      surveys: 2,
      findings: 2,
      worstSeverity: 3,
      lastSurveyDate: '2026-07-14',
    });
    expect(byId[bare.id].summary).toEqual({
      surveys: 0,
      findings: 0,
      worstSeverity: null,
      lastSurveyDate: null,
    });
  });

  it('computes the summary in one statement however many vehicles there are (no query per vehicle)', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const countQueries = async () => {
      const spy = jest.spyOn(t.sequelize, 'query');
      await api().get(`/api/workshops/${workshop.id}/vehicles`).set(owner.auth).expect(200);
      const n = spy.mock.calls.length;
      spy.mockRestore();
      return n;
    };
    const v = await createVehicle(workshop);
    await createFinding(await createSurvey(v));
    const withOne = await countQueries();
    for (let i = 0; i < 4; i++)
      await createFinding(await createSurvey(await createVehicle(workshop)));
    const withFive = await countQueries();
    expect(withOne).toBeGreaterThan(0);
    expect(withFive).toBe(withOne);
  });

  it('searches make, model, chassis and body numbers and the client name; % is a literal character', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const a = await createVehicle(workshop, {
      make: 'Quenby',
      model: 'Twelve',
      chassisNumber: 'QX-1001',
    });
    const b = await createVehicle(workshop, {
      make: 'Orrell',
      model: 'Sprite 50%',
      bodyNumber: 'B-77',
    });
    const c = await createVehicle(workshop, {
      make: 'Orrell',
      model: 'Tourer',
      clientName: 'Hester Quayle',
    });
    const search = async (q: string) =>
      (
        await api()
          .get(`/api/workshops/${workshop.id}/vehicles`)
          .query({ q })
          .set(owner.auth)
          .expect(200)
      ).body.items
        .map((v: { id: string }) => v.id)
        .sort();
    expect(await search('quenby')).toEqual([a.id]);
    expect(await search('qx-10')).toEqual([a.id]);
    expect(await search('B-77')).toEqual([b.id]);
    expect(await search('quayle')).toEqual([c.id]);
    expect(await search('orrell')).toEqual([b.id, c.id].sort());
    expect(await search('50%')).toEqual([b.id]);
    expect(await search('%')).toEqual([b.id]);
    expect(await search('nothing-like-this')).toEqual([]);
  });

  it('filters by stage', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const treating = await createVehicle(workshop, { stage: 'treating' });
    await createVehicle(workshop, { stage: 'intake' });
    const res = await api()
      .get(`/api/workshops/${workshop.id}/vehicles?stage=treating`)
      .set(owner.auth)
      .expect(200);
    expect(res.body.items.map((v: { id: string }) => v.id)).toEqual([treating.id]);
  });

  it('lists deleted vehicles only for an owner (deleted=only|include); others get 403', async () => {
    const { workshop, owner, inspector } = await createWorkshopWithTeam(t.config);
    const kept = await createVehicle(workshop);
    const removed = await createVehicle(workshop);
    await removed.destroy();
    const ids = async (q: string) =>
      (
        await api().get(`/api/workshops/${workshop.id}/vehicles${q}`).set(owner.auth).expect(200)
      ).body.items
        .map((v: { id: string }) => v.id)
        .sort();
    expect(await ids('')).toEqual([kept.id]);
    expect(await ids('?deleted=only')).toEqual([removed.id]);
    expect(await ids('?deleted=include')).toEqual([kept.id, removed.id].sort());
    await api()
      .get(`/api/workshops/${workshop.id}/vehicles?deleted=only`)
      .set(inspector.auth)
      .expect(403);
  });

  it('shows a client only the vehicles shared with them', async () => {
    const { workshop, client } = await createWorkshopWithTeam(t.config);
    const shared = await createVehicle(workshop);
    await createVehicle(workshop);
    await grantAccess(shared, client.user.id);
    const res = await api()
      .get(`/api/workshops/${workshop.id}/vehicles`)
      .set(client.auth)
      .expect(200);
    expect(res.body.items.map((v: { id: string }) => v.id)).toEqual([shared.id]);
  });

  it.each([
    ['stage', '?stage=scrapped'],
    ['deleted', '?deleted=all'],
  ])('answers 400 naming %s for a bad query', async (field, q) => {
    const res = await api().get(`${base()}${q}`).set(team.owner.auth).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual([field]);
  });
});

describe('POST /api/workshops/:wid/vehicles', () => {
  it('creates the vehicle (201) with an audit entry', async () => {
    const body = buildVehicle({ make: unique('Make'), chassisNumber: 'CH-1' });
    const res = await api().post(base()).set(team.inspector.auth).send(body).expect(201);
    const v = vehicleResponse.parse(res.body);
    expect(v).toMatchObject({
      ...body,
      workshopId: team.workshop.id,
      version: 0,
      stage: 'intake',
      storage: 'indoors',
    });
    const row = await Vehicle.findByPk(v.id);
    expect(row!.createdById).toBe(team.inspector.user.id);
    const entries = await AuditEntry.findAll({ where: { entityId: v.id } });
    expect(entries.map((e) => [e.action, e.actorId, e.workshopId])).toEqual([
      ['vehicle.create', team.inspector.user.id, team.workshop.id],
    ]);
  });

  it('returns the existing row (200) for a retried create with the same id, and keeps one row', async () => {
    const id = crypto.randomUUID();
    const body = { ...buildVehicle({ make: unique('Retry') }), id };
    const first = await api().post(base()).set(team.owner.auth).send(body).expect(201);
    const again = await api().post(base()).set(team.owner.auth).send(body).expect(200);
    expect(again.body).toEqual(first.body);
    expect(await Vehicle.count({ where: { id } })).toBe(1);
    expect(await AuditEntry.count({ where: { entityId: id } })).toBe(1);
  });

  it('makes one row when the same create arrives twice at once', async () => {
    const id = crypto.randomUUID();
    const body = { ...buildVehicle(), id };
    const [a, b] = await Promise.all([
      api().post(base()).set(team.owner.auth).send(body),
      api().post(base()).set(team.owner.auth).send(body),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    expect(a.body.id).toBe(id);
    expect(b.body.id).toBe(id);
    expect(await Vehicle.count({ where: { id } })).toBe(1);
  });

  it('answers 409 for an id used in another workshop, without revealing or touching that vehicle', async () => {
    const other = await createWorkshopWithTeam(t.config);
    const theirs = await createVehicle(other.workshop, { make: 'Secret' });
    const res = await api()
      .post(base())
      .set(team.owner.auth)
      .send({ ...buildVehicle({ make: 'Mine' }), id: theirs.id })
      .expect(409);
    expect(JSON.stringify(res.body)).not.toContain('Secret');
    const row = await Vehicle.findByPk(theirs.id);
    expect(row!.workshopId).toBe(other.workshop.id);
    expect(row!.make).toBe('Secret');
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    ['an empty body', {}, ['year', 'make', 'model', 'bodyPlanKey']],
    ['a year before motor cars', { year: 1800 }, ['year']],
    ['a year in the future', { year: new Date().getFullYear() + 5 }, ['year']],
    ['a blank make', { make: '   ' }, ['make']],
    ['an unknown storage place', { storage: 'garden' }, ['storage']],
    ['an unknown stage', { stage: 'scrapped' }, ['stage']],
    ['an id that is not a UUID', { id: 'abc' }, ['id']],
    ['an overlong chassis number', { chassisNumber: 'x'.repeat(61) }, ['chassisNumber']],
    ['a body plan that does not exist', { bodyPlanKey: 'hovercraft' }, ['bodyPlanKey']],
  ])('answers 400 naming the fields for %s, and creates nothing', async (_label, patch, fields) => {
    const make = unique('Bad');
    const body = Object.keys(patch).length ? { ...buildVehicle({ make }), ...patch } : {};
    const res = await api().post(base()).set(team.owner.auth).send(body).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual([...fields].sort());
    expect(await Vehicle.count({ where: { make } })).toBe(0);
  });
});

describe('GET /api/workshops/:wid/vehicles/:vid', () => {
  it('answers the vehicle with its summary', async () => {
    const v = await createVehicle(team.workshop);
    await createFinding(await createSurvey(v), { severity: 1 });
    const res = await api().get(`${base()}/${v.id}`).set(team.applicator.auth).expect(200);
    expect(vehicleResponse.parse(res.body).summary).toMatchObject({
      surveys: 1,
      findings: 1,
      worstSeverity: 1,
    });
  });

  it('answers 404 for an unknown or malformed id and for a deleted vehicle', async () => {
    await api().get(`${base()}/${crypto.randomUUID()}`).set(team.owner.auth).expect(404);
    await api().get(`${base()}/not-a-uuid`).set(team.owner.auth).expect(404);
    const v = await createVehicle(team.workshop);
    await v.destroy();
    await api().get(`${base()}/${v.id}`).set(team.owner.auth).expect(404);
  });
});

describe('PATCH /api/workshops/:wid/vehicles/:vid', () => {
  it('changes only the fields sent, bumps the version and audits the diff', async () => {
    const v = await createVehicle(team.workshop, { notes: 'Barn find', clientName: 'A. Client' });
    const res = await api()
      .patch(`${base()}/${v.id}`)
      .set(team.inspector.auth)
      .send({ version: 0, stage: 'surveying' })
      .expect(200);
    expect(res.body).toMatchObject({
      stage: 'surveying',
      notes: 'Barn find',
      clientName: 'A. Client',
      version: 1,
    });
    await v.reload();
    expect(v.stage).toBe('surveying');
    expect(v.notes).toBe('Barn find');
    const entry = await AuditEntry.findOne({ where: { entityId: v.id, action: 'vehicle.update' } });
    expect(entry!.changes).toEqual({ stage: { from: 'intake', to: 'surveying' } });
  });

  it('answers 409 stale_version for an old version and keeps the stored values', async () => {
    const v = await createVehicle(team.workshop, { model: 'Original' });
    await api()
      .patch(`${base()}/${v.id}`)
      .set(team.owner.auth)
      .send({ version: 0, model: 'First' })
      .expect(200);
    const res = await api()
      .patch(`${base()}/${v.id}`)
      .set(team.owner.auth)
      .send({ version: 0, model: 'Second' })
      .expect(409);
    expect(res.body.error.code).toBe('stale_version');
    await v.reload();
    expect(v.model).toBe('First');
    expect(v.version).toBe(1);
  });

  it('lets exactly one of two concurrent edits from the same version win', async () => {
    const v = await createVehicle(team.workshop, { model: 'Original' });
    const send = (model: string) =>
      api().patch(`${base()}/${v.id}`).set(team.owner.auth).send({ version: 0, model });
    const [a, b] = await Promise.all([send('From A'), send('From B')]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? 'From A' : 'From B';
    await v.reload();
    expect(v.model).toBe(winner);
    expect(v.version).toBe(1);
  });

  it('refuses a body plan that lacks a zone the vehicle has findings on', async () => {
    const v = await createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' });
    await createFinding(await createSurvey(v), { zoneKey: 'roof-rail-left' });
    const res = await api()
      .patch(`${base()}/${v.id}`)
      .set(team.owner.auth)
      .send({ version: 0, bodyPlanKey: 'open-tourer-4d' })
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['bodyPlanKey']);
    await v.reload();
    expect(v.bodyPlanKey).toBe('closed-saloon-4d');
  });

  it('refuses a body plan that lacks a zone the vehicle has a repair decision on', async () => {
    const v = await createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' });
    await createDecision(v, { zoneKey: 'roof-rail-left' });
    const res = await api()
      .patch(`${base()}/${v.id}`)
      .set(team.owner.auth)
      .send({ version: 0, bodyPlanKey: 'open-tourer-4d' })
      .expect(400);
    expect(res.body.error.fields.bodyPlanKey).toMatch(/roof-rail-left/);
    await v.reload();
    expect(v.bodyPlanKey).toBe('closed-saloon-4d');
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    ['no version', { model: 'X' }, ['version']],
    ['a negative version', { version: -1 }, ['version']],
    ['a blank model', { version: 0, model: '' }, ['model']],
    ['an unknown body plan', { version: 0, bodyPlanKey: 'hovercraft' }, ['bodyPlanKey']],
    ['a year as text', { version: 0, year: '1930' }, ['year']],
  ])('answers 400 naming the fields for %s, and changes nothing', async (_label, body, fields) => {
    const v = await createVehicle(team.workshop);
    const res = await api().patch(`${base()}/${v.id}`).set(team.owner.auth).send(body).expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(fields);
    await v.reload();
    expect(v.version).toBe(0);
  });
});

describe('DELETE /api/workshops/:wid/vehicles/:vid and POST …/restore', () => {
  it('soft-deletes for an owner and restores it', async () => {
    const v = await createVehicle(team.workshop);
    await api().delete(`${base()}/${v.id}`).set(team.owner.auth).expect(204);
    const row = await Vehicle.findByPk(v.id, { paranoid: false });
    expect(row!.deletedAt).toBeInstanceOf(Date);
    await api().get(`${base()}/${v.id}`).set(team.owner.auth).expect(404);

    const res = await api().post(`${base()}/${v.id}/restore`).set(team.owner.auth).expect(200);
    expect(res.body.deletedAt).toBeNull();
    await api().get(`${base()}/${v.id}`).set(team.owner.auth).expect(200);
    const actions = (
      await AuditEntry.findAll({ where: { entityId: v.id }, order: [['createdAt', 'ASC']] })
    ).map((e) => e.action);
    expect(actions.sort()).toEqual(['vehicle.delete', 'vehicle.restore']);
  });

  it('answers 403 to an inspector and leaves the vehicle alone', async () => {
    const v = await createVehicle(team.workshop);
    await api().delete(`${base()}/${v.id}`).set(team.inspector.auth).expect(403);
    expect((await Vehicle.findByPk(v.id))!.deletedAt).toBeNull();
  });
});
