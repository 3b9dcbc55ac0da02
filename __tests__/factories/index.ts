import crypto from 'node:crypto';
import bcrypt from 'bcryptjs';
import type { Role } from '@/shared/roles';
import type { Config } from '@/server/config';
import { signSessionToken } from '@/server/middleware/auth';
import type { MemberContext } from '@/server/middleware/workshop';
import {
  Finding,
  Membership,
  Survey,
  User,
  Vehicle,
  VehicleAccess,
  Workshop,
} from '@/server/models';
import { hashPasswordInput } from '@/server/services/passwords';

/** Unique per call so tests never collide on shared rows. */
export const unique = (prefix = 'x') => `${prefix}-${crypto.randomBytes(5).toString('hex')}`;

export const TEST_PASSWORD = 'correct-horse-battery';
let cachedHash: string | null = null;
async function testPasswordHash() {
  cachedHash ??= await bcrypt.hash(hashPasswordInput(TEST_PASSWORD), 10);
  return cachedHash;
}

export async function createWorkshop(partial: Partial<{ name: string }> = {}) {
  return Workshop.create({ name: partial.name ?? unique('Workshop') });
}

export async function createUser(partial: Partial<{ name: string; email: string }> = {}) {
  return User.create({
    name: partial.name ?? unique('Person'),
    email: (partial.email ?? `${unique('user')}@example.test`).toLowerCase(),
    passwordHash: await testPasswordHash(),
  });
}

/** A user with a role in a workshop, and a Bearer header for supertest. */
export async function createMember(
  config: Config,
  workshop: Workshop,
  role: Role,
  partial: Partial<{ name: string; email: string }> = {},
) {
  const user = await createUser(partial);
  const membership = await Membership.create({ workshopId: workshop.id, userId: user.id, role });
  const token = signSessionToken(config, user.id);
  return { user, membership, token, auth: { Authorization: `Bearer ${token}` } };
}

/** The context the workshop middleware gives a request by this membership. */
export function contextOf(
  m: Pick<Membership, 'id' | 'workshopId' | 'userId' | 'role'>,
): MemberContext {
  return { membershipId: m.id, workshopId: m.workshopId, userId: m.userId, role: m.role };
}

/** A workshop with one member of every role. */
export async function createWorkshopWithTeam(config: Config) {
  const workshop = await createWorkshop();
  const owner = await createMember(config, workshop, 'owner');
  const inspector = await createMember(config, workshop, 'inspector');
  const applicator = await createMember(config, workshop, 'applicator');
  const client = await createMember(config, workshop, 'client');
  return { workshop, owner, inspector, applicator, client };
}

export function buildVehicle(partial: Partial<Vehicle['_creationAttributes']> = {}) {
  return {
    year: 1934,
    make: 'Harrowgate',
    model: 'Eleven',
    bodyPlanKey: 'closed-saloon-4d',
    ...partial,
  };
}

export async function createVehicle(
  workshop: Workshop,
  partial: Partial<Vehicle['_creationAttributes']> = {},
) {
  return Vehicle.create({
    workshopId: workshop.id,
    ...buildVehicle(partial),
  } as Vehicle['_creationAttributes']);
}

export async function grantAccess(vehicle: Vehicle, userId: string) {
  return VehicleAccess.create({
    workshopId: vehicle.workshopId,
    vehicleId: vehicle.id,
    userId,
    grantedById: null,
  });
}

export async function createSurvey(
  vehicle: Vehicle,
  partial: Partial<Survey['_creationAttributes']> = {},
) {
  return Survey.create({
    workshopId: vehicle.workshopId,
    vehicleId: vehicle.id,
    inspectorId: null,
    date: '2026-11-20',
    purpose: 'baseline',
    airTempC: 18,
    relativeHumidity: 60,
    ...partial,
  });
}

export function buildFinding(partial: Record<string, unknown> = {}) {
  return {
    zoneKey: 'sill-left',
    severity: 2,
    decayType: 'brown-rot',
    insectEvidence: [],
    activity: 'unknown',
    pickTest: 'not-done',
    ...partial,
  };
}

export async function createFinding(
  survey: Survey,
  partial: Partial<Finding['_creationAttributes']> = {},
) {
  return Finding.create({
    workshopId: survey.workshopId,
    vehicleId: survey.vehicleId,
    surveyId: survey.id,
    authorId: null,
    zoneKey: 'sill-left',
    severity: 2,
    decayType: 'brown-rot',
    holeDiameterMm: null,
    activity: 'unknown',
    moisture: null,
    pickTest: 'not-done',
    decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0 },
    affectedLengthMm: null,
    atJointOrFitting: false,
    pin: null,
    ...partial,
  });
}
