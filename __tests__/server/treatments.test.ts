import crypto from 'node:crypto';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { AuditEntry, ReCheck, Treatment, TreatmentVersion } from '@/server/models';
import { treatmentResponse } from '@/shared/schemas/treatment';
import { createVehicle, createWorkshopWithTeam, grantAccess } from '../factories';
import { buildTreatment, createTreatment } from '../factories/treatments';
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
const url = (vehicleId: string) => `${w()}/vehicles/${vehicleId}/treatments`;

describe('POST /api/workshops/:wid/vehicles/:vid/treatments', () => {
  it('records every field (201) and plans the re-checks from the workshop plan', async () => {
    const vehicle = await saloon();
    const body = buildTreatment({ zoneKeys: ['sill-left', 'sill-right'] });
    const res = await api().post(url(vehicle.id)).set(team.applicator.auth).send(body).expect(201);
    const tr = treatmentResponse.parse(res.body);
    const { labelConfirmed: _c, ...fields } = body;
    expect(tr).toMatchObject({
      ...fields,
      vehicleId: vehicle.id,
      version: 0,
      recordedById: team.applicator.user.id,
      recordedByName: team.applicator.user.name,
      versions: [],
    });
    // Anobiid beetles follow the beetle plan: 14, 42, 90, 180 and 365 days after 2026-11-25.
    const rechecks = await ReCheck.findAll({
      where: { treatmentId: tr.id },
      order: [['dueDate', 'ASC']],
    });
    expect(rechecks.map((r) => r.dueDate)).toEqual([
      '2026-12-09',
      '2027-01-06',
      '2027-02-23',
      '2027-05-24',
      '2027-11-25',
    ]);
    for (const r of rechecks) {
      expect(r.zoneKeys).toEqual(['sill-left', 'sill-right']);
      expect(r.status).toBe('pending');
      // The applicator who recorded it is given the follow-ups.
      expect(r.assigneeId).toBe(team.applicator.user.id);
    }
    const [entry] = await AuditEntry.findAll({ where: { entityId: tr.id } });
    expect(entry).toMatchObject({ action: 'treatment.create', actorId: team.applicator.user.id });
    expect(entry.summary).toContain('Woodguard Test Concentrate');
  });

  it('uses the workshop’s own plan and time zone, and leaves re-checks unassigned for an inspector', async () => {
    const team2 = await createWorkshopWithTeam(t.config);
    // Only the termite plan and the zone change; every other setting keeps its default.
    const patched = await api()
      .patch(`/api/workshops/${team2.workshop.id}`)
      .set(team2.owner.auth)
      .send({
        settings: {
          treatments: { recheckPlans: { termites: [10, 31] }, timeZone: 'Pacific/Auckland' },
        },
      })
      .expect(200);
    expect(patched.body.settings.treatments.recheckPlans.beetles).toEqual([14, 42, 90, 180, 365]);
    expect(patched.body.settings.treatments.clearance).toEqual({
      cleanChecksRequired: 3,
      minSpanDays: 365,
    });
    const vehicle = await createVehicle(team2.workshop);
    // 20:00 UTC on 31 January is already 1 February in Auckland.
    const res = await api()
      .post(`/api/workshops/${team2.workshop.id}/vehicles/${vehicle.id}/treatments`)
      .set(team2.inspector.auth)
      .send(
        buildTreatment({
          appliedAt: '2028-01-31T20:00:00Z',
          targetAgent: 'drywood-termites',
          method: 'fumigation',
        }),
      )
      .expect(201);
    const rechecks = await ReCheck.findAll({
      where: { treatmentId: res.body.id },
      order: [['dueDate', 'ASC']],
    });
    expect(rechecks.map((r) => [r.dueDate, r.assigneeId])).toEqual([
      ['2028-02-11', null],
      ['2028-03-03', null],
    ]);
  });

  it('returns the first row (200) for a retried id, with one set of re-checks', async () => {
    const vehicle = await saloon();
    const body = { ...buildTreatment(), id: crypto.randomUUID() };
    await api().post(url(vehicle.id)).set(team.inspector.auth).send(body).expect(201);
    await api().post(url(vehicle.id)).set(team.inspector.auth).send(body).expect(200);
    expect(await Treatment.count({ where: { id: body.id } })).toBe(1);
    expect(await ReCheck.count({ where: { treatmentId: body.id } })).toBe(5);
  });

  it.each<[string, Record<string, unknown>, string[]]>([
    [
      'no label fields',
      {
        productName: undefined,
        registrationNumber: '',
        activeIngredient: '  ',
        concentration: undefined,
      },
      ['activeIngredient', 'concentration', 'productName', 'registrationNumber'],
    ],
    ['a negative re-entry time', { reentryHours: -1 }, ['reentryHours']],
    ['the label not confirmed', { labelConfirmed: false }, ['labelConfirmed']],
    ['the label confirmation missing', { labelConfirmed: undefined }, ['labelConfirmed']],
    [
      'zones not on the vehicle’s plan',
      { zoneKeys: ['sill-left', 'tailgate-frame'] },
      ['zoneKeys'],
    ],
    ['no zones', { zoneKeys: [] }, ['zoneKeys']],
    ['an unknown method', { method: 'smoke-bomb' }, ['method']],
  ])('answers 400 naming the fields for %s, and stores nothing', async (_l, patch, fields) => {
    const vehicle = await saloon();
    const auditsBefore = await AuditEntry.count({ where: { workshopId: team.workshop.id } });
    const res = await api()
      .post(url(vehicle.id))
      .set(team.owner.auth)
      .send({ ...buildTreatment(), ...patch })
      .expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(fields);
    expect(await Treatment.count({ where: { vehicleId: vehicle.id } })).toBe(0);
    expect(await ReCheck.count({ where: { vehicleId: vehicle.id } })).toBe(0);
    expect(await AuditEntry.count({ where: { workshopId: team.workshop.id } })).toBe(auditsBefore);
  });

  it('lets a client read a shared vehicle’s treatments but not record one (403)', async () => {
    const vehicle = await saloon();
    await grantAccess(vehicle, team.client.user.id);
    await createTreatment(vehicle);
    const list = await api().get(url(vehicle.id)).set(team.client.auth).expect(200);
    expect(list.body.items).toHaveLength(1);
    treatmentResponse.parse(list.body.items[0]);
    await api().post(url(vehicle.id)).set(team.client.auth).send(buildTreatment()).expect(403);
    expect(await Treatment.count({ where: { vehicleId: vehicle.id } })).toBe(1);
  });
});

describe('POST /api/workshops/:wid/treatments/:tid/corrections', () => {
  const correct = (id: string, body: object) =>
    api().post(`${w()}/treatments/${id}/corrections`).send(body);

  it('keeps the old version with the reason and who corrected it, and audits the change', async () => {
    const vehicle = await saloon();
    const created = await api()
      .post(url(vehicle.id))
      .set(team.applicator.auth)
      .send(buildTreatment())
      .expect(201);
    const res = await correct(created.body.id, {
      ...buildTreatment({
        dilution: '1 part to 5 parts water',
        zoneKeys: ['sill-left', 'sill-right'],
      }),
      version: 0,
      reason: 'Dilution misread from the mixing sheet',
    })
      .set(team.inspector.auth)
      .expect(200);
    const tr = treatmentResponse.parse(res.body);
    expect(tr).toMatchObject({ version: 1, dilution: '1 part to 5 parts water' });
    expect(tr.versions).toHaveLength(1);
    expect(tr.versions[0]).toMatchObject({
      version: 0,
      reason: 'Dilution misread from the mixing sheet',
      changedByName: team.inspector.user.name,
      data: { dilution: '1 part to 4 parts water', zoneKeys: ['sill-left'] },
    });
    // The original author stays; the re-checks still to come cover the corrected zones.
    expect(tr.recordedById).toBe(team.applicator.user.id);
    const pending = await ReCheck.findAll({ where: { treatmentId: tr.id } });
    expect(pending).toHaveLength(5);
    for (const r of pending) expect(r.zoneKeys).toEqual(['sill-left', 'sill-right']);

    const entries = await AuditEntry.findAll({
      where: { entityId: tr.id },
      order: [['createdAt', 'ASC']],
    });
    expect(entries.map((e) => [e.action, e.actorId])).toEqual([
      ['treatment.create', team.applicator.user.id],
      ['treatment.correct', team.inspector.user.id],
    ]);
    expect(entries[1].changes).toMatchObject({
      dilution: { from: '1 part to 4 parts water', to: '1 part to 5 parts water' },
      reason: 'Dilution misread from the mixing sheet',
    });

    const again = await api().get(`${w()}/treatments/${tr.id}`).set(team.owner.auth).expect(200);
    expect(again.body.versions[0].data.dilution).toBe('1 part to 4 parts water');
  });

  it('plans the remaining re-checks again when the date changes, keeping those already done', async () => {
    const vehicle = await saloon();
    const created = await api()
      .post(url(vehicle.id))
      .set(team.inspector.auth)
      .send(buildTreatment())
      .expect(201);
    const first = await ReCheck.findOne({
      where: { treatmentId: created.body.id },
      order: [['dueDate', 'ASC']],
    });
    await first!.update({ status: 'clean', completedAt: new Date() });
    await correct(created.body.id, {
      ...buildTreatment({ appliedAt: '2026-11-27T09:30:00.000Z' }),
      version: 0,
      reason: 'Applied two days later than written',
    })
      .set(team.inspector.auth)
      .expect(200);
    const rows = await ReCheck.findAll({
      where: { treatmentId: created.body.id },
      order: [['dueDate', 'ASC']],
    });
    expect(rows.map((r) => [r.dueDate, r.status])).toEqual([
      ['2026-12-09', 'clean'],
      ['2027-01-08', 'pending'],
      ['2027-02-25', 'pending'],
      ['2027-05-26', 'pending'],
      ['2027-11-27', 'pending'],
    ]);
  });

  it('answers 409 to a stale version and 400 without a reason; nothing changes', async () => {
    const vehicle = await saloon();
    const row = await createTreatment(vehicle);
    const stale = await correct(row.id, {
      ...buildTreatment({ notes: 'x' }),
      version: 3,
      reason: 'r',
    })
      .set(team.owner.auth)
      .expect(409);
    expect(stale.body.error.code).toBe('stale_version');
    const noReason = await correct(row.id, {
      ...buildTreatment({ notes: 'x' }),
      version: 0,
      reason: '',
    })
      .set(team.owner.auth)
      .expect(400);
    expect(Object.keys(noReason.body.error.fields)).toEqual(['reason']);
    await row.reload();
    expect(row.version).toBe(0);
    expect(await TreatmentVersion.count({ where: { treatmentId: row.id } })).toBe(0);
  });

  it('offers no way to edit or delete a treatment', async () => {
    const row = await createTreatment(await saloon());
    await api().patch(`${w()}/treatments/${row.id}`).set(team.owner.auth).send({}).expect(404);
    await api().delete(`${w()}/treatments/${row.id}`).set(team.owner.auth).expect(404);
    expect(await Treatment.count({ where: { id: row.id } })).toBe(1);
  });
});

describe('another workshop’s treatments', () => {
  it('answer 404 to every read and write, and nothing changes', async () => {
    const victim = await createWorkshopWithTeam(t.config);
    const vehicle = await createVehicle(victim.workshop);
    const row = await createTreatment(vehicle, { notes: 'Secret', dueDates: ['2026-12-09'] });
    const attacker = await createWorkshopWithTeam(t.config);
    const snapshot = async () => ({
      treatments: await t.sequelize.query('SELECT * FROM treatments WHERE workshop_id = ?', {
        replacements: [victim.workshop.id],
        type: QueryTypes.SELECT,
      }),
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
        api().get(`${base}/vehicles/${vehicle.id}/treatments`),
        api().post(`${base}/vehicles/${vehicle.id}/treatments`).send(buildTreatment()),
        api().get(`${base}/treatments/${row.id}`),
        api()
          .post(`${base}/treatments/${row.id}/corrections`)
          .send({ ...buildTreatment(), version: 0, reason: 'Take over' }),
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
    expect(await snapshot()).toEqual(before);
  });
});
