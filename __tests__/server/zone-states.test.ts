import request from 'supertest';
import { Finding, ReCheck, type Survey } from '@/server/models';
import { zoneStateResponse } from '@/shared/schemas/recheck';
import { addCalendarDays, localDate, spokenDate } from '@/shared/treatments';
import {
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
import { buildTreatment } from '../factories/treatments';
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
const today = () => localDate(new Date(), 'UTC');
const daysAgo = (n: number) => addCalendarDays(today(), -n);

/** A finding logged `n` days ago (survey dated then, row written then). */
async function oldFinding(survey: Survey, partial: Parameters<typeof createFinding>[1]) {
  const f = await createFinding(survey, partial);
  await t.sequelize.query('UPDATE findings SET created_at = ?, updated_at = ? WHERE id = ?', {
    replacements: [
      new Date(`${survey.date}T10:00:00Z`),
      new Date(`${survey.date}T10:00:00Z`),
      f.id,
    ],
  });
  return f;
}

async function states(vehicleId: string, auth = team.owner.auth) {
  const res = await api().get(`${w()}/vehicles/${vehicleId}/zone-states`).set(auth).expect(200);
  const items = res.body.items.map((i: unknown) => zoneStateResponse.parse(i));
  return Object.fromEntries(items.map((i: { zoneKey: string }) => [i.zoneKey, i])) as Record<
    string,
    { state: string; flagged: boolean; reason: string }
  >;
}

async function recordClean(recheckId: string, version = 0) {
  await api()
    .post(`${w()}/rechecks/${recheckId}/result`)
    .set(team.inspector.auth)
    .send({ version, result: 'clean', frassCleaned: true })
    .expect(200);
}

describe('GET /api/workshops/:wid/vehicles/:vid/zone-states', () => {
  it('carries a zone from active through treated, watching to cleared only after the required clean re-checks', async () => {
    const vehicle = await createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' });
    await grantAccess(vehicle, team.client.user.id);
    const survey = await createSurvey(vehicle, { date: daysAgo(410) });
    await oldFinding(survey, {
      zoneKey: 'sill-left',
      severity: 2,
      activity: 'active',
      insectEvidence: ['frass-powder', 'exit-holes-round'],
    });
    await oldFinding(survey, { zoneKey: 'sill-right', severity: 2, activity: 'inactive' });

    let s = await states(vehicle.id, team.client.auth);
    expect(s['sill-left']).toMatchObject({ state: 'active', flagged: false });
    expect(s['sill-right']).toMatchObject({ state: 'old-damage', flagged: false });
    expect(s['roof-rail-left']).toMatchObject({ state: 'no-evidence', flagged: false });
    expect(Object.keys(s)).toContain('dash-rail');

    // Treated 400 days ago: every re-check of the beetle plan but the last is due by now.
    const created = await api()
      .post(`${w()}/vehicles/${vehicle.id}/treatments`)
      .set(team.applicator.auth)
      .send(buildTreatment({ appliedAt: `${daysAgo(400)}T09:00:00Z`, zoneKeys: ['sill-left'] }))
      .expect(201);
    s = await states(vehicle.id);
    expect(s['sill-left']).toMatchObject({ state: 'treated-watching', flagged: false });
    expect(s['sill-left'].reason).toContain('0 of 3 clean re-checks');

    const rechecks = await ReCheck.findAll({
      where: { treatmentId: created.body.id },
      order: [['dueDate', 'ASC']],
    });
    await recordClean(rechecks[0].id);
    await recordClean(rechecks[1].id);
    s = await states(vehicle.id);
    expect(s['sill-left'].state).toBe('treated-watching');
    expect(s['sill-left'].reason).toContain('2 of 3');

    await recordClean(rechecks[2].id);
    s = await states(vehicle.id);
    expect(s['sill-left']).toMatchObject({ state: 'cleared', flagged: false });
    expect(s['sill-right'].state).toBe('old-damage');

    // Fresh evidence at a later re-check reopens the zone, flags it and is logged as a finding.
    const res = await api()
      .post(`${w()}/rechecks/${rechecks[3].id}/result`)
      .set(team.applicator.auth)
      .send({
        version: 0,
        result: 'fresh-evidence',
        frassCleaned: true,
        finding: { zoneKey: 'sill-left', severity: 2, insectEvidence: ['frass-powder'] },
      })
      .expect(200);
    expect(await Finding.count({ where: { id: res.body.findingId, zoneKey: 'sill-left' } })).toBe(
      1,
    );
    s = await states(vehicle.id);
    expect(s['sill-left']).toMatchObject({ state: 'active', flagged: true });
    expect(s['sill-left'].reason).toContain('licensed operator');
  });

  it('does not clear a zone before the span has passed, however many checks are clean', async () => {
    const vehicle = await createVehicle(team.workshop);
    const created = await api()
      .post(`${w()}/vehicles/${vehicle.id}/treatments`)
      .set(team.owner.auth)
      .send(buildTreatment({ appliedAt: `${daysAgo(100)}T09:00:00Z`, zoneKeys: ['sill-left'] }))
      .expect(201);
    const rechecks = await ReCheck.findAll({
      where: { treatmentId: created.body.id },
      order: [['dueDate', 'ASC']],
    });
    for (const r of rechecks.slice(0, 4)) await recordClean(r.id);
    const s = await states(vehicle.id);
    expect(s['sill-left'].state).toBe('treated-watching');
    expect(s['sill-left'].reason).toContain(
      `on or after ${spokenDate(addCalendarDays(daysAgo(100), 365))}`,
    );
  });

  it('turns a treated zone active and flagged when a later survey finds fresh frass', async () => {
    const vehicle = await createVehicle(team.workshop);
    await api()
      .post(`${w()}/vehicles/${vehicle.id}/treatments`)
      .set(team.applicator.auth)
      .send(buildTreatment({ appliedAt: `${daysAgo(30)}T09:00:00Z`, zoneKeys: ['sill-left'] }))
      .expect(201);
    const survey = await createSurvey(vehicle, { date: today() });
    await api()
      .post(`${w()}/surveys/${survey.id}/findings`)
      .set(team.inspector.auth)
      .send({
        zoneKey: 'sill-left',
        severity: 1,
        insectEvidence: ['frass-powder'],
        activity: 'active',
      })
      .expect(201);
    const s = await states(vehicle.id);
    expect(s['sill-left']).toMatchObject({ state: 'active', flagged: true });
  });

  it('answers 404 for a client the vehicle is not shared with', async () => {
    const vehicle = await createVehicle(team.workshop);
    await api().get(`${w()}/vehicles/${vehicle.id}/zone-states`).set(team.client.auth).expect(404);
  });
});
