import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import {
  AuditEntry,
  Finding,
  MemberDecision,
  Membership,
  Photo,
  ReCheck,
  Survey,
  Treatment,
  User,
  Vehicle,
  VehicleAccess,
  Workshop,
} from '@/server/models';
import { DEMO_ACCOUNTS, seedDemoIfEmpty } from '@/server/seeders/demo';
import { verifyPassword } from '@/server/services/passwords';
import { readSettings } from '@/server/services/workshops';
import { createStorage, type StorageAdapter } from '@/server/storage';
import { getBodyPlan, getZone, polygonCentroid } from '@/shared/body-plans';
import { treatmentData } from '@/shared/schemas/treatment';
import { localDate, recheckDueDates, zoneStateItems } from '@/shared/treatments';
import { assessMember, classForChosen, estimateRepair } from '@/shared/wood';
import { createTestDatabase, type TestDatabase } from '../e2e/support/test-db';
import { buildTestApp, type TestApp } from './support/test-app';

// The seed runs only on a database without workshops, so this file has databases of its own.
let db: TestDatabase;
let storageDir: string;
let storage: StorageAdapter;
let t: TestApp | null = null;

beforeAll(async () => {
  db = await createTestDatabase('seed');
  storageDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-seed-'));
  storage = createStorage({ driver: 'local', dir: storageDir });
});
afterAll(async () => {
  await t?.close();
  await db.drop();
});

const storedFiles = () =>
  fs.existsSync(path.join(storageDir, 'photos'))
    ? fs
        .readdirSync(path.join(storageDir, 'photos'), { recursive: true, withFileTypes: true })
        .filter((e) => e.isFile())
    : [];

// Drawing the demo photos takes seconds; a loaded CI machine needs more than the default timeout.
const SEED_TIMEOUT = 120_000;

describe('seedDemoIfEmpty', () => {
  it(
    'rolls everything back, stored photos included, when a step fails',
    async () => {
      let puts = 0;
      const flaky: StorageAdapter = {
        put: async (key, body, type) => {
          if (++puts === 4) throw new Error('storage unavailable');
          await storage.put(key, body, type);
        },
        get: (key) => storage.get(key),
        delete: (key) => storage.delete(key),
      };
      await expect(seedDemoIfEmpty(db.sequelize, db.config, { storage: flaky })).rejects.toThrow(
        'storage unavailable',
      );
      expect(puts).toBe(4);
      expect(await Workshop.count()).toBe(0);
      expect(await User.count()).toBe(0);
      expect(await Photo.count()).toBe(0);
      expect(storedFiles()).toEqual([]);
    },
    SEED_TIMEOUT,
  );

  it(
    'seeds the invented demo workshop once',
    async () => {
      expect(await seedDemoIfEmpty(db.sequelize, db.config, { storage })).toEqual({ seeded: true });

      const [workshop] = await Workshop.findAll();
      expect(await Workshop.count()).toBe(1);
      const members = await Membership.findAll({ include: [{ model: User, as: 'user' }] });
      expect(members.map((m) => [m.user!.email, m.role]).sort()).toEqual(
        DEMO_ACCOUNTS.map((a) => [a.email, a.role]).sort(),
      );
      for (const a of DEMO_ACCOUNTS) {
        expect(a.email).toMatch(/@example\.test$/);
        expect(a.password.length).toBeGreaterThanOrEqual(8);
        const user = await User.findOne({ where: { email: a.email } });
        expect(user!.name).toBe(a.name);
        expect(await verifyPassword(a.password, user!.passwordHash)).toBe(true);
      }

      const vehicles = await Vehicle.findAll();
      expect(vehicles).toHaveLength(3);
      expect(new Set(vehicles.map((v) => v.bodyPlanKey)).size).toBe(3);
      for (const v of vehicles) {
        expect(v.workshopId).toBe(workshop.id);
        expect(v.year).toBeGreaterThanOrEqual(1920);
        expect(v.year).toBeLessThan(1960);
        expect(getBodyPlan(v.bodyPlanKey)).toBeDefined();
      }
      const client = members.find((m) => m.role === 'client')!;
      expect(await VehicleAccess.count({ where: { userId: client.userId } })).toBe(1);

      const surveys = await Survey.findAll();
      expect(surveys).toHaveLength(3);
      for (const s of surveys) {
        expect(s.purpose).toBe('baseline');
        expect(s.airTempC).not.toBeNull();
        expect(s.relativeHumidity).not.toBeNull();
        expect(s.notAccessibleZones.length).toBeGreaterThan(0);
        const plan = getBodyPlan(vehicles.find((v) => v.id === s.vehicleId)!.bodyPlanKey)!;
        for (const z of s.notAccessibleZones) expect(getZone(plan, z)).toBeDefined();
      }

      const findings = await Finding.findAll();
      expect(findings.length).toBeGreaterThanOrEqual(13);
      expect(findings.length).toBeLessThanOrEqual(20);
      expect(new Set(findings.map((f) => f.severity))).toEqual(new Set([0, 1, 2, 3, 4]));
      expect(new Set(findings.map((f) => f.decayType))).toEqual(
        new Set(['none', 'brown-rot', 'white-rot', 'soft-rot', 'unknown']),
      );
      const insects = findings.filter((f) => f.insectEvidence.length > 0);
      expect(insects.length).toBeGreaterThanOrEqual(2);
      for (const f of insects.filter((i) =>
        i.insectEvidence.some((e) => e.startsWith('exit-holes')),
      ))
        expect(f.holeDiameterMm).toBeGreaterThan(0);
      expect(findings.every((f) => f.moisture !== null)).toBe(true);
      expect(new Set(findings.map((f) => f.pickTest))).toEqual(
        new Set(['long-splinter', 'brash-break']),
      );
      expect(findings.some((f) => f.decayDepthMm.bottom > 0)).toBe(true);
      for (const f of findings) {
        const plan = getBodyPlan(vehicles.find((v) => v.id === f.vehicleId)!.bodyPlanKey)!;
        expect(getZone(plan, f.zoneKey)).toBeDefined();
        // Each pin sits at the centroid of its zone's shape in the view it names.
        const shape = plan.views
          .find((v) => v.key === f.pin!.view)!
          .shapes.find((s) => s.zone === f.zoneKey)!;
        const [cx, cy] = polygonCentroid(shape.points as [number, number][]);
        expect(f.pin!.x).toBeCloseTo(cx, 0);
        expect(f.pin!.y).toBeCloseTo(cy, 0);
      }
      expect(new Set(findings.map((f) => f.zoneKey)).size).toBeGreaterThanOrEqual(12);

      const photos = await Photo.findAll();
      expect(photos.length).toBeGreaterThanOrEqual(3);
      for (const p of photos) {
        for (const key of [p.thumbKey, p.displayKey]) {
          const meta = await sharp((await storage.get(key))!).metadata();
          expect(meta.format).toBe('jpeg');
          expect(meta.exif).toBeUndefined();
        }
      }
      expect(storedFiles()).toHaveLength(photos.length * 2);
      expect(await AuditEntry.count({ where: { workshopId: workshop.id } })).toBeGreaterThan(0);
    },
    SEED_TIMEOUT,
  );

  it('gives the demo tourer decisions as the decisions service computes them', async () => {
    const vehicle = (await Vehicle.findOne({ where: { make: 'Aldermoor' } }))!;
    const plan = getBodyPlan(vehicle.bodyPlanKey)!;
    const workshop = (await Workshop.findByPk(vehicle.workshopId))!;
    const settings = readSettings(workshop.settings);
    const findings = await Finding.findAll({ where: { vehicleId: vehicle.id } });
    const decisions = await MemberDecision.findAll({ where: { vehicleId: vehicle.id } });
    const of = (cls: string) => decisions.filter((d) => d.decisionClass === cls);
    expect(of('structural-must-fix').length).toBeGreaterThanOrEqual(3);
    expect(of('structural-must-fix').map((d) => d.chosenOption)).toEqual(
      expect.arrayContaining(['splice', 'replace-member']),
    );
    expect(of('cosmetic').length).toBeGreaterThanOrEqual(2);
    expect(of('monitor').length).toBeGreaterThanOrEqual(1);
    // The browser test of the decision screen decides the left sill itself.
    expect(decisions.map((d) => d.zoneKey)).not.toContain('sill-left');

    for (const d of decisions) {
      const zone = getZone(plan, d.zoneKey)!;
      const mine = findings.filter((f) => f.zoneKey === d.zoneKey);
      expect(mine.length).toBeGreaterThan(0);
      const activeAgent = mine.some((f) => f.activity === 'active');
      const { verdict } = assessMember(
        d.inputs,
        {
          structuralClass: zone.structuralClass,
          worstSeverity: Math.max(...mine.map((f) => f.severity)),
          activeAgent,
          assemblyMembersNeedingReplacement: 0,
        },
        settings.wood,
      );
      expect(d.recommendedOption).toBe(verdict.option);
      expect(d.recommendationReasons).toEqual(verdict.reasons);
      const estimate = estimateRepair({
        option: d.chosenOption,
        ...d.inputs,
        settings: settings.wood,
        labourRatePerHour: settings.labourRatePerHour,
      });
      expect(d.estimatedHours).toBeCloseTo(estimate.hours, 2);
      expect(d.labourCost).toBeCloseTo(estimate.labourCost, 2);
      expect(d.materialCost).toBeCloseTo(estimate.materialCost, 2);
      expect(d.totalCost).toBeCloseTo(estimate.totalCost, 2);
      expect(d.materials).toEqual(estimate.cutList);
      expect(d.decisionClass).toBe(
        d.chosenOption === verdict.option
          ? verdict.decisionClass
          : classForChosen(d.chosenOption, zone, activeAgent),
      );
      expect(d.overrideReason.length > 0).toBe(d.chosenOption !== d.recommendedOption);
    }
  });

  it('treats the zones with active insects, with planned re-checks dated from today', async () => {
    const vehicle = (await Vehicle.findOne({ where: { make: 'Aldermoor' } }))!;
    const plan = getBodyPlan(vehicle.bodyPlanKey)!;
    const settings = readSettings((await Workshop.findByPk(vehicle.workshopId))!.settings);
    const findings = await Finding.findAll({ where: { vehicleId: vehicle.id } });
    const [treatment, ...others] = await Treatment.findAll({ where: { vehicleId: vehicle.id } });
    expect(others).toHaveLength(0);
    const data = treatmentData.parse(treatment.data);
    const insectZones = findings
      .filter((f) => f.insectEvidence.length > 0 && f.activity === 'active')
      .map((f) => f.zoneKey);
    expect([...data.zoneKeys].sort()).toEqual([...new Set(insectZones)].sort());
    expect(data.registrationNumber).toMatch(/DEMO/);
    expect(data.ppe.length).toBeGreaterThan(0);

    const survey = (await Survey.findOne({ where: { vehicleId: vehicle.id } }))!;
    const now = Date.now();
    expect(treatment.appliedAt.getTime()).toBeGreaterThan(survey.createdAt.getTime());
    expect(treatment.appliedAt.getTime()).toBeLessThan(now);
    expect(now - treatment.appliedAt.getTime()).toBeLessThan(90 * 24 * 3600 * 1000);

    const rechecks = await ReCheck.findAll({
      where: { treatmentId: treatment.id },
      order: [['dueDate', 'ASC']],
    });
    expect(rechecks.map((r) => r.dueDate)).toEqual(
      recheckDueDates(data.appliedAt, data.targetAgent, data.method, settings.treatments),
    );
    const clean = rechecks.filter((r) => r.status === 'clean');
    expect(clean).toHaveLength(1);
    expect(clean[0].completedAt!.getTime()).toBeGreaterThan(treatment.appliedAt.getTime());
    expect(clean[0].completedAt!.getTime()).toBeLessThanOrEqual(now);
    expect(rechecks.filter((r) => r.status === 'pending')).toHaveLength(rechecks.length - 1);
    const today = localDate(new Date(), settings.treatments.timeZone);
    expect(rechecks.filter((r) => r.status === 'pending').every((r) => r.dueDate >= today)).toBe(
      true,
    );

    // The zone states the app computes: treated and watched, the untreated active ones still active.
    const states = zoneStateItems(
      {
        zoneKeys: plan.zones.map((z) => z.key),
        findings: findings.map((f) => ({
          zoneKey: f.zoneKey,
          date: survey.date,
          createdAt: f.createdAt.toISOString(),
          severity: f.severity,
          activity: f.activity,
          insectEvidence: f.insectEvidence,
        })),
        treatments: [{ appliedAt: data.appliedAt, zoneKeys: data.zoneKeys }],
        rechecks: rechecks.map((r) => ({
          zoneKeys: r.zoneKeys,
          dueDate: r.dueDate,
          status: r.status,
          completedAt: r.completedAt?.toISOString() ?? null,
        })),
      },
      settings.treatments.clearance,
      settings.treatments.timeZone,
    );
    for (const key of data.zoneKeys)
      expect(states.find((s) => s.zoneKey === key)).toMatchObject({
        state: 'treated-watching',
        flagged: false,
      });

    expect(survey.notAccessibleZones).toEqual(
      expect.arrayContaining(['heel-board', 'floor-board-3']),
    );
    expect(survey.notAccessibleNotes).toMatch(/fuel tank/);
  });

  it('does nothing the second time', async () => {
    const before = await Promise.all([
      Workshop.count(),
      User.count(),
      Vehicle.count(),
      Finding.count(),
      Photo.count(),
      MemberDecision.count(),
      Treatment.count(),
      ReCheck.count(),
    ]);
    expect(await seedDemoIfEmpty(db.sequelize, db.config, { storage })).toEqual({ seeded: false });
    expect(
      await Promise.all([
        Workshop.count(),
        User.count(),
        Vehicle.count(),
        Finding.count(),
        Photo.count(),
        MemberDecision.count(),
        Treatment.count(),
        ReCheck.count(),
      ]),
    ).toEqual(before);
    expect(storedFiles()).toHaveLength(before[4] * 2);
  });

  it('gives working sign-ins: the client sees the one shared vehicle and its photos', async () => {
    t = buildTestApp({ DB_NAME: db.name, STORAGE_DIR: storageDir });
    const signIn = async (role: string) => {
      const a = DEMO_ACCOUNTS.find((x) => x.role === role)!;
      const res = await request(t!.app)
        .post('/api/auth/sign-in')
        .send({ email: a.email, password: a.password })
        .expect(200);
      return {
        auth: { Authorization: `Bearer ${res.body.token}` },
        workshopId: res.body.memberships[0].workshopId as string,
      };
    };
    const inspector = await signIn('inspector');
    const all = await request(t.app)
      .get(`/api/workshops/${inspector.workshopId}/vehicles`)
      .set(inspector.auth)
      .expect(200);
    expect(all.body.items).toHaveLength(3);
    expect(
      all.body.items.reduce(
        (n: number, v: { summary: { findings: number } }) => n + v.summary.findings,
        0,
      ),
    ).toBe(await Finding.count());

    const client = await signIn('client');
    const mine = await request(t.app)
      .get(`/api/workshops/${client.workshopId}/vehicles`)
      .set(client.auth)
      .expect(200);
    expect(mine.body.items).toHaveLength(1);
    const findings = await request(t.app)
      .get(`/api/workshops/${client.workshopId}/vehicles/${mine.body.items[0].id}/findings`)
      .set(client.auth)
      .expect(200);
    const photo = findings.body.items.flatMap(
      (f: { photos: { thumbUrl: string }[] }) => f.photos,
    )[0];
    expect(photo).toBeDefined();
    const img = await request(t.app).get(photo.thumbUrl).set(client.auth).expect(200);
    expect(img.headers['content-type']).toBe('image/jpeg');
  });
});
