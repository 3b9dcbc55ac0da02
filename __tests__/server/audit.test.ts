import request from 'supertest';
import { auditEntryResponse } from '@/shared/schemas/workshop';
import { createWorkshopWithTeam } from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(() => t.close());

/** A workshop whose owner changed three things through the API, in this order. */
async function workshopWithHistory() {
  const team = await createWorkshopWithTeam(t.config);
  const base = `/api/workshops/${team.workshop.id}`;
  await request(t.app)
    .patch(base)
    .set(team.owner.auth)
    .send({ settings: { units: 'imperial' } })
    .expect(200);
  await request(t.app)
    .patch(`${base}/members/${team.applicator.membership.id}`)
    .set(team.owner.auth)
    .send({ role: 'inspector' })
    .expect(200);
  await request(t.app)
    .delete(`${base}/members/${team.client.membership.id}`)
    .set(team.owner.auth)
    .expect(204);
  return team;
}

describe('GET /api/workshops/:wid/audit', () => {
  it("lists this workshop's entries newest first, with the actor's name", async () => {
    const team = await workshopWithHistory();
    await workshopWithHistory(); // another workshop's history must not show

    const res = await request(t.app)
      .get(`/api/workshops/${team.workshop.id}/audit`)
      .set(team.owner.auth)
      .expect(200);
    const items = res.body.items.map((i: unknown) => auditEntryResponse.parse(i));
    expect(items.map((i: { action: string }) => i.action)).toEqual([
      'member.remove',
      'member.update',
      'workshop.update',
    ]);
    expect(items.every((i: { actorName: string }) => i.actorName === team.owner.user.name)).toBe(
      true,
    );
    expect(items[1]).toMatchObject({
      entityType: 'membership',
      entityId: team.applicator.membership.id,
    });
    expect(items[1].summary).toMatch(/Applicator to Inspector/);
    const times = items.map((i: { at: string }) => Date.parse(i.at));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
  });

  it('pages with limit and offset', async () => {
    const team = await workshopWithHistory();
    const res = await request(t.app)
      .get(`/api/workshops/${team.workshop.id}/audit?limit=1&offset=1`)
      .set(team.owner.auth)
      .expect(200);
    expect(res.body.items.map((i: { action: string }) => i.action)).toEqual(['member.update']);
  });

  it('answers 400 naming limit and offset when they are out of range', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .get(`/api/workshops/${team.workshop.id}/audit?limit=0&offset=-1`)
      .set(team.owner.auth)
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['limit', 'offset']);
  });

  it.each(['inspector', 'applicator', 'client'] as const)('answers 403 to the %s', async (role) => {
    const team = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .get(`/api/workshops/${team.workshop.id}/audit`)
      .set(team[role].auth)
      .expect(403);
    expect(res.body.items).toBeUndefined();
  });

  it('answers 404 to an owner of another workshop', async () => {
    const team = await workshopWithHistory();
    const stranger = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .get(`/api/workshops/${team.workshop.id}/audit`)
      .set(stranger.owner.auth)
      .expect(404);
    expect(res.body.items).toBeUndefined();
  });
});
