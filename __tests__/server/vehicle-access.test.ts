import crypto from 'node:crypto';
import request from 'supertest';
import { AuditEntry, VehicleAccess } from '@/server/models';
import { findVehicleFor } from '@/server/services/vehicle-access';
import { vehicleAccessResponse } from '@/shared/schemas/vehicle';
import {
  contextOf,
  createMember,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(() => t.close());

const api = () => request(t.app);

describe('findVehicleFor', () => {
  it('finds a vehicle of the member’s workshop, and one shared with a client', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const v = await createVehicle(team.workshop);
    await expect(
      findVehicleFor(contextOf(team.applicator.membership), v.id),
    ).resolves.toMatchObject({ id: v.id });
    await grantAccess(v, team.client.user.id);
    await expect(findVehicleFor(contextOf(team.client.membership), v.id)).resolves.toMatchObject({
      id: v.id,
    });
  });

  it('answers 404 for another workshop’s vehicle, an unshared one for a client, a deleted one and a bad id', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const other = await createWorkshopWithTeam(t.config);
    const theirs = await createVehicle(other.workshop);
    const unshared = await createVehicle(team.workshop);
    const deleted = await createVehicle(team.workshop);
    await grantAccess(deleted, team.client.user.id);
    await deleted.destroy();
    const status = (p: Promise<unknown>) =>
      p.then(
        () => 200,
        (e: { status?: number }) => e.status,
      );
    expect(await status(findVehicleFor(contextOf(team.owner.membership), theirs.id))).toBe(404);
    expect(await status(findVehicleFor(contextOf(team.client.membership), unshared.id))).toBe(404);
    expect(await status(findVehicleFor(contextOf(team.owner.membership), deleted.id))).toBe(404);
    expect(
      await status(
        findVehicleFor(contextOf(team.client.membership), deleted.id, { includeDeleted: true }),
      ),
    ).toBe(404);
    expect(
      await status(
        findVehicleFor(contextOf(team.owner.membership), deleted.id, { includeDeleted: true }),
      ),
    ).toBe(200);
    expect(await status(findVehicleFor(contextOf(team.owner.membership), 'x'))).toBe(404);
  });
});

describe('GET/POST /api/workshops/:wid/vehicles/:vid/access', () => {
  it('shares a vehicle with a client (201), lists it, and the client can then read it', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const v = await createVehicle(team.workshop);
    const url = `/api/workshops/${team.workshop.id}/vehicles/${v.id}`;
    await api().get(url).set(team.client.auth).expect(404);

    const res = await api()
      .post(`${url}/access`)
      .set(team.inspector.auth)
      .send({ userId: team.client.user.id })
      .expect(201);
    expect(vehicleAccessResponse.parse(res.body)).toMatchObject({
      userId: team.client.user.id,
      email: team.client.user.email,
    });
    const row = await VehicleAccess.findOne({
      where: { vehicleId: v.id, userId: team.client.user.id },
    });
    expect(row!.grantedById).toBe(team.inspector.user.id);
    expect(await AuditEntry.count({ where: { entityId: v.id, action: 'vehicle.share' } })).toBe(1);

    const list = await api().get(`${url}/access`).set(team.owner.auth).expect(200);
    expect(list.body.items.map((i: { userId: string }) => i.userId)).toEqual([team.client.user.id]);
    await api().get(url).set(team.client.auth).expect(200);
  });

  it('answers 200 and keeps one row when the vehicle is already shared', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const v = await createVehicle(team.workshop);
    const url = `/api/workshops/${team.workshop.id}/vehicles/${v.id}/access`;
    await api().post(url).set(team.owner.auth).send({ userId: team.client.user.id }).expect(201);
    await api().post(url).set(team.owner.auth).send({ userId: team.client.user.id }).expect(200);
    expect(await VehicleAccess.count({ where: { vehicleId: v.id } })).toBe(1);
  });

  it.each([
    ['a member who is not a client', 'inspector'],
    ['a client of another workshop', 'foreign-client'],
    ['someone with no account', 'nobody'],
  ])('answers 400 fields.userId for %s, and shares nothing', async (_label, who) => {
    const team = await createWorkshopWithTeam(t.config);
    const other = await createWorkshopWithTeam(t.config);
    const v = await createVehicle(team.workshop);
    const userId =
      who === 'inspector'
        ? team.inspector.user.id
        : who === 'foreign-client'
          ? other.client.user.id
          : crypto.randomUUID();
    const res = await api()
      .post(`/api/workshops/${team.workshop.id}/vehicles/${v.id}/access`)
      .set(team.owner.auth)
      .send({ userId })
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['userId']);
    expect(await VehicleAccess.count({ where: { vehicleId: v.id } })).toBe(0);
  });

  it.each([
    [{}, ['userId']],
    [{ userId: 'not-a-uuid' }, ['userId']],
  ])('answers 400 naming the fields for %j', async (body, fields) => {
    const team = await createWorkshopWithTeam(t.config);
    const v = await createVehicle(team.workshop);
    const res = await api()
      .post(`/api/workshops/${team.workshop.id}/vehicles/${v.id}/access`)
      .set(team.owner.auth)
      .send(body)
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(fields);
  });
});

describe('DELETE /api/workshops/:wid/vehicles/:vid/access/:userId', () => {
  it('stops sharing; the client gets 404 afterwards; removing again is still 204', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const second = await createMember(t.config, team.workshop, 'client');
    const v = await createVehicle(team.workshop);
    await grantAccess(v, team.client.user.id);
    await grantAccess(v, second.user.id);
    const url = `/api/workshops/${team.workshop.id}/vehicles/${v.id}`;
    await api().get(url).set(team.client.auth).expect(200);

    await api().delete(`${url}/access/${team.client.user.id}`).set(team.owner.auth).expect(204);
    await api().get(url).set(team.client.auth).expect(404);
    await api().get(url).set(second.auth).expect(200);
    expect(await VehicleAccess.count({ where: { vehicleId: v.id } })).toBe(1);
    expect(await AuditEntry.count({ where: { entityId: v.id, action: 'vehicle.unshare' } })).toBe(
      1,
    );

    await api().delete(`${url}/access/${team.client.user.id}`).set(team.owner.auth).expect(204);
    expect(await AuditEntry.count({ where: { entityId: v.id, action: 'vehicle.unshare' } })).toBe(
      1,
    );
  });
});
