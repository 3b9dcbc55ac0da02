import { UniqueConstraintError, type Transaction } from 'sequelize';
import { ERROR_CODES } from '@/shared/schemas/common';
import type {
  SessionResponse,
  SignInRequest,
  SignUpRequest,
  UpdatePreferencesRequest,
} from '@/shared/schemas/auth';
import { workshopSettings } from '@/shared/schemas/workshop';
import { AppError, unauthenticated } from '../errors';
import { Membership, User, Workshop } from '../models';
import { audit } from './audit';
import { burnPasswordCheck, hashPassword, verifyPassword } from './passwords';

/** What a session answer holds besides the CSRF token and the bearer token. */
export type SessionBody = Omit<SessionResponse, 'csrfToken' | 'token'>;

const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

export const emailTaken = () =>
  new AppError(
    409,
    ERROR_CODES.conflict,
    'An account with this e-mail already exists. Sign in instead.',
    {
      email: 'Already has an account',
    },
  );

/** The signed-in person and every workshop they belong to; 401 if the account is gone. */
export async function sessionFor(userId: string): Promise<SessionBody> {
  const user = await User.findByPk(userId, {
    include: [
      { model: Membership, as: 'memberships', include: [{ model: Workshop, as: 'workshop' }] },
    ],
    order: [[{ model: Membership, as: 'memberships' }, 'createdAt', 'ASC']],
  });
  if (!user)
    throw unauthenticated('Your account no longer exists. Sign up or ask for a new invitation.');
  const memberships = (user as User & { memberships?: Membership[] }).memberships ?? [];
  return {
    user: {
      id: user.id,
      name: user.name,
      email: user.email,
      remindersEnabled: user.remindersEnabled,
    },
    memberships: memberships.map((m) => ({
      id: m.id,
      workshopId: m.workshopId,
      workshopName: m.workshop?.name ?? '',
      role: m.role,
    })),
  };
}

/** A new workshop with the person signing up as its owner, in one transaction. Returns the user id. */
export async function signUp(body: SignUpRequest, bcryptCost: number): Promise<string> {
  if (await User.findOne({ where: { email: body.email } })) throw emailTaken();
  const passwordHash = await hashPassword(body.password, bcryptCost);
  const sequelize = User.sequelize!;
  try {
    return await sequelize.transaction(async (transaction: Transaction) => {
      const workshop = await Workshop.create(
        { name: body.workshopName, settings: workshopSettings.parse({}) },
        { transaction },
      );
      const user = await User.create(
        { email: body.email, name: body.name, passwordHash },
        { transaction },
      );
      await Membership.create(
        { workshopId: workshop.id, userId: user.id, role: 'owner' },
        { transaction },
      );
      await audit(transaction, {
        workshopId: workshop.id,
        actorId: user.id,
        action: 'workshop.create',
        entityType: 'workshop',
        entityId: workshop.id,
        summary: `${user.name} created the workshop ${workshop.name}`,
      });
      return user.id;
    });
  } catch (e) {
    // Two sign-ups with the same address at once: the unique index decides.
    if (e instanceof UniqueConstraintError) throw emailTaken();
    throw e;
  }
}

/** The user id for a correct e-mail and password; the same 401 whether the address is unknown or the password wrong. */
export async function signIn(body: SignInRequest): Promise<string> {
  const user = await User.findOne({ where: { email: body.email } });
  if (!user) {
    await burnPasswordCheck(body.password);
    throw unauthenticated(WRONG_CREDENTIALS);
  }
  if (!(await verifyPassword(body.password, user.passwordHash)))
    throw unauthenticated(WRONG_CREDENTIALS);
  return user.id;
}

/**
 * The signed-in person's own preferences. Not a workshop record, so the audit entry has no
 * workshop; it still says who changed what.
 */
export async function updatePreferences(
  userId: string,
  body: UpdatePreferencesRequest,
): Promise<void> {
  const sequelize = User.sequelize!;
  await sequelize.transaction(async (transaction: Transaction) => {
    const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user)
      throw unauthenticated('Your account no longer exists. Sign up or ask for a new invitation.');
    if (user.remindersEnabled === body.remindersEnabled) return;
    await user.update({ remindersEnabled: body.remindersEnabled }, { transaction });
    await audit(transaction, {
      workshopId: null,
      actorId: user.id,
      action: 'user.preferences',
      entityType: 'user',
      entityId: user.id,
      summary: `${user.name} turned reminder e-mails ${body.remindersEnabled ? 'on' : 'off'}`,
      changes: { remindersEnabled: { from: !body.remindersEnabled, to: body.remindersEnabled } },
    });
  });
}
