import request from 'supertest';
import { AuditEntry, Workshop } from '@/server/models';
import { workshopResponse } from '@/shared/schemas/workshop';
import { DEFAULT_TREATMENT_SETTINGS } from '@/shared/treatments';
import { DEFAULT_WOOD_SETTINGS } from '@/shared/wood';
import { createWorkshopWithTeam } from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterAll(() => t.close());

const api = () => request(t.app);
const path = (team: { workshop: Workshop }) => `/api/workshops/${team.workshop.id}`;
const patchWood = (team: Awaited<ReturnType<typeof createWorkshopWithTeam>>, wood: object) =>
  api().patch(path(team)).set(team.owner.auth).send({ settings: { wood } });

describe('GET /api/workshops/:wid — wood settings', () => {
  it('answers the defaults for a workshop that has none saved', async () => {
    const team = await createWorkshopWithTeam(t.config);
    const res = await api().get(path(team)).set(team.client.auth).expect(200);
    expect(workshopResponse.parse(res.body).settings.wood).toEqual(DEFAULT_WOOD_SETTINGS);
  });

  it('fills keys missing from older saved settings with their defaults, keeping the saved ones', async () => {
    const team = await createWorkshopWithTeam(t.config);
    await team.workshop.update({
      settings: {
        units: 'imperial',
        wood: { scarfSlope: 12, verdictRules: { keepMinSectionModulusRatio: 0.95 } },
      } as never,
    });
    const res = await api().get(path(team)).set(team.inspector.auth).expect(200);
    expect(res.body.settings.units).toBe('imperial');
    expect(res.body.settings.wood).toEqual({
      ...DEFAULT_WOOD_SETTINGS,
      scarfSlope: 12,
      verdictRules: { ...DEFAULT_WOOD_SETTINGS.verdictRules, keepMinSectionModulusRatio: 0.95 },
    });
  });
});

describe('PATCH /api/workshops/:wid — wood settings', () => {
  it('changes one threshold and keeps every other setting', async () => {
    const team = await createWorkshopWithTeam(t.config);
    await api()
      .patch(path(team))
      .set(team.owner.auth)
      .send({ settings: { labourRatePerHour: 55, currency: 'GBP' } })
      .expect(200);

    const res = await patchWood(team, {
      verdictRules: { keepMinSectionModulusRatio: 0.85 },
    }).expect(200);
    const expected = {
      ...DEFAULT_WOOD_SETTINGS,
      verdictRules: { ...DEFAULT_WOOD_SETTINGS.verdictRules, keepMinSectionModulusRatio: 0.85 },
    };
    expect(res.body.settings).toEqual({
      units: 'metric',
      region: '',
      labourRatePerHour: 55,
      currency: 'GBP',
      paperSize: 'A4',
      wood: expected,
      treatments: DEFAULT_TREATMENT_SETTINGS,
    });

    // A second partial change, one price, keeps the threshold set before.
    const next = await patchWood(team, { timberPricePerBoardFoot: { 'white-oak': 14.5 } }).expect(
      200,
    );
    expect(next.body.settings.wood).toEqual({
      ...expected,
      timberPricePerBoardFoot: {
        ...DEFAULT_WOOD_SETTINGS.timberPricePerBoardFoot,
        'white-oak': 14.5,
      },
    });
    // And a change elsewhere in the settings leaves the wood alone.
    const other = await api()
      .patch(path(team))
      .set(team.owner.auth)
      .send({ settings: { units: 'imperial' } })
      .expect(200);
    expect(other.body.settings.wood).toEqual(next.body.settings.wood);

    const saved = await Workshop.findByPk(team.workshop.id);
    expect(saved!.settings.wood).toEqual(next.body.settings.wood);
    const entries = await AuditEntry.findAll({
      where: { workshopId: team.workshop.id, action: 'workshop.update' },
      order: [['createdAt', 'ASC']],
    });
    expect(entries).toHaveLength(4);
    expect(entries[1].changes).toEqual({
      'wood.verdictRules': {
        from: DEFAULT_WOOD_SETTINGS.verdictRules,
        to: expected.verdictRules,
      },
    });
    expect(Object.keys(entries[2].changes!)).toEqual(['wood.timberPricePerBoardFoot']);
  });

  it.each<[string, object, object | null, string]>([
    [
      'a consolidate threshold above the keep threshold',
      { verdictRules: { consolidateMinSectionModulusRatio: 0.95 } },
      null,
      'settings.wood.verdictRules.consolidateMinSectionModulusRatio',
    ],
    [
      'a keep threshold lowered below the saved consolidate threshold',
      { verdictRules: { keepMinSectionModulusRatio: 0.7 } },
      { verdictRules: { consolidateMinSectionModulusRatio: 0.8 } },
      'settings.wood.verdictRules.consolidateMinSectionModulusRatio',
    ],
    [
      'a ratio above 1',
      { verdictRules: { keepMinSectionModulusRatio: 1.2 } },
      null,
      'settings.wood.verdictRules.keepMinSectionModulusRatio',
    ],
    [
      'a negative timber price',
      { timberPricePerBoardFoot: { 'white-ash': -3 } },
      null,
      'settings.wood.timberPricePerBoardFoot.white-ash',
    ],
    [
      'hours as a string',
      { hoursPerOperation: { splice: '4' } },
      null,
      'settings.wood.hoursPerOperation.splice',
    ],
    [
      'an assembly rule of zero members',
      { verdictRules: { replaceAssemblyMinMembers: 0 } },
      null,
      'settings.wood.verdictRules.replaceAssemblyMinMembers',
    ],
  ])('answers 400 to %s, naming the field, and saves nothing', async (_l, wood, saved, field) => {
    const team = await createWorkshopWithTeam(t.config);
    if (saved) await patchWood(team, saved).expect(200);
    const before = (await Workshop.findByPk(team.workshop.id))!.settings;
    const res = await patchWood(team, wood).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields)).toEqual([field]);
    expect((await Workshop.findByPk(team.workshop.id))!.settings).toEqual(before);
  });

  it.each(['inspector', 'applicator', 'client'] as const)(
    'answers 403 to the %s and changes nothing',
    async (role) => {
      const team = await createWorkshopWithTeam(t.config);
      await api()
        .patch(path(team))
        .set(team[role].auth)
        .send({ settings: { wood: { scarfSlope: 6 } } })
        .expect(403);
      const res = await api().get(path(team)).set(team.owner.auth).expect(200);
      expect(res.body.settings.wood.scarfSlope).toBe(DEFAULT_WOOD_SETTINGS.scarfSlope);
      expect(await AuditEntry.count({ where: { workshopId: team.workshop.id } })).toBe(0);
    },
  );
});
