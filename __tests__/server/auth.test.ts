import crypto from 'node:crypto';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { signSessionToken } from '@/server/middleware/auth';
import { AuditEntry, Membership, RevokedSession, User, Workshop } from '@/server/models';
import { verifyPassword } from '@/server/services/passwords';
import { sessionResponse } from '@/shared/schemas/auth';
import { createMember, createUser, createWorkshop, TEST_PASSWORD, unique } from '../factories';
import { cookieValue, sessionCookies, setCookies } from '../factories/sessions';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
const extraApps: TestApp[] = [];
beforeAll(() => {
  t = buildTestApp();
});
// Every app of this file shares the models (bound to the newest one), so all close at the end.
afterAll(async () => {
  for (const a of [...extraApps, t]) await a.close();
});

const email = () => `${unique('auth')}@example.test`;
const signUpBody = (partial: Record<string, unknown> = {}) => ({
  workshopName: unique('Coachworks'),
  name: 'Ada Framer',
  email: email(),
  password: 'seasoned-ash-frame',
  ...partial,
});

describe('POST /api/auth/sign-up', () => {
  it('creates the workshop, the user and the owner membership, and signs in', async () => {
    const body = signUpBody({ email: `${unique('Mixed')}@Example.TEST` });
    const res = await request(t.app).post('/api/auth/sign-up').send(body).expect(201);

    const session = sessionResponse.parse(res.body);
    expect(session.user.email).toBe(body.email.toLowerCase());
    expect(session.memberships).toEqual([
      expect.objectContaining({ workshopName: body.workshopName, role: 'owner' }),
    ]);
    expect(session.token).toBeTruthy();

    const user = await User.findOne({ where: { email: body.email.toLowerCase() } });
    expect(user).not.toBeNull();
    expect(user!.passwordHash).not.toContain(body.password);
    expect(await verifyPassword(body.password, user!.passwordHash)).toBe(true);
    const workshop = await Workshop.findByPk(session.memberships[0].workshopId);
    expect(workshop!.name).toBe(body.workshopName);
    const membership = await Membership.findOne({
      where: { userId: user!.id, workshopId: workshop!.id },
    });
    expect(membership!.role).toBe('owner');
    const entries = await AuditEntry.findAll({ where: { workshopId: workshop!.id } });
    expect(entries.map((e) => [e.action, e.actorId])).toEqual([['workshop.create', user!.id]]);

    const cookies = setCookies(res);
    expect(cookies.sf_session).toMatch(/HttpOnly/i);
    expect(cookies.sf_session).toMatch(/SameSite=Lax/i);
    expect(cookieValue(cookies.sf_csrf)).toBe(session.csrfToken);
  });

  it('answers 409 on fields.email for an address that has an account, in any case, and creates nothing', async () => {
    const existing = await createUser();
    const body = signUpBody({ email: existing.email.toUpperCase() });
    const res = await request(t.app).post('/api/auth/sign-up').send(body).expect(409);
    expect(res.body.error.fields).toEqual({ email: expect.any(String) });
    expect(await Workshop.count({ where: { name: body.workshopName } })).toBe(0);
    expect(await User.count({ where: { email: existing.email } })).toBe(1);
  });

  it.each([
    ['password', 'short12', /at least 8/],
    ['password', 'p'.repeat(129), /at most 128/],
    ['email', 'not-an-address', /valid e-mail/],
    ['workshopName', 'x', /workshop name/],
    ['name', '   ', /name/],
  ])('answers 400 naming %s', async (field, value, message) => {
    const body = signUpBody({ [field]: value });
    const res = await request(t.app).post('/api/auth/sign-up').send(body).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields[field]).toMatch(message);
    expect(await User.count({ where: { email: String(body.email).toLowerCase() } })).toBe(0);
  });

  it('accepts passwords of exactly 8 and 128 characters', async () => {
    for (const password of ['12345678', 'q'.repeat(128)]) {
      const body = signUpBody({ password });
      await request(t.app).post('/api/auth/sign-up').send(body).expect(201);
      await request(t.app)
        .post('/api/auth/sign-in')
        .send({ email: body.email, password })
        .expect(200);
    }
  });
});

describe('POST /api/auth/sign-in', () => {
  it('signs in with the right password: httpOnly SameSite cookie, and a token that works as Bearer', async () => {
    const workshop = await createWorkshop();
    const { user } = await createMember(t.config, workshop, 'inspector');
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD })
      .expect(200);

    const session = sessionResponse.parse(res.body);
    expect(session.user).toEqual({
      id: user.id,
      name: user.name,
      email: user.email,
      remindersEnabled: true,
    });
    expect(session.memberships).toEqual([
      {
        id: expect.any(String),
        workshopId: workshop.id,
        workshopName: workshop.name,
        role: 'inspector',
      },
    ]);
    const cookies = setCookies(res);
    expect(cookies.sf_session).toMatch(/HttpOnly/i);
    expect(cookies.sf_session).toMatch(/SameSite=Lax/i);
    expect(cookies.sf_csrf).not.toMatch(/HttpOnly/i); // the web client reads it to echo it back

    const viaBearer = await request(t.app)
      .get('/api/auth/session')
      .set('Authorization', `Bearer ${session.token}`)
      .expect(200);
    expect(viaBearer.body.user.id).toBe(user.id);
    const viaCookie = await request(t.app)
      .get('/api/auth/session')
      .set('Cookie', sessionCookies(cookieValue(cookies.sf_session)!))
      .expect(200);
    expect(viaCookie.body.user.id).toBe(user.id);
  });

  it('answers the same 401 for a wrong password and for an unknown address', async () => {
    const user = await createUser();
    const wrong = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'not-the-password' })
      .expect(401);
    const unknown = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: email(), password: TEST_PASSWORD })
      .expect(401);
    expect(wrong.body.error).toEqual(unknown.body.error);
    expect(wrong.body.error.code).toBe('unauthenticated');
    expect(setCookies(wrong).sf_session).toBeUndefined();
    expect(wrong.body.token).toBeUndefined();
  });

  it('keeps every byte of a long password significant (bcrypt alone reads only 72)', async () => {
    const shared = 'a'.repeat(72);
    const body = signUpBody({ password: `${shared}${'b'.repeat(28)}` });
    await request(t.app).post('/api/auth/sign-up').send(body).expect(201);
    await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: body.email, password: `${shared}${'c'.repeat(28)}` })
      .expect(401);
    await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: body.email, password: body.password })
      .expect(200);
  });

  it('answers 400 naming the fields of an incomplete request', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: 'nope' }).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('answers 429 in the error shape after SIGN_IN_RATE_LIMIT failed attempts for one address, even with the right password', async () => {
    const limited = buildTestApp({ SIGN_IN_RATE_LIMIT: '3' });
    extraApps.push(limited);
    const user = await createUser();
    const other = await createUser();
    for (let i = 0; i < 3; i++)
      await request(limited.app)
        .post('/api/auth/sign-in')
        .send({ email: user.email, password: 'guess-number-x' })
        .expect(401);
    const blocked = await request(limited.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD })
      .expect(429);
    expect(blocked.body).toEqual({
      error: { code: 'rate_limited', message: expect.stringMatching(/15 minutes/) },
    });
    expect(setCookies(blocked).sf_session).toBeUndefined();
    // Another address from the same client is counted on its own.
    await request(limited.app)
      .post('/api/auth/sign-in')
      .send({ email: other.email, password: TEST_PASSWORD })
      .expect(200);
  });
});

describe('POST /api/auth/sign-out', () => {
  it('clears both cookies and answers 204', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'owner');
    const token = signSessionToken(t.config, user.id);
    const res = await request(t.app)
      .post('/api/auth/sign-out')
      .set('Cookie', sessionCookies(token, 'csrf-value'))
      .set('x-csrf-token', 'csrf-value')
      .expect(204);
    const cookies = setCookies(res);
    for (const name of ['sf_session', 'sf_csrf']) {
      expect(cookieValue(cookies[name])).toBe('');
      expect(cookies[name]).toMatch(/Expires=Thu, 01 Jan 1970/);
    }
  });

  it('refuses a cookie sign-out without the CSRF header (403), so another site cannot sign people out', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'owner');
    const res = await request(t.app)
      .post('/api/auth/sign-out')
      .set('Cookie', sessionCookies(signSessionToken(t.config, user.id), 'csrf-value'))
      .expect(403);
    expect(res.body.error.code).toBe('csrf_failed');
    expect(setCookies(res).sf_session).toBeUndefined();
    expect(await RevokedSession.count({ where: { userId: user.id } })).toBe(0);
  });

  it('withdraws the cookie’s token: a copy of the old cookie no longer signs anyone in', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'owner');
    const token = signSessionToken(t.config, user.id);
    const cookies = sessionCookies(token, 'csrf-value');
    await request(t.app).get('/api/auth/session').set('Cookie', cookies).expect(200);
    await request(t.app)
      .post('/api/auth/sign-out')
      .set('Cookie', cookies)
      .set('x-csrf-token', 'csrf-value')
      .expect(204);
    const again = await request(t.app).get('/api/auth/session').set('Cookie', cookies).expect(401);
    expect(again.body.error.code).toBe('unauthenticated');
    const { jti, exp } = jwt.decode(token) as { jti: string; exp: number };
    const row = await RevokedSession.findByPk(jti);
    expect(row!.userId).toBe(user.id);
    expect(row!.expiresAt.getTime()).toBe(exp * 1000);
  });

  it('withdraws a Bearer token; the same person’s other sessions keep working', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'inspector');
    const phone = signSessionToken(t.config, user.id);
    const laptop = signSessionToken(t.config, user.id);
    const bearer = (tok: string) => ({ Authorization: `Bearer ${tok}` });
    await request(t.app).post('/api/auth/sign-out').set(bearer(phone)).expect(204);
    await request(t.app).post('/api/auth/sign-out').set(bearer(phone)).expect(401);
    const res = await request(t.app).get('/api/auth/session').set(bearer(phone)).expect(401);
    expect(res.body.error.message).toBe('Your session is not valid. Sign in again.');
    await request(t.app).get('/api/auth/session').set(bearer(laptop)).expect(200);
  });

  it('drops withdrawn tokens that have expired anyway when someone signs out', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'client');
    const old = await RevokedSession.create({
      jti: crypto.randomUUID(),
      userId: user.id,
      expiresAt: new Date(Date.now() - 60_000),
    });
    await request(t.app)
      .post('/api/auth/sign-out')
      .set({ Authorization: `Bearer ${signSessionToken(t.config, user.id)}` })
      .expect(204);
    expect(await RevokedSession.findByPk(old.jti)).toBeNull();
  });
});

describe('GET /api/auth/session', () => {
  it('answers 401 when signed out', async () => {
    const res = await request(t.app).get('/api/auth/session').expect(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('returns the CSRF cookie value it already set', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'client');
    const res = await request(t.app)
      .get('/api/auth/session')
      .set('Cookie', sessionCookies(signSessionToken(t.config, user.id), 'kept-csrf'))
      .expect(200);
    expect(res.body.csrfToken).toBe('kept-csrf');
    expect(setCookies(res).sf_csrf).toBeUndefined();
  });

  it('sets a new CSRF cookie when only the session cookie came', async () => {
    const { user } = await createMember(t.config, await createWorkshop(), 'client');
    const res = await request(t.app)
      .get('/api/auth/session')
      .set('Cookie', sessionCookies(signSessionToken(t.config, user.id)))
      .expect(200);
    const csrf = cookieValue(setCookies(res).sf_csrf);
    expect(csrf).toBeTruthy();
    expect(res.body.csrfToken).toBe(csrf);
  });

  it('answers 401 for a valid token whose account was deleted', async () => {
    const user = await createUser();
    const token = signSessionToken(t.config, user.id);
    await user.destroy();
    await request(t.app)
      .get('/api/auth/session')
      .set('Authorization', `Bearer ${token}`)
      .expect(401);
  });
});

describe('session tokens', () => {
  const b64 = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const claims = (userId: string) => ({
    sub: userId,
    iss: t.config.jwt.issuer,
    aud: t.config.jwt.audience,
  });

  it.each<[string, (userId: string) => string]>([
    [
      'alg none',
      (id) =>
        `${b64({ alg: 'none', typ: 'JWT' })}.${b64({ ...claims(id), exp: Math.floor(Date.now() / 1000) + 600 })}.`,
    ],
    [
      'HS512 with the right secret',
      (id) => jwt.sign(claims(id), t.config.jwt.secret, { algorithm: 'HS512', expiresIn: 600 }),
    ],
    [
      'another secret',
      (id) =>
        jwt.sign(claims(id), crypto.randomBytes(32).toString('hex'), {
          algorithm: 'HS256',
          expiresIn: 600,
        }),
    ],
    [
      'another issuer',
      (id) =>
        jwt.sign({ ...claims(id), iss: 'elsewhere' }, t.config.jwt.secret, {
          algorithm: 'HS256',
          expiresIn: 600,
        }),
    ],
    [
      'another audience',
      (id) =>
        jwt.sign({ ...claims(id), aud: 'other-app' }, t.config.jwt.secret, {
          algorithm: 'HS256',
          expiresIn: 600,
        }),
    ],
    [
      'an expired token',
      (id) =>
        jwt.sign({ ...claims(id), exp: Math.floor(Date.now() / 1000) - 60 }, t.config.jwt.secret, {
          algorithm: 'HS256',
        }),
    ],
  ])('refuses %s with 401, as Bearer and as cookie', async (_label, make) => {
    const user = await createUser();
    const token = make(user.id);
    // The control: the same user with a proper token is let in.
    await request(t.app)
      .get('/api/auth/session')
      .set('Authorization', `Bearer ${signSessionToken(t.config, user.id)}`)
      .expect(200);
    const bearer = await request(t.app)
      .get('/api/auth/session')
      .set('Authorization', `Bearer ${token}`)
      .expect(401);
    expect(bearer.body.error.code).toBe('unauthenticated');
    const cookie = await request(t.app)
      .get('/api/auth/session')
      .set('Cookie', sessionCookies(token, 'x'))
      .expect(401);
    expect(cookieValue(setCookies(cookie).sf_session)).toBe(''); // the bad cookie is cleared
  });
});

describe('CSRF on cookie-authenticated writes (PATCH /api/workshops/:id)', () => {
  async function owner() {
    const workshop = await createWorkshop();
    const member = await createMember(t.config, workshop, 'owner');
    return { workshop, cookie: sessionCookies(member.token, 'right-csrf'), auth: member.auth };
  }

  it.each([
    ['no header', undefined],
    ['a wrong header', 'wrong-csrf'],
  ])('answers 403 with %s and changes nothing', async (_label, header) => {
    const { workshop, cookie } = await owner();
    const req = request(t.app).patch(`/api/workshops/${workshop.id}`).set('Cookie', cookie);
    if (header) req.set('x-csrf-token', header);
    const res = await req.send({ name: 'Renamed by a forged form' }).expect(403);
    expect(res.body.error.code).toBe('csrf_failed');
    await workshop.reload();
    expect(workshop.name).not.toBe('Renamed by a forged form');
  });

  it('accepts the header that matches the cookie', async () => {
    const { workshop, cookie } = await owner();
    const name = unique('Renamed');
    await request(t.app)
      .patch(`/api/workshops/${workshop.id}`)
      .set('Cookie', cookie)
      .set('x-csrf-token', 'right-csrf')
      .send({ name })
      .expect(200);
    await workshop.reload();
    expect(workshop.name).toBe(name);
  });

  it('needs no CSRF header for Bearer requests', async () => {
    const { workshop, auth } = await owner();
    const name = unique('Bearer');
    await request(t.app)
      .patch(`/api/workshops/${workshop.id}`)
      .set(auth)
      .send({ name })
      .expect(200);
    await workshop.reload();
    expect(workshop.name).toBe(name);
  });
});
