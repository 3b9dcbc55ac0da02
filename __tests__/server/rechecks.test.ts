import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { AuditEntry, Finding, ReCheck, Vehicle } from '@/server/models';
import { dueListResponse, recheckResponse } from '@/shared/schemas/recheck';
import { addCalendarDays, localDate } from '@/shared/treatments';
import { createSurvey, createVehicle, createWorkshopWithTeam, grantAccess } from '../factories';
import { createRecheck, createTreatment } from '../factories/treatments';
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
const saloon = () => createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' });
const recheckOn = async (partial: Parameters<typeof createRecheck>[1] = {}) =>
  createRecheck(
    await createTreatment(await saloon(), { zoneKeys: ['sill-left', 'sill-right'] }),
    partial,
  );

describe('POST /api/workshops/:wid/rechecks/:rid/result', () => {
  it('records a clean re-check (who, when, frass cleaned) and audits it', async () => {
    const r = await recheckOn();
    const res = await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.applicator.auth)
      .send({
        version: 0,
        result: 'clean',
        frassCleaned: true,
        notes: 'No new dust under the sill',
      })
      .expect(200);
    const body = recheckResponse.parse(res.body);
    expect(body).toMatchObject({
      status: 'clean',
      frassCleaned: true,
      completedByName: team.applicator.user.name,
      notes: 'No new dust under the sill',
      findingId: null,
      version: 1,
    });
    expect(body.vehicleLabel).toBe('1934 Harrowgate Eleven');
    expect(Date.now() - Date.parse(body.completedAt!)).toBeLessThan(60_000);
    const [entry] = await AuditEntry.findAll({ where: { entityId: r.id } });
    expect(entry).toMatchObject({ action: 'recheck.record', actorId: team.applicator.user.id });
  });

  it('logs fresh evidence as a finding in the vehicle’s latest survey', async () => {
    const r = await recheckOn();
    const vehicle = (await Vehicle.findByPk(r.vehicleId))!;
    await createSurvey(vehicle, { date: '2026-10-01' });
    const latest = await createSurvey(vehicle, { date: '2026-11-28', purpose: 'post-treatment' });
    const res = await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.inspector.auth)
      .send({
        version: 0,
        result: 'fresh-evidence',
        frassCleaned: true,
        finding: { zoneKey: 'sill-right', severity: 2, insectEvidence: ['frass-powder'] },
      })
      .expect(200);
    expect(res.body.status).toBe('fresh-evidence');
    const finding = await Finding.findByPk(res.body.findingId);
    expect(finding).toMatchObject({
      surveyId: latest.id,
      zoneKey: 'sill-right',
      severity: 2,
      activity: 'active',
      authorId: team.inspector.user.id,
    });
    expect(finding!.insectEvidence).toEqual(['frass-powder']);
    const actions = (await AuditEntry.findAll({ where: { workshopId: team.workshop.id } }))
      .filter((e) => e.entityId === r.id || e.entityId === finding!.id)
      .map((e) => e.action)
      .sort();
    expect(actions).toEqual(['finding.create', 'recheck.record']);
  });

  it.each<[string, Record<string, unknown>, string[], boolean]>([
    ['fresh evidence without a finding', { result: 'fresh-evidence' }, ['finding'], true],
    [
      'a finding in a zone the re-check does not cover',
      { result: 'fresh-evidence', finding: { zoneKey: 'roof-rail-left', severity: 1 } },
      ['finding.zoneKey'],
      true,
    ],
    [
      'fresh evidence on a vehicle without a survey',
      { result: 'fresh-evidence', finding: { zoneKey: 'sill-left', severity: 1 } },
      ['finding'],
      false,
    ],
    ['an unknown result', { result: 'fine' }, ['result'], true],
  ])('answers 400 for %s and changes nothing', async (_l, patch, fields, withSurvey) => {
    const r = await recheckOn();
    if (withSurvey) await createSurvey((await Vehicle.findByPk(r.vehicleId))!);
    const res = await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.owner.auth)
      .send({ version: 0, ...patch })
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(fields);
    await r.reload();
    expect({ status: r.status, version: r.version }).toEqual({ status: 'pending', version: 0 });
    expect(await Finding.count({ where: { vehicleId: r.vehicleId } })).toBe(0);
  });

  it('answers 409 to a stale version, and to a re-check that already has a result', async () => {
    const r = await recheckOn();
    const stale = await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.owner.auth)
      .send({ version: 2, result: 'clean' })
      .expect(409);
    expect(stale.body.error.code).toBe('stale_version');
    await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.owner.auth)
      .send({ version: 0, result: 'clean' })
      .expect(200);
    const again = await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.owner.auth)
      .send({
        version: 1,
        result: 'fresh-evidence',
        finding: { zoneKey: 'sill-left', severity: 1 },
      })
      .expect(409);
    expect(again.body.error.code).toBe('conflict');
    await r.reload();
    expect(r.status).toBe('clean');
  });

  it('of two concurrent results from the same version, exactly one is recorded', async () => {
    const r = await recheckOn();
    const send = (auth: Record<string, string>, notes: string) =>
      api()
        .post(`${w()}/rechecks/${r.id}/result`)
        .set(auth)
        .send({ version: 0, result: 'clean', notes });
    const [a, b] = await Promise.all([
      send(team.inspector.auth, 'Inspector'),
      send(team.applicator.auth, 'Applicator'),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    await r.reload();
    expect(r.notes).toBe((a.status === 200 ? a : b).body.notes);
    expect(await AuditEntry.count({ where: { entityId: r.id } })).toBe(1);
  });

  it('refuses a client (403) even on a shared vehicle', async () => {
    const r = await recheckOn();
    await grantAccess((await Vehicle.findByPk(r.vehicleId))!, team.client.user.id);
    await api()
      .post(`${w()}/rechecks/${r.id}/result`)
      .set(team.client.auth)
      .send({ version: 0, result: 'clean' })
      .expect(403);
    const list = await api()
      .get(`${w()}/vehicles/${r.vehicleId}/rechecks`)
      .set(team.client.auth)
      .expect(200);
    expect(list.body.items.map((i: { id: string }) => i.id)).toEqual([r.id]);
    await r.reload();
    expect(r.status).toBe('pending');
  });
});

describe('moving and assigning', () => {
  it('moves a re-check with its reason, and audits from and to', async () => {
    const r = await recheckOn({ dueDate: '2026-12-09' });
    const res = await api()
      .post(`${w()}/rechecks/${r.id}/move`)
      .set(team.applicator.auth)
      .send({ version: 0, dueDate: '2026-12-16', reason: 'Car at the paint shop' })
      .expect(200);
    expect(res.body).toMatchObject({
      dueDate: '2026-12-16',
      moveReason: 'Car at the paint shop',
      version: 1,
    });
    const [entry] = await AuditEntry.findAll({ where: { entityId: r.id } });
    expect(entry.action).toBe('recheck.move');
    expect(entry.actorId).toBe(team.applicator.user.id);
    expect(entry.changes).toMatchObject({ dueDate: { from: '2026-12-09', to: '2026-12-16' } });
  });

  it('needs a reason to move (400 naming reason)', async () => {
    const r = await recheckOn();
    const res = await api()
      .post(`${w()}/rechecks/${r.id}/move`)
      .set(team.owner.auth)
      .send({ version: 0, dueDate: '2026-12-16', reason: ' ' })
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['reason']);
  });

  it('assigns to a member who records re-checks, and refuses a client or a stranger', async () => {
    const r = await recheckOn();
    const res = await api()
      .post(`${w()}/rechecks/${r.id}/assign`)
      .set(team.owner.auth)
      .send({ version: 0, assigneeId: team.inspector.user.id })
      .expect(200);
    expect(res.body).toMatchObject({
      assigneeId: team.inspector.user.id,
      assigneeName: team.inspector.user.name,
    });
    const outsider = await createWorkshopWithTeam(t.config);
    for (const assigneeId of [team.client.user.id, outsider.applicator.user.id]) {
      const bad = await api()
        .post(`${w()}/rechecks/${r.id}/assign`)
        .set(team.owner.auth)
        .send({ version: 1, assigneeId })
        .expect(400);
      expect(Object.keys(bad.body.error.fields)).toEqual(['assigneeId']);
    }
    await r.reload();
    expect(r.assigneeId).toBe(team.inspector.user.id);
  });
});

describe('GET /api/workshops/:wid/rechecks/due', () => {
  it('buckets pending re-checks into overdue, this week and upcoming, across vehicles', async () => {
    const own = await createWorkshopWithTeam(t.config);
    const today = localDate(new Date(), 'UTC');
    const day = (n: number) => addCalendarDays(today, n);
    const a = await createTreatment(await createVehicle(own.workshop));
    const b = await createTreatment(await createVehicle(own.workshop, { model: 'Fourteen' }));
    const overdue = await createRecheck(a, { dueDate: day(-3) });
    const dueToday = await createRecheck(b, {
      dueDate: day(0),
      assigneeId: own.applicator.user.id,
    });
    const inSix = await createRecheck(a, { dueDate: day(6), assigneeId: own.applicator.user.id });
    const inSeven = await createRecheck(b, { dueDate: day(7) });
    await createRecheck(a, { dueDate: day(-1), status: 'clean', completedAt: new Date() });

    const res = await api()
      .get(`/api/workshops/${own.workshop.id}/rechecks/due`)
      .set(own.applicator.auth)
      .expect(200);
    const due = dueListResponse.parse(res.body);
    const ids = (list: { id: string }[]) => list.map((i) => i.id);
    expect(ids(due.overdue)).toEqual([overdue.id]);
    expect(ids(due.thisWeek)).toEqual([dueToday.id, inSix.id]);
    expect(ids(due.upcoming)).toEqual([inSeven.id]);
    expect(due.upcoming[0].vehicleLabel).toBe('1934 Harrowgate Fourteen');

    const mine = await api()
      .get(
        `/api/workshops/${own.workshop.id}/rechecks/due?assigneeId=${own.applicator.user.id}&days=10`,
      )
      .set(own.applicator.auth)
      .expect(200);
    expect([ids(mine.body.overdue), ids(mine.body.thisWeek), ids(mine.body.upcoming)]).toEqual([
      [],
      [dueToday.id, inSix.id],
      [],
    ]);

    // A client sees only the vehicles shared with them.
    await grantAccess(await createVehicle(own.workshop), own.client.user.id);
    const forClient = await api()
      .get(`/api/workshops/${own.workshop.id}/rechecks/due`)
      .set(own.client.auth)
      .expect(200);
    expect(forClient.body).toEqual({ overdue: [], thisWeek: [], upcoming: [] });

    const bad = await api()
      .get(`/api/workshops/${own.workshop.id}/rechecks/due?days=200`)
      .set(own.owner.auth)
      .expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['days']);
  });
});

describe('GET /api/workshops/:wid/rechecks/:rid/calendar.ics', () => {
  it('answers one all-day event naming the vehicle and zones', async () => {
    const r = await recheckOn({ dueDate: '2027-02-28' });
    const res = await api()
      .get(`${w()}/rechecks/${r.id}/calendar.ics`)
      .set(team.owner.auth)
      .buffer(true)
      .parse((response, done) => {
        let text = '';
        response.on('data', (c: Buffer) => (text += c.toString('utf8')));
        response.on('end', () => done(null, text));
      })
      .expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    const ics = res.body as string;
    expect(ics.startsWith('BEGIN:VCALENDAR')).toBe(true);
    expect(ics).toContain('DTSTART;VALUE=DATE:20270228');
    expect(ics).toContain('DTEND;VALUE=DATE:20270301');
    expect(ics.match(/BEGIN:VEVENT/g)).toHaveLength(1);
    const summary = ics.replace(/\r\n /g, '').match(/^SUMMARY:(.*)$/m)?.[1] ?? '';
    expect(summary).toContain('1934 Harrowgate Eleven');
    expect(summary).toContain('sill');
    expect(ics).toContain(`UID:recheck-${r.id}@soundframe`);
  });
});

describe('another workshop’s re-checks', () => {
  it('answer 404 to every read and write, and nothing changes', async () => {
    const victim = await createWorkshopWithTeam(t.config);
    const vehicle = await createVehicle(victim.workshop);
    const tr = await createTreatment(vehicle);
    const r = await createRecheck(tr, { notes: 'Secret' });
    const attacker = await createWorkshopWithTeam(t.config);
    const snapshot = async () => ({
      rechecks: await t.sequelize.query('SELECT * FROM re_checks WHERE workshop_id = ?', {
        replacements: [victim.workshop.id],
        type: QueryTypes.SELECT,
      }),
      audit: await AuditEntry.count({ where: { workshopId: victim.workshop.id } }),
    });
    const before = await snapshot();
    for (const wid of [attacker.workshop.id, victim.workshop.id]) {
      const base = `/api/workshops/${wid}`;
      const calls = [
        api().get(`${base}/vehicles/${vehicle.id}/rechecks`),
        api().post(`${base}/rechecks/${r.id}/result`).send({ version: 0, result: 'clean' }),
        api()
          .post(`${base}/rechecks/${r.id}/move`)
          .send({ version: 0, dueDate: '2027-01-01', reason: 'x' }),
        api()
          .post(`${base}/rechecks/${r.id}/assign`)
          .send({ version: 0, assigneeId: attacker.owner.user.id }),
        api().get(`${base}/rechecks/${r.id}/calendar.ics`),
        api().get(`${base}/vehicles/${vehicle.id}/zone-states`),
        api().get(`${base}/vehicles/${vehicle.id}/timeline`),
      ];
      for (const call of calls) {
        const res = await call.set(attacker.owner.auth);
        expect({ status: res.status, code: res.body.error?.code }).toEqual({
          status: 404,
          code: 'not_found',
        });
        expect(JSON.stringify(res.body)).not.toContain('Secret');
      }
    }
    const due = await api()
      .get(`/api/workshops/${attacker.workshop.id}/rechecks/due`)
      .set(attacker.owner.auth)
      .expect(200);
    expect(JSON.stringify(due.body)).not.toContain(r.id);
    expect(await snapshot()).toEqual(before);
    expect(await ReCheck.count({ where: { id: r.id, status: 'pending' } })).toBe(1);
  });
});
