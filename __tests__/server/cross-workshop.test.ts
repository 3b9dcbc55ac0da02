import { QueryTypes } from 'sequelize';
import request from 'supertest';
import type { StorageAdapter } from '@/server/storage';
import {
  buildFinding,
  buildVehicle,
  createVehicle,
  createWorkshopWithTeam,
  unique,
} from '../factories';
import { appStorage, jpeg } from '../factories/photos';
import { createVehicleScenario } from '../factories/scenario';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let storage: StorageAdapter;
beforeAll(() => {
  t = buildTestApp();
  storage = appStorage(t.app);
});
afterAll(() => t.close());

const TABLES = [
  'vehicles',
  'vehicle_access',
  'surveys',
  'findings',
  'photos',
  'member_decisions',
  'audit_entries',
  'memberships',
];

/** Every row of the given workshops, and the stored photo bytes, to compare before and after. */
async function snapshot(workshopIds: string[], photoKeys: string[]) {
  const rows: Record<string, unknown[]> = {};
  for (const table of TABLES)
    rows[table] = await t.sequelize.query(
      `SELECT * FROM ${table} WHERE workshop_id IN (:ids) ORDER BY id`,
      {
        replacements: { ids: workshopIds },
        type: QueryTypes.SELECT,
      },
    );
  const stored = await Promise.all(
    photoKeys.map(async (k) => (await storage.get(k))?.toString('base64') ?? null),
  );
  return { rows, stored };
}

type Call = {
  label: string;
  method: 'get' | 'post' | 'patch' | 'delete';
  url: string;
  body?: object;
  photo?: boolean;
  status?: number;
};

describe('another workshop’s records', () => {
  it('answer 404 to every read and write through the caller’s own workshop, and nothing changes', async () => {
    const secret = unique('Secret model');
    const victim = await createVehicleScenario(t.config, storage, {
      shared: true,
      vehicle: { model: secret },
    });
    const attacker = await createWorkshopWithTeam(t.config);
    const own = await createVehicle(attacker.workshop);
    const a = `/api/workshops/${attacker.workshop.id}`;
    const { vehicle: v, survey: s, finding: f, photo: p } = victim;

    const calls: Call[] = [
      { label: 'read vehicle', method: 'get', url: `${a}/vehicles/${v.id}` },
      {
        label: 'edit vehicle',
        method: 'patch',
        url: `${a}/vehicles/${v.id}`,
        body: { version: 0, make: 'Taken' },
      },
      { label: 'delete vehicle', method: 'delete', url: `${a}/vehicles/${v.id}` },
      { label: 'restore vehicle', method: 'post', url: `${a}/vehicles/${v.id}/restore` },
      { label: 'list access', method: 'get', url: `${a}/vehicles/${v.id}/access` },
      {
        label: 'grant access',
        method: 'post',
        url: `${a}/vehicles/${v.id}/access`,
        body: { userId: attacker.client.user.id },
      },
      {
        label: 'revoke access',
        method: 'delete',
        url: `${a}/vehicles/${v.id}/access/${victim.client.user.id}`,
      },
      { label: 'list surveys', method: 'get', url: `${a}/vehicles/${v.id}/surveys` },
      {
        label: 'start survey',
        method: 'post',
        url: `${a}/vehicles/${v.id}/surveys`,
        body: { date: '2026-11-30', purpose: 'baseline' },
      },
      {
        label: 'edit survey',
        method: 'patch',
        url: `${a}/surveys/${s.id}`,
        body: { notes: 'Taken' },
      },
      { label: 'list findings', method: 'get', url: `${a}/vehicles/${v.id}/findings` },
      {
        label: 'log finding',
        method: 'post',
        url: `${a}/surveys/${s.id}/findings`,
        body: buildFinding(),
      },
      { label: 'read finding', method: 'get', url: `${a}/findings/${f.id}` },
      {
        label: 'edit finding',
        method: 'patch',
        url: `${a}/findings/${f.id}`,
        body: { version: 0, severity: 0 },
      },
      { label: 'delete finding', method: 'delete', url: `${a}/findings/${f.id}` },
      { label: 'restore finding', method: 'post', url: `${a}/findings/${f.id}/restore` },
      { label: 'upload photo', method: 'post', url: `${a}/findings/${f.id}/photos`, photo: true },
      { label: 'read thumb', method: 'get', url: `${a}/photos/${p.id}/thumb` },
      { label: 'read display', method: 'get', url: `${a}/photos/${p.id}/display` },
      { label: 'delete photo', method: 'delete', url: `${a}/photos/${p.id}` },
      // Reusing their ids for new records is a conflict that says nothing about the existing rows.
      {
        label: 'create with their vehicle id',
        method: 'post',
        url: `${a}/vehicles`,
        body: { ...buildVehicle(), id: v.id },
        status: 409,
      },
      {
        label: 'create with their survey id',
        method: 'post',
        url: `${a}/vehicles/${own.id}/surveys`,
        body: { id: s.id, date: '2026-11-30', purpose: 'baseline' },
        status: 409,
      },
    ];
    // The same calls in the victim's workshop, where the attacker is not a member.
    const direct = calls
      .filter((c) => c.status === undefined)
      .map((c) => ({
        ...c,
        label: `${c.label} (their workshop URL)`,
        url: c.url.replace(a, `/api/workshops/${victim.workshop.id}`),
      }));

    const keys = [p.thumbKey, p.displayKey];
    const before = await snapshot([victim.workshop.id, attacker.workshop.id], keys);
    expect([
      before.rows.vehicles.length,
      before.rows.findings.length,
      before.rows.photos.length,
      before.rows.vehicle_access.length,
    ]).toEqual([2, 1, 1, 1]);
    expect(before.stored.every((b) => b !== null)).toBe(true);
    const results: Record<string, number> = {};
    const wanted: Record<string, number> = {};
    for (const c of [...calls, ...direct]) {
      let call = request(t.app)[c.method](c.url).set(attacker.owner.auth);
      if (c.photo) call = call.attach('photos', await jpeg(), 'x.jpg');
      else if (c.body) call = call.send(c.body);
      const res = await call;
      results[c.label] = res.status;
      wanted[c.label] = c.status ?? 404;
      expect(JSON.stringify(res.body)).not.toContain(secret);
    }
    expect(results).toEqual(wanted);
    expect(await snapshot([victim.workshop.id, attacker.workshop.id], keys)).toEqual(before);
  });

  it('never lists them', async () => {
    const victim = await createVehicleScenario(t.config, storage, {
      vehicle: { make: unique('Quillon') },
    });
    const attacker = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .get(`/api/workshops/${attacker.workshop.id}/vehicles?deleted=include`)
      .set(attacker.owner.auth)
      .expect(200);
    expect(res.body.items.map((i: { id: string }) => i.id)).not.toContain(victim.vehicle.id);
    const search = await request(t.app)
      .get(`/api/workshops/${attacker.workshop.id}/vehicles`)
      .query({ q: victim.vehicle.make })
      .set(attacker.owner.auth)
      .expect(200);
    expect(search.body.items).toEqual([]);
  });
});
