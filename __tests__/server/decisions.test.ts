import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { errorHandler } from '@/server/middleware/error-handler';
import { AuditEntry, MemberDecision, type Vehicle } from '@/server/models';
import { getBodyPlan, getZone } from '@/shared/body-plans';
import { decisionResponse, type DecisionInputs } from '@/shared/schemas/decision';
import {
  classForChosen,
  DEFAULT_WOOD_SETTINGS,
  DomainError,
  estimateRepair,
  recommendVerdict,
  residualSection,
  type VerdictRules,
} from '@/shared/wood';
import {
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
import { buildDecisionInputs, buildSaveDecision, createDecision } from '../factories/decisions';
import { buildTestApp, type TestApp } from './support/test-app';

const LABOUR_RATE = 60;

let t: TestApp;
let team: Awaited<ReturnType<typeof createWorkshopWithTeam>>;
beforeAll(async () => {
  t = buildTestApp();
  team = await createWorkshopWithTeam(t.config);
  await team.workshop.update({ settings: { labourRatePerHour: LABOUR_RATE, currency: 'GBP' } });
});
afterAll(() => t.close());

const api = () => request(t.app);
const w = () => `/api/workshops/${team.workshop.id}`;
const url = (v: Vehicle, zoneKey = 'sill-left') => `${w()}/vehicles/${v.id}/decisions/${zoneKey}`;
const saloon = () => createVehicle(team.workshop, { bodyPlanKey: 'closed-saloon-4d' });

/** What the domain function says for the same measurements, built here independently of the service. */
function expectedVerdict(
  zoneKey: string,
  inputs: DecisionInputs,
  seen: { severity?: number; activeAgent?: boolean; assemblyReplacing?: number } = {},
  rules: VerdictRules = DEFAULT_WOOD_SETTINGS.verdictRules,
  scarfSlope = DEFAULT_WOOD_SETTINGS.scarfSlope,
) {
  const zone = getZone(getBodyPlan('closed-saloon-4d')!, zoneKey)!;
  const section = residualSection({
    width: inputs.widthMm,
    depth: inputs.depthMm,
    decay: inputs.decayMm,
  });
  return recommendVerdict(
    {
      structuralClass: zone.structuralClass,
      sectionModulusRatio: section.sectionModulusRatio,
      areaRatio: section.areaRatio,
      affectedLengthMm: inputs.affectedLengthMm,
      memberLengthMm: inputs.memberLengthMm,
      atJointOrFitting: inputs.atJointOrFitting,
      severity: seen.severity ?? 0,
      activeAgent: seen.activeAgent ?? false,
      assemblyMembersNeedingReplacement: seen.assemblyReplacing ?? 0,
      scarfLengthMm: inputs.depthMm * scarfSlope,
    },
    rules,
  );
}

const decisionAudits = (entityId: string) =>
  AuditEntry.findAll({ where: { entityId }, order: [['createdAt', 'ASC']] });

describe('PUT /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey', () => {
  it('creates the decision (201) with the server’s recommendation, the estimate and an audit entry', async () => {
    const vehicle = await saloon();
    // 15 mm of decay from the top of a 50 mm sill leaves 49 % of the section modulus.
    const body = buildSaveDecision({
      inputs: { decayMm: { top: 15 } },
      chosenOption: 'splice',
      notes: 'Rot under the rear door shut',
    });
    const res = await api().put(url(vehicle)).set(team.inspector.auth).send(body).expect(201);
    const d = decisionResponse.parse(res.body);

    const verdict = expectedVerdict('sill-left', body.inputs);
    expect(verdict.option).toBe('splice');
    expect(d).toMatchObject({
      vehicleId: vehicle.id,
      zoneKey: 'sill-left',
      inputs: body.inputs,
      recommendedOption: verdict.option,
      recommendationReasons: verdict.reasons,
      chosenOption: 'splice',
      overrideReason: '',
      decisionClass: verdict.decisionClass,
      notes: 'Rot under the rear door shut',
      decidedById: team.inspector.user.id,
      decidedByName: team.inspector.user.name,
      version: 0,
    });

    const estimate = estimateRepair({
      option: 'splice',
      widthMm: 95,
      depthMm: 50,
      memberLengthMm: 1720,
      affectedLengthMm: 300,
      species: 'white-ash',
      settings: DEFAULT_WOOD_SETTINGS,
      labourRatePerHour: LABOUR_RATE,
    });
    expect(d).toMatchObject({
      estimatedHours: estimate.hours,
      labourCost: estimate.labourCost,
      materialCost: estimate.materialCost,
      totalCost: estimate.totalCost,
      materials: estimate.cutList,
      splice: estimate.splice,
    });
    // The workshop's rates really reached the estimate: 4 h default for a splice at 60 an hour,
    // a 1:10 scarf through 50 mm, and one cut-list line of white ash.
    expect(d.labourCost).toBe(240);
    expect(d.splice).toEqual({ slope: 10, scarfLengthMm: 500, minSpacingMm: 1500 });
    expect(d.materials).toHaveLength(1);
    expect(d.materials[0]).toMatchObject({ species: 'white-ash', finishedLengthMm: 1300 });
    expect(d.totalCost).toBeCloseTo(d.labourCost + d.materialCost, 2);

    const row = await MemberDecision.findByPk(d.id);
    expect(row).toMatchObject({
      workshopId: team.workshop.id,
      recommendedOption: 'splice',
      chosenOption: 'splice',
      estimatedHours: 4,
      labourCost: 240,
      materialCost: estimate.materialCost,
    });
    expect(row!.materials).toEqual(estimate.cutList);
    const [entry] = await decisionAudits(d.id);
    expect(entry).toMatchObject({
      action: 'decision.create',
      entityType: 'decision',
      actorId: team.inspector.user.id,
    });
    expect(entry.changes).toMatchObject({
      chosenOption: { from: null, to: 'splice' },
      recommendedOption: { from: null, to: 'splice' },
    });
  });

  it('takes the zone’s open findings into account, and ignores deleted ones', async () => {
    const vehicle = await saloon();
    const survey = await createSurvey(vehicle);
    const inputs = buildDecisionInputs();
    // No decay measured: kept when nothing else is known.
    expect(expectedVerdict('sill-left', inputs).option).toBe('keep');

    await createFinding(survey, { zoneKey: 'sill-left', severity: 3, activity: 'active' });
    const gone = await createFinding(survey, { zoneKey: 'sill-left', severity: 4 });
    await gone.destroy();
    await createFinding(survey, { zoneKey: 'sill-right', severity: 4 });

    const seen = { severity: 3, activeAgent: true };
    const verdict = expectedVerdict('sill-left', inputs, seen);
    expect(verdict.option).not.toBe('keep');
    expect(verdict).not.toEqual(expectedVerdict('sill-left', inputs, { severity: 4 }));

    const res = await api()
      .put(url(vehicle))
      .set(team.owner.auth)
      .send({ inputs, chosenOption: verdict.option })
      .expect(201);
    expect(res.body).toMatchObject({
      recommendedOption: verdict.option,
      recommendationReasons: verdict.reasons,
      decisionClass: verdict.decisionClass,
    });
  });

  it('counts the other members of the assembly that are being replaced', async () => {
    const vehicle = await saloon();
    await createDecision(vehicle, {
      zoneKey: 'door-front-left-hinge-stile',
      chosenOption: 'replace-member',
    });
    await createDecision(vehicle, {
      zoneKey: 'door-front-left-waist-rail',
      chosenOption: 'replace-assembly',
    });
    // Kept members of the assembly and members of another door do not count.
    await createDecision(vehicle, { zoneKey: 'door-front-left-bottom-rail', chosenOption: 'keep' });
    await createDecision(vehicle, {
      zoneKey: 'door-front-right-hinge-stile',
      chosenOption: 'replace-member',
    });

    // Half the depth gone along most of the stile: replace it, and with two others, the door frame.
    const inputs = buildDecisionInputs({
      widthMm: 60,
      depthMm: 38,
      memberLengthMm: 520,
      affectedLengthMm: 400,
      decayMm: { top: 19 },
    });
    const zone = 'door-front-left-shut-stile';
    const verdict = expectedVerdict(zone, inputs, { assemblyReplacing: 2 });
    expect(verdict.option).toBe('replace-assembly');
    expect(expectedVerdict(zone, inputs, { assemblyReplacing: 1 }).option).toBe('replace-member');

    const res = await api()
      .put(url(vehicle, zone))
      .set(team.inspector.auth)
      .send({ inputs, chosenOption: 'replace-assembly' })
      .expect(201);
    expect(res.body.recommendedOption).toBe('replace-assembly');
    expect(res.body.recommendationReasons).toEqual(verdict.reasons);
  });

  it('applies the workshop’s own verdict rules', async () => {
    const own = await createWorkshopWithTeam(t.config);
    const rules = { ...DEFAULT_WOOD_SETTINGS.verdictRules, keepMinSectionModulusRatio: 0.8 };
    await own.workshop.update({
      settings: { wood: { ...DEFAULT_WOOD_SETTINGS, verdictRules: rules } },
    });
    const vehicle = await createVehicle(own.workshop);
    // 3 mm from the top leaves 88 % of the section modulus: consolidate by default, keep at 80 %.
    const inputs = buildDecisionInputs({ decayMm: { top: 3 } });
    expect(expectedVerdict('sill-left', inputs).option).toBe('consolidate');
    expect(expectedVerdict('sill-left', inputs, {}, rules).option).toBe('keep');

    const res = await api()
      .put(`/api/workshops/${own.workshop.id}/vehicles/${vehicle.id}/decisions/sill-left`)
      .set(own.owner.auth)
      .send({ inputs, chosenOption: 'keep' })
      .expect(201);
    expect(res.body.recommendedOption).toBe('keep');
    expect(res.body.recommendationReasons).toEqual(
      expectedVerdict('sill-left', inputs, {}, rules).reasons,
    );
  });

  it('replaces a member too short for a splice with scarfs at the workshop’s slope', async () => {
    // A 700 mm door waist rail, 32 mm deep, with 100 mm affected: the section alone says splice,
    // but two 1:10 scarfs (320 mm each) do not fit in it; at 1:6 (192 mm each) they do.
    const inputs = buildDecisionInputs({
      widthMm: 50,
      depthMm: 32,
      memberLengthMm: 700,
      affectedLengthMm: 100,
      decayMm: { top: 10 },
    });
    const zone = 'door-rear-left-waist-rail';
    expect(expectedVerdict(zone, inputs).option).toBe('replace-member');
    expect(expectedVerdict(zone, inputs, {}, undefined, 6).option).toBe('splice');

    const own = await createWorkshopWithTeam(t.config);
    const vehicle = await createVehicle(own.workshop);
    const put = () =>
      api()
        .put(`/api/workshops/${own.workshop.id}/vehicles/${vehicle.id}/decisions/${zone}`)
        .set(own.owner.auth);
    const first = await put().send({ inputs, chosenOption: 'replace-member' }).expect(201);
    expect(first.body.recommendationReasons).toEqual(expectedVerdict(zone, inputs).reasons);

    await own.workshop.update({ settings: { wood: { ...DEFAULT_WOOD_SETTINGS, scarfSlope: 6 } } });
    const second = await put()
      .send({ inputs, chosenOption: 'splice', version: first.body.version })
      .expect(200);
    expect(second.body).toMatchObject({
      recommendedOption: 'splice',
      recommendationReasons: expectedVerdict(zone, inputs, {}, undefined, 6).reasons,
      splice: { slope: 6, scarfLengthMm: 192 },
    });
  });

  describe('choosing another option than the recommendation', () => {
    it('needs a reason (400 naming overrideReason) and stores nothing without one', async () => {
      const vehicle = await saloon();
      const body = buildSaveDecision({ inputs: { decayMm: { top: 15 } }, chosenOption: 'keep' });
      for (const overrideReason of [undefined, '', '   ']) {
        const res = await api()
          .put(url(vehicle))
          .set(team.inspector.auth)
          .send({ ...body, overrideReason })
          .expect(400);
        expect(res.body.error.fields).toEqual({ overrideReason: 'Say why you chose differently' });
      }
      expect(await MemberDecision.count({ where: { vehicleId: vehicle.id } })).toBe(0);
    });

    it.each([
      ['keeping a structural member', 'sill-left', { top: 15 }, 'keep', 'monitor'],
      [
        'replacing a structural member',
        'sill-left',
        { top: 15 },
        'replace-member',
        'structural-must-fix',
      ],
      ['replacing a roof slat', 'roof-slat-2', { top: 0 }, 'replace-member', 'cosmetic'],
    ] as const)(
      'stores the reason, a class for %s, and the estimate of the chosen option',
      async (_label, zoneKey, decayMm, chosenOption, decisionClass) => {
        const vehicle = await saloon();
        const zone = getZone(getBodyPlan('closed-saloon-4d')!, zoneKey)!;
        const inputs = buildDecisionInputs({
          widthMm: zone.nominalSection.widthMm,
          depthMm: zone.nominalSection.depthMm,
          memberLengthMm: zone.lengthMm,
          decayMm,
        });
        const verdict = expectedVerdict(zoneKey, inputs);
        expect(verdict.option).not.toBe(chosenOption);
        const res = await api()
          .put(url(vehicle, zoneKey))
          .set(team.inspector.auth)
          .send({ inputs, chosenOption, overrideReason: '  The owner wants original wood kept  ' })
          .expect(201);
        const d = decisionResponse.parse(res.body);
        expect(d).toMatchObject({
          recommendedOption: verdict.option,
          chosenOption,
          overrideReason: 'The owner wants original wood kept',
          decisionClass,
        });
        expect(decisionClass).toBe(classForChosen(chosenOption, zone, false));
        const estimate = estimateRepair({
          option: chosenOption,
          widthMm: inputs.widthMm,
          depthMm: inputs.depthMm,
          memberLengthMm: inputs.memberLengthMm,
          affectedLengthMm: inputs.affectedLengthMm,
          species: inputs.species,
          settings: DEFAULT_WOOD_SETTINGS,
          labourRatePerHour: LABOUR_RATE,
        });
        expect(d).toMatchObject({
          estimatedHours: estimate.hours,
          totalCost: estimate.totalCost,
          materials: estimate.cutList,
          splice: null,
        });
      },
    );

    it('drops a reason sent with the recommended option (it would explain a choice not made)', async () => {
      const vehicle = await saloon();
      const res = await api()
        .put(url(vehicle))
        .set(team.inspector.auth)
        .send(buildSaveDecision({ chosenOption: 'keep', overrideReason: 'Leftover text' }))
        .expect(201);
      expect(res.body).toMatchObject({ recommendedOption: 'keep', overrideReason: '' });
    });
  });

  it('classes an option chosen over the recommendation like the verdict would', () => {
    const primary = { structuralClass: 'primary' } as const;
    const slat = { structuralClass: 'non-structural' } as const;
    expect(classForChosen('keep', primary, false)).toBe('monitor');
    expect(classForChosen('keep', slat, false)).toBe('cosmetic');
    expect(classForChosen('keep', slat, true)).toBe('monitor');
    expect(classForChosen('consolidate', { structuralClass: 'secondary' }, false)).toBe(
      'structural-must-fix',
    );
    expect(classForChosen('splice', slat, true)).toBe('cosmetic');
  });

  describe('bad input answers 400 naming the fields, and stores nothing', () => {
    const nested = (patch: Record<string, unknown>) => {
      const body = buildSaveDecision() as Record<string, unknown>;
      return { ...body, inputs: { ...(body.inputs as object), ...patch } };
    };
    it.each<[string, string, Record<string, unknown>, string[]]>([
      ['a negative width', 'sill-left', nested({ widthMm: -95 }), ['inputs.widthMm']],
      [
        'a decay depth "NaN" and one as a string',
        'sill-left',
        nested({ decayMm: { top: 'NaN', left: '5' } }),
        ['inputs.decayMm.left', 'inputs.decayMm.top'],
      ],
      [
        'a decay depth of null (JSON’s NaN)',
        'sill-left',
        nested({ decayMm: { bottom: null } }),
        ['inputs.decayMm.bottom'],
      ],
      [
        'an unknown option',
        'sill-left',
        { ...buildSaveDecision(), chosenOption: 'glue-it' },
        ['chosenOption'],
      ],
      ['an unknown species', 'sill-left', nested({ species: 'balsa' }), ['inputs.species']],
      ['a zone not on the vehicle’s plan', 'tailgate-frame', buildSaveDecision(), ['zoneKey']],
      [
        'decay deeper than the member from one face',
        'sill-left',
        nested({ decayMm: { top: 51, right: 96 } }),
        ['inputs.decayMm.right', 'inputs.decayMm.top'],
      ],
      [
        'more affected length than the member has',
        'sill-left',
        nested({ affectedLengthMm: 1800 }),
        ['inputs.affectedLengthMm'],
      ],
      [
        // Replacing needs 20/4 stock, which no standard rough thickness gives: the domain refuses.
        'a section thicker than standard stock (from the domain function)',
        'sill-left',
        {
          ...nested({ widthMm: 120, depthMm: 120 }),
          chosenOption: 'replace-member',
          overrideReason: 'Heavy section',
        },
        ['inputs.widthMm'],
      ],
      [
        'a body that is not an object',
        'sill-left',
        [] as unknown as Record<string, unknown>,
        ['body'],
      ],
    ])('%s', async (_label, zoneKey, body, fields) => {
      const vehicle = await saloon();
      const audits = () => AuditEntry.count({ where: { workshopId: team.workshop.id } });
      const auditsBefore = await audits();
      const res = await api().put(url(vehicle, zoneKey)).set(team.inspector.auth).send(body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      expect(Object.keys(res.body.error.fields).sort()).toEqual(fields);
      expect(await MemberDecision.count({ where: { vehicleId: vehicle.id } })).toBe(0);
      expect(await audits()).toBe(auditsBefore);
    });
  });

  describe('updating', () => {
    it('replaces the decision from its version (200), bumps the version and audits the diff', async () => {
      const vehicle = await saloon();
      const first = await api()
        .put(url(vehicle))
        .set(team.inspector.auth)
        .send(buildSaveDecision({ inputs: { decayMm: { top: 15 } }, chosenOption: 'splice' }))
        .expect(201);
      const body = buildSaveDecision({
        version: 0,
        inputs: { decayMm: { top: 15 }, affectedLengthMm: 900 },
        chosenOption: 'replace-member',
      });
      const verdict = expectedVerdict('sill-left', body.inputs);
      expect(verdict.option).toBe('replace-member');
      const res = await api().put(url(vehicle)).set(team.owner.auth).send(body).expect(200);
      expect(res.body).toMatchObject({
        id: first.body.id,
        version: 1,
        chosenOption: 'replace-member',
        recommendedOption: 'replace-member',
        splice: null,
        decidedByName: team.owner.user.name,
      });
      expect(res.body.materials[0].finishedLengthMm).toBe(1720 + 50);

      const entries = await decisionAudits(first.body.id);
      expect(entries.map((e) => e.action)).toEqual(['decision.create', 'decision.update']);
      const changes = entries[1].changes as Record<string, { from: unknown; to: unknown }>;
      expect(changes.chosenOption).toEqual({ from: 'splice', to: 'replace-member' });
      expect(changes.splice.from).toEqual(first.body.splice);
      expect(changes.splice.to).toBeNull();
      expect(changes).not.toHaveProperty('notes');
      expect(entries[1].actorId).toBe(team.owner.user.id);
    });

    it('changes nothing (same version, no audit entry) when the same decision is saved again', async () => {
      const vehicle = await saloon();
      const body = buildSaveDecision({ inputs: { decayMm: { top: 15 } }, chosenOption: 'splice' });
      const first = await api().put(url(vehicle)).set(team.inspector.auth).send(body).expect(201);
      const again = await api()
        .put(url(vehicle))
        .set(team.inspector.auth)
        .send({ ...body, version: 0 })
        .expect(200);
      expect(again.body.version).toBe(0);
      expect(await AuditEntry.count({ where: { entityId: first.body.id } })).toBe(1);
    });

    it('needs the version once a decision exists (400 naming version)', async () => {
      const vehicle = await saloon();
      await createDecision(vehicle);
      const res = await api()
        .put(url(vehicle))
        .set(team.inspector.auth)
        .send(buildSaveDecision({ notes: 'Second opinion' }))
        .expect(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['version']);
      expect((await MemberDecision.findOne({ where: { vehicleId: vehicle.id } }))!.notes).toBe('');
    });

    it('answers 409 to a stale version and keeps the stored decision', async () => {
      const vehicle = await saloon();
      const row = await createDecision(vehicle, { notes: 'Current' });
      await row.update({ notes: 'Edited elsewhere' });
      expect(row.version).toBe(1);
      const res = await api()
        .put(url(vehicle))
        .set(team.inspector.auth)
        .send(buildSaveDecision({ version: 0, notes: 'Mine' }))
        .expect(409);
      expect(res.body.error.code).toBe('stale_version');
      await row.reload();
      expect({ notes: row.notes, version: row.version }).toEqual({
        notes: 'Edited elsewhere',
        version: 1,
      });
    });

    it('of two concurrent saves from the same version, exactly one wins and nothing is lost', async () => {
      const vehicle = await saloon();
      const row = await createDecision(vehicle);
      const [a, b] = await Promise.all([
        api()
          .put(url(vehicle))
          .set(team.owner.auth)
          .send(buildSaveDecision({ version: 0, notes: 'Owner: keep, watch it' })),
        api()
          .put(url(vehicle))
          .set(team.inspector.auth)
          .send(
            buildSaveDecision({
              version: 0,
              inputs: { decayMm: { top: 15 } },
              chosenOption: 'splice',
              notes: 'Inspector: splice',
            }),
          ),
      ]);
      expect([a.status, b.status].sort()).toEqual([200, 409]);
      const winner = a.status === 200 ? a : b;
      await row.reload();
      expect({ notes: row.notes, chosenOption: row.chosenOption, version: row.version }).toEqual({
        notes: winner.body.notes,
        chosenOption: winner.body.chosenOption,
        version: 1,
      });
      expect(await AuditEntry.count({ where: { entityId: row.id } })).toBe(1);
    });

    it('of two concurrent first saves for a member, one creates and the other is told to reload', async () => {
      const vehicle = await saloon();
      const [a, b] = await Promise.all([
        api()
          .put(url(vehicle))
          .set(team.owner.auth)
          .send(buildSaveDecision({ notes: 'A' })),
        api()
          .put(url(vehicle))
          .set(team.inspector.auth)
          .send(buildSaveDecision({ notes: 'B' })),
      ]);
      expect([a.status, b.status].sort()).toEqual([201, 400]);
      expect((a.status === 400 ? a : b).body.error.fields).toHaveProperty('version');
      const rows = await MemberDecision.findAll({ where: { vehicleId: vehicle.id } });
      expect(rows.map((r) => r.notes)).toEqual([(a.status === 201 ? a : b).body.notes]);
    });
  });

  it('answers 404 for a deleted vehicle', async () => {
    const vehicle = await saloon();
    await vehicle.destroy();
    await api().put(url(vehicle)).set(team.owner.auth).send(buildSaveDecision()).expect(404);
    expect(await MemberDecision.count({ where: { vehicleId: vehicle.id } })).toBe(0);
  });
});

describe('GET decisions', () => {
  it('lists a vehicle’s decisions in zone order and reads one, for a client it is shared with', async () => {
    const vehicle = await saloon();
    await grantAccess(vehicle, team.client.user.id);
    await createDecision(vehicle, { zoneKey: 'sill-right', decidedById: team.inspector.user.id });
    await createDecision(vehicle, { zoneKey: 'dash-rail' });
    await createDecision(await saloon(), { zoneKey: 'sill-left' });

    const list = await api()
      .get(`${w()}/vehicles/${vehicle.id}/decisions`)
      .set(team.client.auth)
      .expect(200);
    expect(list.body.items.map((d: { zoneKey: string }) => d.zoneKey)).toEqual([
      'dash-rail',
      'sill-right',
    ]);
    for (const item of list.body.items) decisionResponse.parse(item);

    const one = await api().get(url(vehicle, 'sill-right')).set(team.client.auth).expect(200);
    expect(one.body).toMatchObject({
      zoneKey: 'sill-right',
      decidedByName: team.inspector.user.name,
    });
  });

  it('answers 404 for a member without a decision, and for a client the vehicle is not shared with', async () => {
    const vehicle = await saloon();
    await createDecision(vehicle);
    await api().get(url(vehicle, 'sill-right')).set(team.owner.auth).expect(404);
    await api().get(url(vehicle, 'no-such-zone')).set(team.owner.auth).expect(404);
    await api().get(url(vehicle)).set(team.client.auth).expect(404);
    await api().get(`${w()}/vehicles/${vehicle.id}/decisions`).set(team.client.auth).expect(404);
  });
});

describe('DELETE /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey', () => {
  it('removes the decision (204), keeps it in the audit trail, and a new save starts over', async () => {
    const vehicle = await saloon();
    const row = await createDecision(vehicle, { chosenOption: 'consolidate', notes: 'Harden' });
    await api().delete(url(vehicle)).set(team.inspector.auth).expect(204);
    expect(await MemberDecision.findByPk(row.id)).toBeNull();
    const [entry] = await decisionAudits(row.id);
    expect(entry.action).toBe('decision.delete');
    expect(entry.changes).toMatchObject({
      chosenOption: { from: 'consolidate', to: null },
      notes: { from: 'Harden', to: null },
    });

    await api().get(url(vehicle)).set(team.owner.auth).expect(404);
    await api().delete(url(vehicle)).set(team.owner.auth).expect(404);
    const again = await api()
      .put(url(vehicle))
      .set(team.owner.auth)
      .send(buildSaveDecision())
      .expect(201);
    expect(again.body.version).toBe(0);
  });
});

describe('another workshop’s decisions', () => {
  it('answer 404 to every read and write through the caller’s own workshop, and nothing changes', async () => {
    const victim = await createWorkshopWithTeam(t.config);
    const vehicle = await createVehicle(victim.workshop);
    await grantAccess(vehicle, victim.client.user.id);
    await createDecision(vehicle, { notes: 'Secret' });
    const attacker = await createWorkshopWithTeam(t.config);
    const snapshot = async () => ({
      decisions: await t.sequelize.query('SELECT * FROM member_decisions WHERE workshop_id = ?', {
        replacements: [victim.workshop.id],
        type: QueryTypes.SELECT,
      }),
      audit: await AuditEntry.count({ where: { workshopId: victim.workshop.id } }),
    });
    const before = await snapshot();

    const base = (wid: string) => `/api/workshops/${wid}/vehicles/${vehicle.id}/decisions`;
    for (const wid of [attacker.workshop.id, victim.workshop.id]) {
      const calls = [
        api().get(base(wid)),
        api().get(`${base(wid)}/sill-left`),
        api()
          .put(`${base(wid)}/sill-left`)
          .send(buildSaveDecision({ version: 0 })),
        api()
          .put(`${base(wid)}/sill-right`)
          .send(buildSaveDecision()),
        api().delete(`${base(wid)}/sill-left`),
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

describe('the error handler', () => {
  it('answers a DomainError with 400 naming its field', () => {
    let status = 0;
    let body: unknown;
    const res = {
      headersSent: false,
      status(s: number) {
        status = s;
        return this;
      },
      json(b: unknown) {
        body = b;
        return this;
      },
    };
    errorHandler(
      new DomainError(
        'relativeHumidityPercent',
        'Relative humidity percent must be between 0 and 100.',
      ),
      { method: 'POST', originalUrl: '/x' } as never,
      res as never,
      () => undefined,
    );
    expect(status).toBe(400);
    expect(body).toEqual({
      error: {
        code: 'validation_failed',
        message: 'Relative humidity percent must be between 0 and 100.',
        fields: { relativeHumidityPercent: 'Relative humidity percent must be between 0 and 100.' },
      },
    });
  });
});
