import request from 'supertest';
import { timelineItem } from '@/shared/schemas/recheck';
import {
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
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

async function history() {
  const vehicle = await createVehicle(team.workshop);
  await grantAccess(vehicle, team.client.user.id);
  const baseline = await createSurvey(vehicle, { date: '2026-09-01', notes: 'Intake' });
  const finding = await createFinding(baseline, {
    zoneKey: 'sill-left',
    activity: 'active',
    insectEvidence: ['frass-powder'],
  });
  const treatment = await createTreatment(vehicle, { appliedAt: '2026-09-10T08:00:00Z' });
  const done = await createRecheck(treatment, {
    dueDate: '2026-09-24',
    status: 'clean',
    completedAt: new Date('2026-09-25T15:00:00Z'),
  });
  const pending = await createRecheck(treatment, { dueDate: '2026-10-22' });
  const progress = await createSurvey(vehicle, { date: '2026-10-01', purpose: 'progress' });
  return { vehicle, baseline, finding, treatment, done, pending, progress };
}

describe('GET /api/workshops/:wid/vehicles/:vid/timeline', () => {
  it('lists surveys, findings, treatments and re-checks newest first', async () => {
    const h = await history();
    const res = await api()
      .get(`${w()}/vehicles/${h.vehicle.id}/timeline`)
      .set(team.client.auth)
      .expect(200);
    const items = res.body.items.map((i: unknown) => timelineItem.parse(i));
    expect(items.map((i: { kind: string; id: string }) => [i.kind, i.id])).toEqual([
      ['recheck', h.pending.id],
      ['survey', h.progress.id],
      ['recheck', h.done.id],
      ['treatment', h.treatment.id],
      ['finding', h.finding.id],
      ['survey', h.baseline.id],
    ]);
    const treatment = items.find((i: { kind: string }) => i.kind === 'treatment');
    expect(treatment.title).toContain('Woodguard Test Concentrate');
    expect(treatment.zoneKeys).toEqual(['sill-left']);
    expect(treatment.at).toBe('2026-09-10T08:00:00.000Z');
    expect([treatment.allDay, treatment.planned]).toEqual([false, false]);

    // Day-only entries say so, so that no client moves them into another day's clock.
    const byId = (id: string) => items.find((i: { id: string }) => i.id === id);
    expect(byId(h.baseline.id)).toMatchObject({ allDay: true, planned: false });
    expect(byId(h.finding.id)).toMatchObject({ allDay: true, planned: false });
    expect(byId(h.pending.id)).toMatchObject({
      allDay: true,
      planned: true,
      title: 'Re-check due 22 Oct 2026',
      zoneKeys: ['sill-left'],
    });
    expect(byId(h.done.id)).toMatchObject({
      allDay: false,
      planned: false,
      title: 'Re-check clean',
      at: '2026-09-25T15:00:00.000Z',
    });
    // The zones are in zoneKeys; the detail does not repeat them.
    expect(byId(h.pending.id).detail).not.toMatch(/sill/i);
  });

  it('filters by kind, and answers 400 naming kinds for an unknown one', async () => {
    const h = await history();
    const res = await api()
      .get(`${w()}/vehicles/${h.vehicle.id}/timeline?kinds=treatment,recheck`)
      .set(team.owner.auth)
      .expect(200);
    expect(res.body.items.map((i: { kind: string }) => i.kind)).toEqual([
      'recheck',
      'recheck',
      'treatment',
    ]);
    const bad = await api()
      .get(`${w()}/vehicles/${h.vehicle.id}/timeline?kinds=treatment,invoice`)
      .set(team.owner.auth)
      .expect(400);
    expect(Object.keys(bad.body.error.fields).join()).toMatch(/^kinds/);
  });
});
