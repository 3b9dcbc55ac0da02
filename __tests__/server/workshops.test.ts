import request from 'supertest';
import { AuditEntry, Workshop } from '@/server/models';
import { workshopResponse } from '@/shared/schemas/workshop';
import { DEFAULT_WOOD_SETTINGS } from '@/shared/wood';
import { createWorkshop, createWorkshopWithTeam, unique } from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';
import { DEFAULT_TREATMENT_SETTINGS } from '@/shared/treatments';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(() => t.close());

describe('GET /api/workshops/:wid', () => {
  it.each(['owner', 'inspector', 'applicator', 'client'] as const)(
    'answers the %s with the workshop, default settings and their role',
    async (role) => {
      const team = await createWorkshopWithTeam(t.config);
      const res = await request(t.app)
        .get(`/api/workshops/${team.workshop.id}`)
        .set(team[role].auth)
        .expect(200);
      expect(workshopResponse.parse(res.body)).toEqual({
        id: team.workshop.id,
        name: team.workshop.name,
        settings: {
          units: 'metric',
          region: '',
          labourRatePerHour: 0,
          currency: 'EUR',
          paperSize: 'A4',
          wood: DEFAULT_WOOD_SETTINGS,
          treatments: DEFAULT_TREATMENT_SETTINGS,
        },
        role,
      });
    },
  );

  it('answers 404 to someone from another workshop, 404 for a malformed id, and 401 signed out', async () => {
    const mine = await createWorkshopWithTeam(t.config);
    const other = await createWorkshop();
    const res = await request(t.app)
      .get(`/api/workshops/${other.id}`)
      .set(mine.owner.auth)
      .expect(404);
    expect(res.body.error.code).toBe('not_found');
    await request(t.app).get('/api/workshops/not-an-id').set(mine.owner.auth).expect(404);
    await request(t.app).get(`/api/workshops/${mine.workshop.id}`).expect(401);
  });
});

describe('PATCH /api/workshops/:wid', () => {
  it('renames and merges settings: keys left out keep their saved values', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const first = await request(t.app)
      .patch(`/api/workshops/${workshop.id}`)
      .set(owner.auth)
      .send({ settings: { region: 'Coastal, damp winters', labourRatePerHour: 65 } })
      .expect(200);
    expect(first.body.settings).toEqual({
      units: 'metric',
      region: 'Coastal, damp winters',
      labourRatePerHour: 65,
      currency: 'EUR',
      paperSize: 'A4',
      wood: DEFAULT_WOOD_SETTINGS,
      treatments: DEFAULT_TREATMENT_SETTINGS,
    });

    const name = unique('Renamed Coachworks');
    const second = await request(t.app)
      .patch(`/api/workshops/${workshop.id}`)
      .set(owner.auth)
      .send({ name, settings: { units: 'imperial', paperSize: 'Letter' } })
      .expect(200);
    expect(workshopResponse.parse(second.body)).toMatchObject({
      name,
      role: 'owner',
      settings: {
        units: 'imperial',
        region: 'Coastal, damp winters',
        labourRatePerHour: 65,
        currency: 'EUR',
      },
    });

    const saved = await Workshop.findByPk(workshop.id);
    expect(saved!.name).toBe(name);
    expect(saved!.settings).toEqual({
      units: 'imperial',
      region: 'Coastal, damp winters',
      labourRatePerHour: 65,
      currency: 'EUR',
      paperSize: 'Letter',
      wood: DEFAULT_WOOD_SETTINGS,
      treatments: DEFAULT_TREATMENT_SETTINGS,
    });
    const entries = await AuditEntry.findAll({
      where: { workshopId: workshop.id, action: 'workshop.update' },
      order: [['createdAt', 'ASC']],
    });
    expect(entries).toHaveLength(2);
    expect(entries[1].changes).toEqual({
      name: { from: workshop.name, to: name },
      units: { from: 'metric', to: 'imperial' },
      paperSize: { from: 'A4', to: 'Letter' },
    });
  });

  it('writes no audit entry when nothing changes', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    await request(t.app)
      .patch(`/api/workshops/${workshop.id}`)
      .set(owner.auth)
      .send({ name: workshop.name })
      .expect(200);
    expect(await AuditEntry.count({ where: { workshopId: workshop.id } })).toBe(0);
  });

  it('answers 400 naming the fields', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .patch(`/api/workshops/${workshop.id}`)
      .set(owner.auth)
      .send({ name: 'x', settings: { units: 'cubits', labourRatePerHour: -5, paperSize: 'A5' } })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'name',
      'settings.labourRatePerHour',
      'settings.paperSize',
      'settings.units',
    ]);
    expect((await Workshop.findByPk(workshop.id))!.name).toBe(workshop.name);
  });

  it.each(['inspector', 'applicator', 'client'] as const)(
    'answers 403 to the %s and changes nothing',
    async (role) => {
      const team = await createWorkshopWithTeam(t.config);
      await request(t.app)
        .patch(`/api/workshops/${team.workshop.id}`)
        .set(team[role].auth)
        .send({ name: 'Taken over' })
        .expect(403);
      expect((await Workshop.findByPk(team.workshop.id))!.name).toBe(team.workshop.name);
    },
  );

  it('answers 404 for another workshop and leaves it untouched', async () => {
    const mine = await createWorkshopWithTeam(t.config);
    const other = await createWorkshop();
    await request(t.app)
      .patch(`/api/workshops/${other.id}`)
      .set(mine.owner.auth)
      .send({ name: 'Taken over' })
      .expect(404);
    expect((await Workshop.findByPk(other.id))!.name).toBe(other.name);
  });
});
