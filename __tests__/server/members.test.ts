import request from 'supertest';
import { AuditEntry, Membership, VehicleAccess } from '@/server/models';
import { memberResponse } from '@/shared/schemas/workshop';
import {
  createMember,
  createVehicle,
  createWorkshop,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(() => t.close());

const roleOf = async (membershipId: string) =>
  (await Membership.findByPk(membershipId))?.role ?? null;

describe('GET /api/workshops/:wid/members', () => {
  it.each(['owner', 'inspector', 'applicator'] as const)(
    'lists every member to the %s',
    async (role) => {
      const team = await createWorkshopWithTeam(t.config);
      const res = await request(t.app)
        .get(`/api/workshops/${team.workshop.id}/members`)
        .set(team[role].auth)
        .expect(200);
      const items = res.body.items.map((i: unknown) => memberResponse.parse(i));
      expect(items.map((i: { userId: string; role: string }) => [i.userId, i.role]).sort()).toEqual(
        (['owner', 'inspector', 'applicator', 'client'] as const)
          .map((r) => [team[r].user.id, r])
          .sort(),
      );
      expect(items.find((i: { userId: string }) => i.userId === team.client.user.id)).toMatchObject(
        {
          id: team.client.membership.id,
          name: team.client.user.name,
          email: team.client.user.email,
        },
      );
    },
  );

  it('answers 403 to a client', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .get(`/api/workshops/${team.workshop.id}/members`)
      .set(team.client.auth)
      .expect(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('answers 404 for a workshop the caller is not in, and 401 signed out', async () => {
    const mine = await createWorkshopWithTeam(t.config);
    const other = await createWorkshopWithTeam(t.config);
    await request(t.app)
      .get(`/api/workshops/${other.workshop.id}/members`)
      .set(mine.owner.auth)
      .expect(404);
    await request(t.app).get(`/api/workshops/${mine.workshop.id}/members`).expect(401);
  });
});

describe('PATCH /api/workshops/:wid/members/:mid', () => {
  it("changes a member's role and records it", async () => {
    const { workshop, owner, inspector } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .patch(`/api/workshops/${workshop.id}/members/${inspector.membership.id}`)
      .set(owner.auth)
      .send({ role: 'applicator' })
      .expect(200);
    expect(memberResponse.parse(res.body)).toMatchObject({
      id: inspector.membership.id,
      role: 'applicator',
    });
    expect(await roleOf(inspector.membership.id)).toBe('applicator');
    const entry = await AuditEntry.findOne({
      where: {
        workshopId: workshop.id,
        action: 'member.update',
        entityId: inspector.membership.id,
      },
    });
    expect(entry!.actorId).toBe(owner.user.id);
    expect(entry!.changes).toEqual({ role: { from: 'inspector', to: 'applicator' } });
  });

  it('answers 400 naming role for an unknown role', async () => {
    const { workshop, owner, inspector } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .patch(`/api/workshops/${workshop.id}/members/${inspector.membership.id}`)
      .set(owner.auth)
      .send({ role: 'foreman' })
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['role']);
    expect(await roleOf(inspector.membership.id)).toBe('inspector');
  });

  it.each(['inspector', 'applicator', 'client'] as const)(
    'answers 403 to the %s and changes nothing',
    async (role) => {
      const team = await createWorkshopWithTeam(t.config);
      await request(t.app)
        .patch(`/api/workshops/${team.workshop.id}/members/${team[role].membership.id}`)
        .set(team[role].auth)
        .send({ role: 'owner' })
        .expect(403);
      expect(await roleOf(team[role].membership.id)).toBe(role);
    },
  );

  it('will not demote the last owner (409), but will once there is another owner', async () => {
    const { workshop, owner, inspector } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .patch(`/api/workshops/${workshop.id}/members/${owner.membership.id}`)
      .set(owner.auth)
      .send({ role: 'inspector' })
      .expect(409);
    expect(res.body.error.message).toMatch(/at least one owner/);
    expect(await roleOf(owner.membership.id)).toBe('owner');

    await request(t.app)
      .patch(`/api/workshops/${workshop.id}/members/${inspector.membership.id}`)
      .set(owner.auth)
      .send({ role: 'owner' })
      .expect(200);
    await request(t.app)
      .patch(`/api/workshops/${workshop.id}/members/${owner.membership.id}`)
      .set(owner.auth)
      .send({ role: 'inspector' })
      .expect(200);
    expect(await roleOf(owner.membership.id)).toBe('inspector');
    expect(await roleOf(inspector.membership.id)).toBe('owner');
  });

  it('leaves one owner when two owners demote each other at the same moment', async () => {
    const workshop = await createWorkshop();
    const a = await createMember(t.config, workshop, 'owner');
    const b = await createMember(t.config, workshop, 'owner');
    const results = await Promise.all([
      request(t.app)
        .patch(`/api/workshops/${workshop.id}/members/${b.membership.id}`)
        .set(a.auth)
        .send({ role: 'client' }),
      request(t.app)
        .patch(`/api/workshops/${workshop.id}/members/${a.membership.id}`)
        .set(b.auth)
        .send({ role: 'client' }),
    ]);
    // One wins; the other caller is no longer an owner by the time its change runs.
    expect(results.map((r) => r.status).sort()).toEqual([200, 403]);
    expect(await Membership.count({ where: { workshopId: workshop.id, role: 'owner' } })).toBe(1);
  });

  it("answers 404 for another workshop's member and leaves them untouched", async () => {
    const mine = await createWorkshopWithTeam(t.config);
    const other = await createWorkshopWithTeam(t.config);
    // Through my workshop's URL …
    await request(t.app)
      .patch(`/api/workshops/${mine.workshop.id}/members/${other.inspector.membership.id}`)
      .set(mine.owner.auth)
      .send({ role: 'client' })
      .expect(404);
    // … and through theirs.
    await request(t.app)
      .patch(`/api/workshops/${other.workshop.id}/members/${other.inspector.membership.id}`)
      .set(mine.owner.auth)
      .send({ role: 'client' })
      .expect(404);
    expect(await roleOf(other.inspector.membership.id)).toBe('inspector');
    expect(await AuditEntry.count({ where: { workshopId: other.workshop.id } })).toBe(0);
  });
});

describe('DELETE /api/workshops/:wid/members/:mid', () => {
  it('removes the member and the vehicles they were given in this workshop only', async () => {
    const { workshop, owner, client } = await createWorkshopWithTeam(t.config);
    const shared = await createVehicle(workshop);
    await grantAccess(shared, client.user.id);
    const elsewhere = await createWorkshop();
    await Membership.create({ workshopId: elsewhere.id, userId: client.user.id, role: 'client' });
    const theirs = await createVehicle(elsewhere);
    await grantAccess(theirs, client.user.id);

    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/members/${client.membership.id}`)
      .set(owner.auth)
      .expect(204);

    expect(await Membership.findByPk(client.membership.id)).toBeNull();
    expect(
      await VehicleAccess.count({ where: { workshopId: workshop.id, userId: client.user.id } }),
    ).toBe(0);
    expect(
      await VehicleAccess.count({ where: { workshopId: elsewhere.id, userId: client.user.id } }),
    ).toBe(1);
    expect(
      await Membership.count({ where: { workshopId: elsewhere.id, userId: client.user.id } }),
    ).toBe(1);
    const entry = await AuditEntry.findOne({
      where: { workshopId: workshop.id, action: 'member.remove' },
    });
    expect(entry).toMatchObject({ actorId: owner.user.id, entityId: client.membership.id });

    // The removed member is out at once.
    await request(t.app).get(`/api/workshops/${workshop.id}`).set(client.auth).expect(404);
  });

  it('will not remove the last owner (409)', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .delete(`/api/workshops/${workshop.id}/members/${owner.membership.id}`)
      .set(owner.auth)
      .expect(409);
    expect(res.body.error.message).toMatch(/at least one owner/);
    expect(await Membership.findByPk(owner.membership.id)).not.toBeNull();
  });

  it('answers 403 to an inspector and removes nothing', async () => {
    const { workshop, inspector, client } = await createWorkshopWithTeam(t.config);
    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/members/${client.membership.id}`)
      .set(inspector.auth)
      .expect(403);
    expect(await Membership.findByPk(client.membership.id)).not.toBeNull();
  });

  it("answers 404 for another workshop's member and removes nothing", async () => {
    const mine = await createWorkshopWithTeam(t.config);
    const other = await createWorkshopWithTeam(t.config);
    const vehicle = await createVehicle(other.workshop);
    await grantAccess(vehicle, other.client.user.id);
    await request(t.app)
      .delete(`/api/workshops/${mine.workshop.id}/members/${other.client.membership.id}`)
      .set(mine.owner.auth)
      .expect(404);
    expect(await Membership.findByPk(other.client.membership.id)).not.toBeNull();
    expect(await VehicleAccess.count({ where: { vehicleId: vehicle.id } })).toBe(1);
  });

  it('answers 404 for an id that is not a membership', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/members/not-a-uuid`)
      .set(owner.auth)
      .expect(404);
  });
});
