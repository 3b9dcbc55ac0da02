import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import type { AppDeps } from '@/server/app';
import { waitForMail } from '@/server/mail/outbox';
import { AuditEntry, Invitation, Membership, User } from '@/server/models';
import { hashInvitationToken } from '@/server/services/invitations';
import { invitationPreview, sessionResponse } from '@/shared/schemas/auth';
import { invitationResponse } from '@/shared/schemas/workshop';
import {
  createMember,
  createUser,
  createWorkshop,
  createWorkshopWithTeam,
  TEST_PASSWORD,
  unique,
} from '../factories';
import { createInvitation } from '../factories/invitations';
import { setCookies } from '../factories/sessions';
import { buildTestAppWithMail, type TestAppWithMail } from './support/test-app';

let t: TestAppWithMail;
beforeAll(async () => {
  t = await buildTestAppWithMail();
});
afterEach(() => jest.restoreAllMocks());
afterAll(() => t.close());

const invitee = () => `${unique('invitee')}@example.test`;
const linkTo = (to: string) =>
  waitForMail(t.mailDir, (m) => m.to.includes(to)).then((m) => {
    const link = m.links.find((l) => l.includes('/invitation/'));
    if (!link) throw new Error(`no invitation link in: ${m.text}`);
    return { mail: m, link, token: link.slice(link.lastIndexOf('/') + 1) };
  });

describe('invitation round trip through the SMTP sink', () => {
  it('owner invites, the e-mail arrives, the link previews, accepting sets a password, and the new member signs in with the role', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const email = invitee();

    const created = await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .send({ email: email.toUpperCase(), role: 'applicator' })
      .expect(201);
    const inv = invitationResponse.parse(created.body);
    expect(inv).toMatchObject({
      email,
      role: 'applicator',
      invitedBy: owner.user.name,
      acceptedAt: null,
    });

    const { mail, link, token } = await linkTo(email);
    expect(mail.subject).toContain(workshop.name);
    expect(mail.text).toContain('Applicator');
    expect(link).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/invitation\/[A-Za-z0-9_-]{43}$/);
    // Only the digest is stored, never the token itself.
    const row = await Invitation.findByPk(inv.id);
    expect(row!.tokenHash).toBe(hashInvitationToken(token));
    expect(row!.tokenHash).not.toContain(token);

    const preview = invitationPreview.parse(
      (await request(t.app).get(`/api/invitations/${token}`).expect(200)).body,
    );
    expect(preview).toMatchObject({
      workshopName: workshop.name,
      email,
      role: 'applicator',
      invitedBy: owner.user.name,
    });

    const accepted = await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Bea Sawyer', password: 'quarter-sawn-oak' })
      .expect(200);
    const session = sessionResponse.parse(accepted.body);
    expect(session.user).toMatchObject({ name: 'Bea Sawyer', email });
    expect(session.memberships).toEqual([
      expect.objectContaining({ workshopId: workshop.id, role: 'applicator' }),
    ]);
    expect(setCookies(accepted).sf_session).toMatch(/HttpOnly/i);

    const user = await User.findOne({ where: { email } });
    expect(
      (await Membership.findOne({ where: { workshopId: workshop.id, userId: user!.id } }))!.role,
    ).toBe('applicator');
    expect((await row!.reload()).acceptedAt).not.toBeNull();
    expect(
      await AuditEntry.count({
        where: { workshopId: workshop.id, action: 'member.add', actorId: user!.id },
      }),
    ).toBe(1);

    const signedIn = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email, password: 'quarter-sawn-oak' })
      .expect(200);
    expect(signedIn.body.memberships).toEqual([
      expect.objectContaining({ workshopId: workshop.id, role: 'applicator' }),
    ]);
    const bearer = { Authorization: `Bearer ${signedIn.body.token}` };
    await request(t.app).get(`/api/workshops/${workshop.id}/members`).set(bearer).expect(200);
    await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(bearer)
      .send({ email: invitee(), role: 'client' })
      .expect(403);

    // The link worked once.
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
    await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Again', password: 'quarter-sawn-oak' })
      .expect(404);
    expect(await Membership.count({ where: { userId: user!.id } })).toBe(1);
  });

  it('re-inviting a pending address replaces the earlier link', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const email = invitee();
    const first = await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .send({ email, role: 'client' })
      .expect(201);
    const firstLink = await linkTo(email);
    fs.rmSync(path.join(t.mailDir, `${firstLink.mail.id}.eml`));
    const second = await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .send({ email, role: 'inspector' })
      .expect(201);
    const secondLink = await linkTo(email);

    expect((await Invitation.findByPk(first.body.id))!.revokedAt).not.toBeNull();
    expect((await Invitation.findByPk(second.body.id))!.revokedAt).toBeNull();
    await request(t.app).get(`/api/invitations/${firstLink.token}`).expect(404);
    const preview = await request(t.app).get(`/api/invitations/${secondLink.token}`).expect(200);
    expect(preview.body.role).toBe('inspector');

    const list = await request(t.app)
      .get(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .expect(200);
    expect(list.body.items.filter((i: { email: string }) => i.email === email)).toEqual([
      expect.objectContaining({ id: second.body.id, role: 'inspector' }),
    ]);
  });
});

describe('POST /api/workshops/:wid/invitations', () => {
  it.each(['inspector', 'applicator', 'client'] as const)(
    'answers 403 to the %s and stores nothing',
    async (role) => {
      const team = await createWorkshopWithTeam(t.config);
      const email = invitee();
      const res = await request(t.app)
        .post(`/api/workshops/${team.workshop.id}/invitations`)
        .set(team[role].auth)
        .send({ email, role: 'client' })
        .expect(403);
      expect(res.body.error.code).toBe('forbidden');
      expect(await Invitation.count({ where: { email } })).toBe(0);
    },
  );

  it('answers 400 on fields.email and fields.role for bad input', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .send({ email: 'no-at-sign', role: 'boss' })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'role']);
    expect(await Invitation.count({ where: { workshopId: workshop.id } })).toBe(0);
  });

  it('answers 409 on fields.email for someone who is already a member', async () => {
    const { workshop, owner, client } = await createWorkshopWithTeam(t.config);
    const res = await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .send({ email: client.user.email, role: 'inspector' })
      .expect(409);
    expect(res.body.error.fields).toEqual({ email: expect.any(String) });
    expect(await Invitation.count({ where: { workshopId: workshop.id } })).toBe(0);
  });

  it("answers 404 for another workshop's id and stores nothing there", async () => {
    const mine = await createWorkshopWithTeam(t.config);
    const other = await createWorkshop();
    await request(t.app)
      .post(`/api/workshops/${other.id}/invitations`)
      .set(mine.owner.auth)
      .send({ email: invitee(), role: 'client' })
      .expect(404);
    expect(await Invitation.count({ where: { workshopId: other.id } })).toBe(0);
  });

  it('answers 401 when signed out', async () => {
    const workshop = await createWorkshop();
    await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .send({ email: invitee(), role: 'client' })
      .expect(401);
  });

  it('answers 502 and keeps no invitation when the mail cannot be sent', async () => {
    const { mailer } = t.app.locals.deps as AppDeps;
    const send = jest
      .spyOn(mailer, 'send')
      .mockRejectedValueOnce(new Error('connect ECONNREFUSED 127.0.0.1:2525'));
    jest.spyOn(console, 'error').mockImplementation(() => undefined);
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const email = invitee();
    const res = await request(t.app)
      .post(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .send({ email, role: 'client' })
      .expect(502);
    expect(send).toHaveBeenCalledTimes(1);
    expect(res.body.error.message).toMatch(/could not be sent/);
    expect(res.text).not.toContain('ECONNREFUSED');
    expect(await Invitation.count({ where: { email } })).toBe(0);
    expect(
      await AuditEntry.count({ where: { workshopId: workshop.id, action: 'invitation.create' } }),
    ).toBe(0);
  });
});

describe('GET /api/workshops/:wid/invitations', () => {
  it('lists pending and accepted invitations of this workshop only, without withdrawn ones', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const pending = await createInvitation(workshop, { invitedById: owner.user.id });
    const accepted = await createInvitation(workshop, { acceptedAt: new Date() });
    const withdrawn = await createInvitation(workshop, { revokedAt: new Date() });
    const elsewhere = await createInvitation(await createWorkshop());

    const res = await request(t.app)
      .get(`/api/workshops/${workshop.id}/invitations`)
      .set(owner.auth)
      .expect(200);
    const ids = res.body.items.map((i: { id: string }) => i.id).sort();
    expect(ids).toEqual([pending.invitation.id, accepted.invitation.id].sort());
    expect(ids).not.toContain(withdrawn.invitation.id);
    expect(ids).not.toContain(elsewhere.invitation.id);
    for (const item of res.body.items) invitationResponse.parse(item);
  });

  it('answers 403 to an inspector', async () => {
    const { workshop, inspector } = await createWorkshopWithTeam(t.config);
    await request(t.app)
      .get(`/api/workshops/${workshop.id}/invitations`)
      .set(inspector.auth)
      .expect(403);
  });
});

describe('DELETE /api/workshops/:wid/invitations/:iid', () => {
  it('withdraws the invitation: 204, and its link answers 404', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const { invitation, token } = await createInvitation(workshop);
    await request(t.app).get(`/api/invitations/${token}`).expect(200);
    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/invitations/${invitation.id}`)
      .set(owner.auth)
      .expect(204);
    expect((await invitation.reload()).revokedAt).not.toBeNull();
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
    const res = await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Late', password: TEST_PASSWORD })
      .expect(404);
    expect(res.body.error.message).toMatch(/not valid any more/);
    expect(await User.count({ where: { email: invitation.email } })).toBe(0);
  });

  it('answers 403 to an inspector and leaves the invitation working', async () => {
    const { workshop, inspector } = await createWorkshopWithTeam(t.config);
    const { invitation } = await createInvitation(workshop);
    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/invitations/${invitation.id}`)
      .set(inspector.auth)
      .expect(403);
    expect((await invitation.reload()).revokedAt).toBeNull();
  });

  it("answers 404 for another workshop's invitation and leaves it untouched", async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const { invitation } = await createInvitation(await createWorkshop());
    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/invitations/${invitation.id}`)
      .set(owner.auth)
      .expect(404);
    expect((await invitation.reload()).revokedAt).toBeNull();
  });

  it('answers 409 for an invitation that was already accepted', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const { invitation } = await createInvitation(workshop, { acceptedAt: new Date() });
    await request(t.app)
      .delete(`/api/workshops/${workshop.id}/invitations/${invitation.id}`)
      .set(owner.auth)
      .expect(409);
    expect((await invitation.reload()).revokedAt).toBeNull();
  });
});

describe('GET /api/invitations/:token', () => {
  it.each([
    ['expired', { expiresAt: new Date(Date.now() - 60_000) }],
    ['withdrawn', { revokedAt: new Date() }],
    ['used', { acceptedAt: new Date() }],
  ])('answers 404 for an invitation that is %s', async (_label, partial) => {
    const { token } = await createInvitation(await createWorkshop(), partial);
    const res = await request(t.app).get(`/api/invitations/${token}`).expect(404);
    expect(res.body.error).toEqual({
      code: 'not_found',
      message: expect.stringMatching(/Ask the workshop owner/),
    });
  });

  it('answers 404 for a token that was never issued', async () => {
    await request(t.app)
      .get(`/api/invitations/${'A'.repeat(43)}`)
      .expect(404);
    await request(t.app).get('/api/invitations/short').expect(404);
  });
});

describe('POST /api/invitations/:token/accept', () => {
  it('answers 404 for an expired invitation and creates no account', async () => {
    const { invitation, token } = await createInvitation(await createWorkshop(), {
      expiresAt: new Date(Date.now() - 1000),
    });
    await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Too Late', password: TEST_PASSWORD })
      .expect(404);
    expect(await User.count({ where: { email: invitation.email } })).toBe(0);
    expect((await invitation.reload()).acceptedAt).toBeNull();
  });

  it('answers 400 naming name and password, and leaves the invitation usable', async () => {
    const { invitation, token } = await createInvitation(await createWorkshop());
    const res = await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: '', password: 'short' })
      .expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['name', 'password']);
    expect((await invitation.reload()).acceptedAt).toBeNull();
    expect(await User.count({ where: { email: invitation.email } })).toBe(0);
  });

  it('answers 409 when the address already has an account and nobody is signed in as it', async () => {
    const workshop = await createWorkshop();
    const existing = await createUser();
    const { invitation, token } = await createInvitation(workshop, {
      email: existing.email,
      role: 'client',
    });
    const res = await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Someone', password: 'takeover-attempt' })
      .expect(409);
    expect(res.body.error.message).toMatch(/Sign in/);
    expect(
      await Membership.count({ where: { workshopId: workshop.id, userId: existing.id } }),
    ).toBe(0);
    expect((await invitation.reload()).acceptedAt).toBeNull();
    // Signed in as a different account does not help either.
    const stranger = await createMember(t.config, await createWorkshop(), 'owner');
    await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .set(stranger.auth)
      .send({})
      .expect(409);
    expect(await Membership.count({ where: { workshopId: workshop.id } })).toBe(0);
  });

  it('adds the membership to an existing account when signed in as it (no password needed)', async () => {
    const home = await createWorkshop();
    const { user, auth } = await createMember(t.config, home, 'owner');
    const workshop = await createWorkshop();
    const { invitation, token } = await createInvitation(workshop, {
      email: user.email,
      role: 'inspector',
    });
    const res = await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .set(auth)
      .send({})
      .expect(200);
    expect(
      res.body.memberships
        .map((m: { workshopId: string; role: string }) => [m.workshopId, m.role])
        .sort(),
    ).toEqual(
      [
        [home.id, 'owner'],
        [workshop.id, 'inspector'],
      ].sort(),
    );
    expect(
      (await Membership.findOne({ where: { workshopId: workshop.id, userId: user.id } }))!.role,
    ).toBe('inspector');
    expect((await invitation.reload()).acceptedAt).not.toBeNull();
  });

  it('answers 409 to someone who is already a member of that workshop', async () => {
    const workshop = await createWorkshop();
    const { user, auth } = await createMember(t.config, workshop, 'client');
    const { invitation, token } = await createInvitation(workshop, {
      email: user.email,
      role: 'owner',
    });
    await request(t.app).post(`/api/invitations/${token}/accept`).set(auth).send({}).expect(409);
    expect(
      (await Membership.findOne({ where: { workshopId: workshop.id, userId: user.id } }))!.role,
    ).toBe('client');
    expect((await invitation.reload()).acceptedAt).toBeNull();
  });

  it('makes one membership when the same link is accepted twice at once', async () => {
    const workshop = await createWorkshop();
    const { invitation, token } = await createInvitation(workshop);
    const body = { name: 'Double Click', password: 'double-click-pass' };
    const results = await Promise.all([
      request(t.app).post(`/api/invitations/${token}/accept`).send(body),
      request(t.app).post(`/api/invitations/${token}/accept`).send(body),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 404]);
    expect(await User.count({ where: { email: invitation.email } })).toBe(1);
    expect(await Membership.count({ where: { workshopId: workshop.id } })).toBe(1);
  });
});
