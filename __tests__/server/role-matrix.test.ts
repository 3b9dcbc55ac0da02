import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { signSessionToken } from '@/server/middleware/auth';
import { AuditEntry } from '@/server/models';
import type { ReportQueue } from '@/server/jobs/report-queue';
import type { StorageAdapter } from '@/server/storage';
import { can, type Action } from '@/shared/roles';
import {
  buildFinding,
  buildVehicle,
  createFinding,
  createMember,
  createSurvey,
  createUser,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
  TEST_PASSWORD,
  unique,
} from '../factories';
import { buildSaveDecision, createDecision } from '../factories/decisions';
import { createInvitation } from '../factories/invitations';
import { appStorage, createPhoto, jpeg } from '../factories/photos';
import { cloneReadyReport, generateReport } from '../factories/reports';
import { buildTreatment, createRecheck, createTreatment } from '../factories/treatments';
import { buildTestAppWithMail, type TestAppWithMail } from './support/test-app';

/**
 * Every route of the DEVELOPERS.md API table × every kind of caller. The expected answer follows
 * from shared/roles.ts: 401 without a session, 404 for someone outside the workshop, 403 for a
 * member whose role lacks the action, 404 for a client on a vehicle not shared with them, and the
 * route's success status otherwise. A new route is one row in ROUTES.
 */

type Member = Awaited<ReturnType<typeof createMember>>;
type Team = Awaited<ReturnType<typeof createWorkshopWithTeam>>;
type ActorName =
  | 'owner'
  | 'inspector'
  | 'applicator'
  | 'client'
  | 'client (not shared)'
  | 'non-member'
  | 'anonymous';
type Actor = { name: ActorName; member: Member | null };

/** Fresh records for one request, so a write in one case never changes what the next one sees. */
type Fixture = Awaited<ReturnType<typeof freshRecords>> & { actor: Actor };
type Req = {
  url: string;
  body?: Record<string, unknown>;
  photo?: boolean;
  pdf?: Buffer;
  /** Headers that replace the actor's own (sign-out must not withdraw the token other cases use). */
  auth?: Record<string, string>;
};

type Row = {
  /** Method and path exactly as in the DEVELOPERS.md table. */
  route: string;
  /** What the caller needs: an action from shared/roles.ts, or no workshop membership at all. */
  needs: Action | 'anyone' | 'signed-in';
  /** Hangs off one vehicle, so a client needs it shared with them. */
  vehicle?: boolean;
  ok: number;
  label?: string;
  build: (f: Fixture) => Promise<Req> | Req;
};

let t: TestAppWithMail;
let storage: StorageAdapter;
let team: Team;
let unsharedClient: Member;
let outsider: Member;

beforeAll(async () => {
  t = await buildTestAppWithMail();
  storage = appStorage(t.app);
  team = await createWorkshopWithTeam(t.config);
  unsharedClient = await createMember(t.config, team.workshop, 'client');
  outsider = (await createWorkshopWithTeam(t.config)).owner;
});
afterAll(() => t.close());

const reportQueue = () => t.app.locals.reportQueue as ReportQueue;

let generated: Promise<{ id: string }> | null = null;
/**
 * A ready report on the fixture's vehicle: one is generated through the API and its job, then
 * each case gets a row pointing at its stored PDF (rendering per case would add a minute).
 */
async function readyReport(f: Fixture) {
  generated ??= generateReport(t.app, team.owner, f.vehicle.id, 'condition');
  return cloneReadyReport((await generated).id, f.vehicle.id);
}

/** A link to a ready report of the fixture's vehicle; the answer carries the token. */
async function shareOf(f: Fixture) {
  const report = await readyReport(f);
  const res = await request(t.app)
    .post(`${f.w}/reports/${report.id}/shares`)
    .set(team.owner.auth)
    .send({});
  return { report, share: res.body as { id: string; token: string } };
}

async function recheckOn(vehicle: Awaited<ReturnType<typeof createVehicle>>) {
  return createRecheck(await createTreatment(vehicle));
}

async function freshRecords() {
  const vehicle = await createVehicle(team.workshop);
  await grantAccess(vehicle, team.client.user.id);
  const survey = await createSurvey(vehicle);
  const finding = await createFinding(survey);
  const photo = await createPhoto(finding, storage);
  return { vehicle, survey, finding, photo, w: `/api/workshops/${team.workshop.id}` };
}

const ROUTES: Row[] = [
  // Auth and invitations (signed-out side)
  {
    route: 'POST /api/auth/sign-up',
    needs: 'anyone',
    ok: 201,
    build: () => ({
      url: '/api/auth/sign-up',
      body: {
        workshopName: unique('Shop'),
        name: 'New Owner',
        email: `${unique('su')}@example.test`,
        password: TEST_PASSWORD,
      },
    }),
  },
  {
    route: 'POST /api/auth/sign-in',
    needs: 'anyone',
    ok: 200,
    build: async (f) => ({
      url: '/api/auth/sign-in',
      body: {
        email: f.actor.member?.user.email ?? (await createUser()).email,
        password: TEST_PASSWORD,
      },
    }),
  },
  // Idempotent by design: signing out without a session still clears cookies. Each signed-in
  // actor signs out a second session of their own: the first one is withdrawn for other cases.
  {
    route: 'POST /api/auth/sign-out',
    needs: 'anyone',
    ok: 204,
    build: (f) => ({
      url: '/api/auth/sign-out',
      auth: f.actor.member
        ? { Authorization: `Bearer ${signSessionToken(t.config, f.actor.member.user.id)}` }
        : undefined,
    }),
  },
  {
    route: 'GET /api/auth/session',
    needs: 'signed-in',
    ok: 200,
    build: () => ({ url: '/api/auth/session' }),
  },
  {
    route: 'PATCH /api/auth/preferences',
    needs: 'signed-in',
    ok: 200,
    build: () => ({ url: '/api/auth/preferences', body: { remindersEnabled: true } }),
  },
  {
    route: 'GET /api/invitations/:token',
    needs: 'anyone',
    ok: 200,
    build: async () => ({
      url: `/api/invitations/${(await createInvitation(team.workshop)).token}`,
    }),
  },
  {
    route: 'POST /api/invitations/:token/accept',
    needs: 'anyone',
    ok: 200,
    build: async () => ({
      url: `/api/invitations/${(await createInvitation(team.workshop)).token}/accept`,
      body: { name: 'Invitee', password: TEST_PASSWORD },
    }),
  },
  {
    route: 'GET /api/dev/outbox',
    needs: 'anyone',
    ok: 200,
    build: () => ({ url: '/api/dev/outbox' }),
  },

  // Workshop, members, invitations, audit
  {
    route: 'GET /api/workshops/:wid',
    needs: 'workshop.read',
    ok: 200,
    build: (f) => ({ url: f.w }),
  },
  {
    route: 'PATCH /api/workshops/:wid',
    needs: 'workshop.update',
    ok: 200,
    build: (f) => ({ url: f.w, body: { settings: { region: unique('Region') } } }),
  },
  {
    route: 'GET /api/workshops/:wid/members',
    needs: 'members.read',
    ok: 200,
    build: (f) => ({ url: `${f.w}/members` }),
  },
  {
    route: 'PATCH /api/workshops/:wid/members/:mid',
    needs: 'members.manage',
    ok: 200,
    build: async (f) => ({
      url: `${f.w}/members/${(await createMember(t.config, team.workshop, 'inspector')).membership.id}`,
      body: { role: 'applicator' },
    }),
  },
  {
    route: 'DELETE /api/workshops/:wid/members/:mid',
    needs: 'members.manage',
    ok: 204,
    build: async (f) => ({
      url: `${f.w}/members/${(await createMember(t.config, team.workshop, 'applicator')).membership.id}`,
    }),
  },
  {
    route: 'GET /api/workshops/:wid/invitations',
    needs: 'members.manage',
    ok: 200,
    build: (f) => ({ url: `${f.w}/invitations` }),
  },
  {
    route: 'POST /api/workshops/:wid/invitations',
    needs: 'members.manage',
    ok: 201,
    build: (f) => ({
      url: `${f.w}/invitations`,
      body: { email: `${unique('inv')}@example.test`, role: 'inspector' },
    }),
  },
  {
    route: 'DELETE /api/workshops/:wid/invitations/:iid',
    needs: 'members.manage',
    ok: 204,
    build: async (f) => ({
      url: `${f.w}/invitations/${(await createInvitation(team.workshop)).invitation.id}`,
    }),
  },
  {
    route: 'GET /api/workshops/:wid/audit',
    needs: 'audit.read',
    ok: 200,
    build: (f) => ({ url: `${f.w}/audit` }),
  },

  // Vehicles and sharing
  {
    route: 'GET /api/workshops/:wid/vehicles',
    needs: 'vehicles.read',
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles` }),
  },
  {
    route: 'GET /api/workshops/:wid/vehicles',
    label: '?deleted=only',
    needs: 'vehicles.delete',
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles?deleted=only` }),
  },
  {
    route: 'POST /api/workshops/:wid/vehicles',
    needs: 'vehicles.write',
    ok: 201,
    build: (f) => ({ url: `${f.w}/vehicles`, body: buildVehicle({ make: unique('Make') }) }),
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}` }),
  },
  {
    route: 'PATCH /api/workshops/:wid/vehicles/:vid',
    needs: 'vehicles.write',
    vehicle: true,
    ok: 200,
    build: (f) => ({
      url: `${f.w}/vehicles/${f.vehicle.id}`,
      body: { version: 0, notes: 'Edited' },
    }),
  },
  {
    route: 'DELETE /api/workshops/:wid/vehicles/:vid',
    needs: 'vehicles.delete',
    vehicle: true,
    ok: 204,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}` }),
  },
  {
    route: 'POST /api/workshops/:wid/vehicles/:vid/restore',
    needs: 'vehicles.delete',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await f.vehicle.destroy();
      return { url: `${f.w}/vehicles/${f.vehicle.id}/restore` };
    },
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/access',
    needs: 'vehicles.share',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/access` }),
  },
  {
    route: 'POST /api/workshops/:wid/vehicles/:vid/access',
    needs: 'vehicles.share',
    vehicle: true,
    ok: 201,
    build: async (f) => ({
      url: `${f.w}/vehicles/${f.vehicle.id}/access`,
      body: { userId: (await createMember(t.config, team.workshop, 'client')).user.id },
    }),
  },
  {
    route: 'DELETE /api/workshops/:wid/vehicles/:vid/access/:userId',
    needs: 'vehicles.share',
    vehicle: true,
    ok: 204,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/access/${team.client.user.id}` }),
  },

  // Surveys
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/surveys',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/surveys` }),
  },
  {
    route: 'POST /api/workshops/:wid/vehicles/:vid/surveys',
    needs: 'surveys.write',
    vehicle: true,
    ok: 201,
    build: (f) => ({
      url: `${f.w}/vehicles/${f.vehicle.id}/surveys`,
      body: { date: '2026-11-30', purpose: 'progress' },
    }),
  },
  {
    route: 'PATCH /api/workshops/:wid/surveys/:sid',
    needs: 'surveys.write',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/surveys/${f.survey.id}`, body: { notes: 'Edited' } }),
  },

  // Findings
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/findings',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/findings` }),
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/findings',
    label: '?deleted=include',
    needs: 'findings.write',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/findings?deleted=include` }),
  },
  {
    route: 'POST /api/workshops/:wid/surveys/:sid/findings',
    needs: 'findings.write',
    vehicle: true,
    ok: 201,
    build: (f) => ({
      url: `${f.w}/surveys/${f.survey.id}/findings`,
      body: buildFinding({ zoneKey: 'sill-right' }),
    }),
  },
  {
    route: 'GET /api/workshops/:wid/findings/:fid',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/findings/${f.finding.id}` }),
  },
  {
    route: 'PATCH /api/workshops/:wid/findings/:fid',
    needs: 'findings.write',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/findings/${f.finding.id}`, body: { version: 0, severity: 3 } }),
  },
  {
    route: 'DELETE /api/workshops/:wid/findings/:fid',
    needs: 'findings.write',
    vehicle: true,
    ok: 204,
    build: (f) => ({ url: `${f.w}/findings/${f.finding.id}` }),
  },
  {
    route: 'POST /api/workshops/:wid/findings/:fid/restore',
    needs: 'findings.write',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await f.finding.destroy();
      return { url: `${f.w}/findings/${f.finding.id}/restore` };
    },
  },

  // Photos
  {
    route: 'POST /api/workshops/:wid/findings/:fid/photos',
    needs: 'photos.write',
    vehicle: true,
    ok: 201,
    build: (f) => ({ url: `${f.w}/findings/${f.finding.id}/photos`, photo: true }),
  },
  {
    route: 'GET /api/workshops/:wid/photos/:pid/thumb',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/photos/${f.photo.id}/thumb` }),
  },
  {
    route: 'GET /api/workshops/:wid/photos/:pid/display',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/photos/${f.photo.id}/display` }),
  },
  {
    route: 'DELETE /api/workshops/:wid/photos/:pid',
    needs: 'photos.write',
    vehicle: true,
    ok: 204,
    build: (f) => ({ url: `${f.w}/photos/${f.photo.id}` }),
  },

  // Member decisions
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/decisions',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await createDecision(f.vehicle);
      return { url: `${f.w}/vehicles/${f.vehicle.id}/decisions` };
    },
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/repair-plan',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await createDecision(f.vehicle);
      return { url: `${f.w}/vehicles/${f.vehicle.id}/repair-plan` };
    },
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await createDecision(f.vehicle, { zoneKey: 'sill-right' });
      return { url: `${f.w}/vehicles/${f.vehicle.id}/decisions/sill-right` };
    },
  },
  {
    route: 'PUT /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey',
    needs: 'decisions.write',
    vehicle: true,
    ok: 201,
    build: (f) => ({
      url: `${f.w}/vehicles/${f.vehicle.id}/decisions/sill-right`,
      // The reason is only kept if the server's recommendation differs from "keep".
      body: buildSaveDecision({ overrideReason: 'Role matrix' }),
    }),
  },
  {
    route: 'PUT /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey',
    label: '(update)',
    needs: 'decisions.write',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await createDecision(f.vehicle, { zoneKey: 'sill-right' });
      return {
        url: `${f.w}/vehicles/${f.vehicle.id}/decisions/sill-right`,
        body: buildSaveDecision({ version: 0, notes: 'Edited', overrideReason: 'Role matrix' }),
      };
    },
  },
  {
    route: 'DELETE /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey',
    needs: 'decisions.write',
    vehicle: true,
    ok: 204,
    build: async (f) => {
      await createDecision(f.vehicle, { zoneKey: 'sill-right' });
      return { url: `${f.w}/vehicles/${f.vehicle.id}/decisions/sill-right` };
    },
  },
  // Treatments and re-checks
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/treatments',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await createTreatment(f.vehicle);
      return { url: `${f.w}/vehicles/${f.vehicle.id}/treatments` };
    },
  },
  {
    route: 'POST /api/workshops/:wid/vehicles/:vid/treatments',
    needs: 'treatments.write',
    vehicle: true,
    ok: 201,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/treatments`, body: buildTreatment() }),
  },
  {
    route: 'GET /api/workshops/:wid/treatments/:tid',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => ({ url: `${f.w}/treatments/${(await createTreatment(f.vehicle)).id}` }),
  },
  {
    route: 'POST /api/workshops/:wid/treatments/:tid/corrections',
    needs: 'treatments.write',
    vehicle: true,
    ok: 200,
    build: async (f) => ({
      url: `${f.w}/treatments/${(await createTreatment(f.vehicle)).id}/corrections`,
      body: { ...buildTreatment({ dilution: '1 part to 5' }), version: 0, reason: 'Misread' },
    }),
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/rechecks',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => {
      await createTreatment(f.vehicle, { dueDates: ['2026-12-09'] });
      return { url: `${f.w}/vehicles/${f.vehicle.id}/rechecks` };
    },
  },
  // Across vehicles: a client sees only shared ones, so an unshared client gets a list too.
  {
    route: 'GET /api/workshops/:wid/rechecks/due',
    needs: 'vehicles.read',
    ok: 200,
    build: (f) => ({ url: `${f.w}/rechecks/due?days=14` }),
  },
  {
    route: 'POST /api/workshops/:wid/rechecks/:rid/result',
    needs: 'rechecks.write',
    vehicle: true,
    ok: 200,
    build: async (f) => ({
      url: `${f.w}/rechecks/${(await recheckOn(f.vehicle)).id}/result`,
      body: { version: 0, result: 'clean', frassCleaned: true },
    }),
  },
  {
    route: 'POST /api/workshops/:wid/rechecks/:rid/move',
    needs: 'rechecks.write',
    vehicle: true,
    ok: 200,
    build: async (f) => ({
      url: `${f.w}/rechecks/${(await recheckOn(f.vehicle)).id}/move`,
      body: { version: 0, dueDate: '2026-12-20', reason: 'Vehicle away' },
    }),
  },
  {
    route: 'POST /api/workshops/:wid/rechecks/:rid/assign',
    needs: 'rechecks.write',
    vehicle: true,
    ok: 200,
    build: async (f) => ({
      url: `${f.w}/rechecks/${(await recheckOn(f.vehicle)).id}/assign`,
      body: { version: 0, assigneeId: team.applicator.user.id },
    }),
  },
  {
    route: 'GET /api/workshops/:wid/rechecks/:rid/calendar.ics',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => ({
      url: `${f.w}/rechecks/${(await recheckOn(f.vehicle)).id}/calendar.ics`,
    }),
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/zone-states',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/zone-states` }),
  },
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/timeline',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/timeline?kinds=finding,treatment` }),
  },
  // Reports, links and verification
  {
    route: 'GET /api/workshops/:wid/vehicles/:vid/reports',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: (f) => ({ url: `${f.w}/vehicles/${f.vehicle.id}/reports` }),
  },
  {
    route: 'POST /api/workshops/:wid/vehicles/:vid/reports',
    needs: 'reports.write',
    vehicle: true,
    ok: 202,
    build: async (f) => {
      // Nothing in flight, so the workshop's limit on concurrent generations is never what answers.
      await reportQueue().idle();
      return { url: `${f.w}/vehicles/${f.vehicle.id}/reports`, body: { kind: 'condition' } };
    },
  },
  {
    route: 'GET /api/workshops/:wid/reports/:rid',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => ({ url: `${f.w}/reports/${(await readyReport(f)).id}` }),
  },
  {
    route: 'GET /api/workshops/:wid/reports/:rid/pdf',
    needs: 'vehicles.read',
    vehicle: true,
    ok: 200,
    build: async (f) => ({ url: `${f.w}/reports/${(await readyReport(f)).id}/pdf` }),
  },
  {
    route: 'GET /api/workshops/:wid/reports/:rid/shares',
    needs: 'reports.share',
    vehicle: true,
    ok: 200,
    build: async (f) => ({ url: `${f.w}/reports/${(await readyReport(f)).id}/shares` }),
  },
  {
    route: 'POST /api/workshops/:wid/reports/:rid/shares',
    needs: 'reports.share',
    vehicle: true,
    ok: 201,
    build: async (f) => ({
      url: `${f.w}/reports/${(await readyReport(f)).id}/shares`,
      body: { expiresInDays: 3 },
    }),
  },
  {
    route: 'POST /api/workshops/:wid/shares/:sid/revoke',
    needs: 'reports.share',
    vehicle: true,
    ok: 200,
    build: async (f) => ({ url: `${f.w}/shares/${(await shareOf(f)).share.id}/revoke` }),
  },
  {
    route: 'GET /api/public/shares/:token',
    needs: 'anyone',
    ok: 200,
    build: async (f) => ({ url: `/api/public/shares/${(await shareOf(f)).share.token}` }),
  },
  {
    route: 'GET /api/public/shares/:token/pdf',
    needs: 'anyone',
    ok: 200,
    build: async (f) => ({ url: `/api/public/shares/${(await shareOf(f)).share.token}/pdf` }),
  },
  {
    route: 'GET /api/public/verify/:shortId',
    needs: 'anyone',
    ok: 200,
    build: async (f) => ({ url: `/api/public/verify/${(await readyReport(f)).shortId}` }),
  },
  {
    route: 'POST /api/public/verify',
    needs: 'anyone',
    ok: 200,
    build: () => ({ url: '/api/public/verify', pdf: Buffer.from('%PDF-1.7\n%%EOF\n') }),
  },
];

const ACTORS: ActorName[] = [
  'owner',
  'inspector',
  'applicator',
  'client',
  'client (not shared)',
  'non-member',
  'anonymous',
];

function actor(name: ActorName): Actor {
  const member =
    name === 'anonymous'
      ? null
      : name === 'non-member'
        ? outsider
        : name === 'client (not shared)'
          ? unsharedClient
          : team[name];
  return { name, member };
}

/** The designed answer, from shared/roles.ts. */
function expected(row: Row, a: Actor): number {
  if (row.needs === 'anyone') return row.ok;
  if (!a.member) return 401;
  if (row.needs === 'signed-in') return row.ok;
  if (a.name === 'non-member') return 404;
  if (!can(a.member.membership.role, row.needs)) return 403;
  if (row.vehicle && a.name === 'client (not shared)') return 404;
  return row.ok;
}

const CODES: Record<number, string> = {
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
};

describe.each(ROUTES.map((r) => [`${r.route}${r.label ? ` ${r.label}` : ''}`, r] as const))(
  '%s',
  (_name, row) => {
    it.each(ACTORS)('as %s', async (name) => {
      const a = actor(name);
      const req = await row.build({ ...(await freshRecords()), actor: a });
      const method = row.route.split(' ')[0].toLowerCase() as
        'get' | 'post' | 'put' | 'patch' | 'delete';
      let call = request(t.app)[method](req.url);
      if (req.auth) call = call.set(req.auth);
      else if (a.member) call = call.set(a.member.auth);
      if (req.photo) call = call.attach('photos', await jpeg(), 'sill.jpg');
      else if (req.pdf) call = call.attach('pdf', req.pdf, 'report.pdf');
      else if (req.body) call = call.send(req.body);
      const auditBefore = await AuditEntry.count({ where: { workshopId: team.workshop.id } });

      const res = await call;
      const want = expected(row, a);
      expect({ status: res.status, error: res.body?.error?.code }).toEqual({
        status: want,
        error: CODES[want] ?? undefined,
      });
      // A refused request writes nothing.
      if (want >= 400)
        expect(await AuditEntry.count({ where: { workshopId: team.workshop.id } })).toBe(
          auditBefore,
        );
    });
  },
);

/** The routes of the DEVELOPERS.md API table, expanded from its shorthand ("GET/POST `…/x`"). */
function documentedRoutes(): string[] {
  const doc = fs.readFileSync(path.join(__dirname, '..', '..', 'DEVELOPERS.md'), 'utf8');
  const routes: string[] = [];
  for (const line of doc.split('\n')) {
    if (!line.startsWith('| ') || !line.includes('`/api')) continue;
    const cell = line.split('|')[1];
    let methods: string[] = [];
    let previous = '';
    for (const m of cell.matchAll(/(?:([A-Z]+(?:\/[A-Z]+)*)\s+)?`([^`]+)`/g)) {
      if (m[1]) methods = m[1].split('/');
      let p = m[2];
      if (p.startsWith('…')) {
        const rel = p.slice(1).split('/').filter(Boolean);
        const prev = previous.split('/');
        const last = prev[prev.length - 1];
        // "…/access/:userId" after ".../access" and "…/display" after ".../thumb" replace the last segment;
        // "…/restore" after ".../:vid" and "…/:iid" after ".../invitations" extend the path.
        const extend = rel[0] !== last && (last.startsWith(':') || rel[0].startsWith(':'));
        p = [...(extend ? prev : prev.slice(0, -1)), ...rel].join('/');
      }
      previous = p;
      for (const method of methods) routes.push(`${method} ${p}`);
    }
  }
  return routes;
}

const shape = (route: string) => route.replace(/:\w+/g, ':param');

it('covers every route of the DEVELOPERS.md API table, and no route the table lacks', () => {
  const documented = documentedRoutes().map(shape);
  expect(documented.length).toBeGreaterThan(30);
  expect([...new Set(ROUTES.map((r) => shape(r.route)))].sort()).toEqual(
    [...new Set(documented)].sort(),
  );
});

it('checks a client on an unshared vehicle separately from the roles table (404, not 403)', () => {
  // Guards the table above against a roles change that would make the not-shared case vacuous.
  expect(can('client', 'vehicles.read')).toBe(true);
  expect(
    ROUTES.filter((r) => r.vehicle && r.needs === 'vehicles.read').length,
  ).toBeGreaterThanOrEqual(6);
});
