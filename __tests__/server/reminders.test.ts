import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { addMinutes, addSeconds } from 'date-fns';
import type { Sequelize } from 'sequelize';
import request from 'supertest';
import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { createSequelize } from '@/server/db';
import { startServer } from '@/server/index';
import { startJob } from '@/server/jobs/reminder-job';
import { readOutbox, waitForMail } from '@/server/mail/outbox';
import { startMailSink, type MailSink } from '@/server/mail/sink';
import { createMailer, type Mailer } from '@/server/mail/transport';
import { AuditEntry, Membership, ReminderDelivery, User, type Workshop } from '@/server/models';
import {
  localDate,
  runReminderCycle,
  type ReminderCycleOptions,
} from '@/server/services/reminders';
import { createStorage } from '@/server/storage';
import { getBodyPlan, getZone } from '@/shared/body-plans';
import { sessionResponse } from '@/shared/schemas/auth';
import { createMember, createVehicle, createWorkshop, unique } from '../factories';
import { sessionCookies } from '../factories/sessions';
import { createTestDatabase, type TestDatabase } from '../e2e/support/test-db';
import { testConfig } from './support/test-app';

/**
 * The reminder job against a database of its own (so no other test file's re-checks reach it),
 * with two independent connection pools standing in for two server instances.
 */
let db: TestDatabase;
let second: Sequelize;
let sink: MailSink;
let mailDir: string;
let mailer: Mailer;
const PUBLIC_URL = 'http://soundframe.test';

beforeAll(async () => {
  mailDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-reminder-mail-'));
  sink = await startMailSink({ port: 0, dir: mailDir });
  db = await createTestDatabase('reminders', {
    SMTP_PORT: String(sink.port),
    MAIL_SINK_DIR: mailDir,
  });
  // Created last, so the models (and the factories) are bound to it; both pools reach one database.
  second = createSequelize(db.config);
  mailer = createMailer({ host: '127.0.0.1', port: sink.port, from: db.config.mail.from });
});
afterAll(async () => {
  mailer.close();
  await second.close();
  await db.drop();
  await sink.close();
  fs.rmSync(mailDir, { recursive: true, force: true });
});

/** Midday UTC today, so a test stepping minutes ahead never crosses into the next digest day. */
const NOON = (() => {
  const d = new Date();
  d.setUTCHours(12, 0, 0, 0);
  return d;
})();
const TODAY = localDate(NOON, 'UTC');
const day = (offset: number) => {
  const d = new Date(`${TODAY}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + offset);
  return d.toISOString().slice(0, 10);
};

const mailsTo = async (email: string) =>
  (await readOutbox(mailDir, { limit: 10_000 })).filter((m) => m.to.includes(email));

/** One run of the job, as instance 'a' on the first pool with the real mailer unless `over` says otherwise. */
const cycle = (now: Date, over: Partial<ReminderCycleOptions> = {}) =>
  runReminderCycle({
    instanceId: 'a',
    sequelize: db.sequelize,
    mailer,
    publicUrl: PUBLIC_URL,
    now,
    ...over,
  });

/** A treatment and its re-checks, written with raw SQL against the contract's columns. */
async function seedRechecks(
  workshop: Workshop,
  checks: { assigneeId: string | null; dueDate: string; status?: string; zoneKeys?: string[] }[],
) {
  const vehicle = await createVehicle(workshop, { make: unique('Thornbury'), model: 'Tourer' });
  const q = db.sequelize;
  const treatmentId = crypto.randomUUID();
  const now = new Date();
  await q.query(
    `INSERT INTO treatments (id, workshop_id, vehicle_id, recorded_by_id, version, data, applied_at,
       zone_keys, method, target_agent, created_at, updated_at)
     VALUES (:id, :w, :v, NULL, 0, '{}', :now, '["sill-left"]', 'brush', 'beetles', :now, :now)`,
    { replacements: { id: treatmentId, w: workshop.id, v: vehicle.id, now } },
  );
  const ids: string[] = [];
  for (const c of checks) {
    const id = crypto.randomUUID();
    ids.push(id);
    await q.query(
      `INSERT INTO re_checks (id, workshop_id, vehicle_id, treatment_id, zone_keys, due_date,
         assignee_id, status, frass_cleaned, notes, move_reason, version, created_at, updated_at)
       VALUES (:id, :w, :v, :t, :zones, :due, :assignee, :status, 0, '', '', 0, :now, :now)`,
      {
        replacements: {
          id,
          w: workshop.id,
          v: vehicle.id,
          t: treatmentId,
          zones: JSON.stringify(c.zoneKeys ?? ['sill-left']),
          due: c.dueDate,
          assignee: c.assigneeId,
          status: c.status ?? 'pending',
          now,
        },
      },
    );
  }
  return { vehicle, ids, label: `${vehicle.year} ${vehicle.make} ${vehicle.model}` };
}

/** The real mailer, except that sends to `email` fail the first `times` times (all of them by default). */
function failingFor(email: string, times = Infinity) {
  let failures = 0;
  const calls: string[] = [];
  const m: Mailer = {
    async send(msg) {
      calls.push(msg.to);
      if (msg.to === email && failures < times) {
        failures += 1;
        throw new Error(`421 mail server busy (try ${failures})`);
      }
      return mailer.send(msg);
    },
    close: () => undefined,
  };
  return { mailer: m, calls };
}

const deliveriesOf = (userId: string) =>
  ReminderDelivery.findAll({ where: { userId }, order: [['createdAt', 'ASC']] });

describe('two server instances on one database', () => {
  it('each assignee gets one digest a day, sent by whichever instance claimed it', async () => {
    const workshop = await createWorkshop();
    const people = await Promise.all(
      [0, 1].map(() => createMember(db.config, workshop, 'applicator')),
    );
    for (const p of people)
      await seedRechecks(workshop, [
        { assigneeId: p.user.id, dueDate: day(-3) },
        { assigneeId: p.user.id, dueDate: day(1) },
      ]);

    const env = {
      ...process.env,
      NODE_ENV: 'test' as const,
      DB_NAME: db.name,
      HOST: '127.0.0.1',
      PORT: '0',
      SMTP_PORT: String(sink.port),
      MAIL_SINK_DIR: mailDir,
      WEB_DIST: path.join(os.tmpdir(), 'sf-no-dist'),
      REMINDERS_ENABLED: '1',
      REMINDER_INTERVAL_SECONDS: '1',
    };
    const servers = [
      await startServer(loadConfig({ ...env, INSTANCE_ID: 'instance-a' }), {
        sequelize: db.sequelize,
      }),
      await startServer(loadConfig({ ...env, INSTANCE_ID: 'instance-b' }), { sequelize: second }),
    ];
    try {
      for (const p of people)
        await waitForMail(mailDir, (m) => m.to.includes(p.user.email), 10_000);
      // Several more runs of both jobs.
      await new Promise((r) => setTimeout(r, 3_000));
    } finally {
      for (const s of servers) await s.close();
    }

    for (const p of people) {
      expect(await mailsTo(p.user.email)).toHaveLength(1);
      const rows = await deliveriesOf(p.user.id);
      expect(rows.map((r) => [r.status, r.digestDate, r.attempts])).toEqual([
        ['sent', localDate(new Date(), 'UTC'), 1],
      ]);
      expect(['instance-a', 'instance-b']).toContain(rows[0].claimedBy);
    }
  });

  it('many concurrent cycles of two instances send each due digest exactly once, with the due re-checks only', async () => {
    const shops = [await createWorkshop(), await createWorkshop()];
    const people = [];
    for (const shop of shops)
      for (let i = 0; i < 4; i++)
        people.push({ shop, ...(await createMember(db.config, shop, 'applicator')) });
    // Someone in both workshops gets one digest from each.
    const both = await createMember(db.config, shops[0], 'inspector');
    await Membership.create({ workshopId: shops[1].id, userId: both.user.id, role: 'inspector' });
    for (const shop of shops)
      await seedRechecks(shop, [{ assigneeId: both.user.id, dueDate: day(0) }]);
    const seeded = new Map<string, Awaited<ReturnType<typeof seedRechecks>>>();
    for (const p of people)
      seeded.set(
        p.user.id,
        await seedRechecks(p.shop, [
          { assigneeId: p.user.id, dueDate: day(-40) },
          { assigneeId: p.user.id, dueDate: day(0), zoneKeys: ['sill-left', 'sill-right'] },
          { assigneeId: p.user.id, dueDate: day(1) },
        ]),
      );
    // Not in anyone's digest: due later, already done, nobody assigned.
    const later = await seedRechecks(shops[0], [
      { assigneeId: people[0].user.id, dueDate: day(2) },
      { assigneeId: people[0].user.id, dueDate: day(-1), status: 'clean' },
      { assigneeId: null, dueDate: day(-1) },
    ]);

    const results = [];
    for (let round = 0; round < 8; round++)
      results.push(
        ...(await Promise.all([
          cycle(NOON, { batchSize: 3 }),
          cycle(NOON, { instanceId: 'b', sequelize: second, batchSize: 3 }),
          cycle(NOON, { instanceId: 'b', sequelize: second, batchSize: 3 }),
        ])),
      );

    expect(results.reduce((n, r) => n + r.sent, 0)).toBe(people.length + 2);
    expect(results.reduce((n, r) => n + r.enqueued, 0)).toBe(people.length + 2);
    const sill = getBodyPlan('closed-saloon-4d')!;
    const [left, right] = ['sill-left', 'sill-right'].map((k) => getZone(sill, k)!.label);
    for (const p of people) {
      const mails = await mailsTo(p.user.email);
      expect(mails).toHaveLength(1);
      const [mail] = mails;
      const { label, ids } = seeded.get(p.user.id)!;
      expect(mail.subject).toContain(p.shop.name);
      expect(mail.subject).toContain('1 overdue, 2 coming due');
      expect(mail.text).toContain(label);
      expect(mail.text).toContain(`${left}, ${right} (due today)`);
      expect(mail.text).toMatch(/Overdue[^\n]*\n- [^\n]+\(due \w{3} \d{1,2} \w{3} \d{4}\)/);
      expect(mail.text).not.toContain(later.label);
      expect(mail.links).toContain(`${PUBLIC_URL}/due`);
      const rows = await deliveriesOf(p.user.id);
      expect(rows).toHaveLength(1);
      expect(rows[0]).toMatchObject({ status: 'sent', digestDate: TODAY, attempts: 1 });
      expect([...rows[0].recheckIds].sort()).toEqual([...ids].sort());
      expect(rows[0].sentAt).toEqual(NOON);
    }
    expect((await mailsTo(both.user.email)).map((m) => m.subject).sort()).toEqual(
      shops.map((w) => `Re-checks at ${w.name}: 1 coming due`).sort(),
    );
  });
});

describe('failed sends', () => {
  it('retries a failed send on a later cycle after the back-off, records the attempts, and sends it once', async () => {
    const workshop = await createWorkshop();
    const p = await createMember(db.config, workshop, 'applicator');
    await seedRechecks(workshop, [{ assigneeId: p.user.id, dueDate: day(0) }]);
    const flaky = failingFor(p.user.email, 1);

    await cycle(NOON, { mailer: flaky.mailer });
    let [row] = await deliveriesOf(p.user.id);
    expect(row).toMatchObject({ status: 'failed', attempts: 1, claimedBy: 'a' });
    expect(row.lastError).toMatch(/421 mail server busy/);
    expect(row.nextAttemptAt).toEqual(addMinutes(NOON, 1));
    expect(await mailsTo(p.user.email)).toHaveLength(0);

    // Before the back-off has passed nothing is tried.
    await cycle(addSeconds(NOON, 30), { instanceId: 'b', sequelize: second, mailer: flaky.mailer });
    expect(flaky.calls.filter((to) => to === p.user.email)).toHaveLength(1);

    await cycle(addSeconds(NOON, 61), { instanceId: 'b', sequelize: second, mailer: flaky.mailer });
    [row] = await deliveriesOf(p.user.id);
    expect(row).toMatchObject({ status: 'sent', attempts: 2, claimedBy: 'b' });
    expect(row.sentAt).toEqual(addSeconds(NOON, 61));
    expect(row.lastError).toMatch(/421/); // what went wrong on the way stays on record

    await cycle(addMinutes(NOON, 30), { mailer: flaky.mailer });
    await cycle(addMinutes(NOON, 31), { instanceId: 'b', sequelize: second, mailer: flaky.mailer });
    expect(await mailsTo(p.user.email)).toHaveLength(1);
    expect(await deliveriesOf(p.user.id)).toHaveLength(1);
  });

  it('stops after the maximum attempts (5) with the last error recorded, backing off 1, 5, 15 … minutes', async () => {
    const workshop = await createWorkshop();
    const p = await createMember(db.config, workshop, 'inspector');
    await seedRechecks(workshop, [{ assigneeId: p.user.id, dueDate: day(-2) }]);
    const broken = failingFor(p.user.email);

    let at = NOON;
    const waits: number[] = [];
    for (let attempt = 1; attempt <= 5; attempt++) {
      await cycle(at, { mailer: broken.mailer });
      const [row] = await deliveriesOf(p.user.id);
      expect(row).toMatchObject({ status: 'failed', attempts: attempt });
      waits.push((row.nextAttemptAt.getTime() - at.getTime()) / 60_000);
      at = row.nextAttemptAt;
    }
    expect(waits).toEqual([1, 5, 15, 60, 240]);

    // Later the same day (NOON + 6 h 21 min): the digest is not tried again.
    await cycle(addMinutes(at, 60), { mailer: broken.mailer });
    const rows = await deliveriesOf(p.user.id);
    expect(rows).toHaveLength(1);
    const [row] = rows;
    expect(row).toMatchObject({ status: 'failed', attempts: 5, sentAt: null });
    expect(row.lastError).toBe('421 mail server busy (try 5)');
    expect(broken.calls.filter((to) => to === p.user.email)).toHaveLength(5);
    expect(await mailsTo(p.user.email)).toHaveLength(0);
  });

  it('offers a digest left "sending" by a crashed instance again after 10 minutes, counting that attempt', async () => {
    const workshop = await createWorkshop();
    const p = await createMember(db.config, workshop, 'applicator');
    const { ids } = await seedRechecks(workshop, [{ assigneeId: p.user.id, dueDate: day(0) }]);
    const row = await ReminderDelivery.create({
      userId: p.user.id,
      workshopId: workshop.id,
      digestDate: TODAY,
      status: 'sending',
      nextAttemptAt: NOON,
      claimedBy: 'crashed',
      claimedAt: NOON,
      recheckIds: ids,
    });
    await cycle(addMinutes(NOON, 9));
    expect(await row.reload()).toMatchObject({ status: 'sending', claimedBy: 'crashed' });
    await cycle(addMinutes(NOON, 11));
    expect(await row.reload()).toMatchObject({ status: 'sent', attempts: 2, claimedBy: 'a' });
    expect(row.lastError).toMatch(/Claimed by crashed but not finished/);
    expect(await mailsTo(p.user.email)).toHaveLength(1);
  });
});

describe('opting out', () => {
  it('an opted-out assignee gets no digest and no queued row', async () => {
    const workshop = await createWorkshop();
    const out = await createMember(db.config, workshop, 'applicator');
    const inn = await createMember(db.config, workshop, 'applicator');
    await User.update({ remindersEnabled: false }, { where: { id: out.user.id } });
    await seedRechecks(workshop, [
      { assigneeId: out.user.id, dueDate: day(-1) },
      { assigneeId: inn.user.id, dueDate: day(-1) },
    ]);
    await cycle(NOON);
    expect(await mailsTo(out.user.email)).toHaveLength(0);
    expect(await deliveriesOf(out.user.id)).toHaveLength(0);
    expect(await mailsTo(inn.user.email)).toHaveLength(1);
  });

  it('a digest queued before the person opted out is dropped unsent', async () => {
    const workshop = await createWorkshop();
    const p = await createMember(db.config, workshop, 'applicator');
    await seedRechecks(workshop, [{ assigneeId: p.user.id, dueDate: day(0) }]);
    const flaky = failingFor(p.user.email, 1);
    await cycle(NOON, { mailer: flaky.mailer });
    expect(await deliveriesOf(p.user.id)).toHaveLength(1);

    await User.update({ remindersEnabled: false }, { where: { id: p.user.id } });
    const result = await cycle(addMinutes(NOON, 2), { mailer: flaky.mailer });
    expect(result.dropped).toBe(1);
    expect(await deliveriesOf(p.user.id)).toHaveLength(0);
    expect(await mailsTo(p.user.email)).toHaveLength(0);
  });
});

describe('PATCH /api/auth/preferences', () => {
  const app = () =>
    createApp({
      config: testConfig({ DB_NAME: db.name }),
      storage: createStorage({ driver: 'local', dir: path.join(mailDir, 'storage') }),
      mailer,
    });

  it("turns the signed-in person's own reminders off and on, shown in the session and audited", async () => {
    const workshop = await createWorkshop();
    const me = await createMember(db.config, workshop, 'applicator');
    const other = await createMember(db.config, workshop, 'applicator');
    const a = app();

    const before = sessionResponse.parse(
      (await request(a).get('/api/auth/session').set(me.auth).expect(200)).body,
    );
    expect(before.user.remindersEnabled).toBe(true);

    const off = await request(a)
      .patch('/api/auth/preferences')
      .set(me.auth)
      .send({ remindersEnabled: false })
      .expect(200);
    expect(sessionResponse.parse(off.body).user).toMatchObject({
      id: me.user.id,
      remindersEnabled: false,
    });
    expect((await User.findByPk(me.user.id))!.remindersEnabled).toBe(false);
    expect((await User.findByPk(other.user.id))!.remindersEnabled).toBe(true);
    const session = await request(a).get('/api/auth/session').set(me.auth).expect(200);
    expect(session.body.user.remindersEnabled).toBe(false);
    expect(
      await AuditEntry.count({
        where: { actorId: me.user.id, action: 'user.preferences', entityId: me.user.id },
      }),
    ).toBe(1);

    // Opted out: the job leaves this person alone.
    await seedRechecks(workshop, [{ assigneeId: me.user.id, dueDate: day(0) }]);
    await cycle(NOON);
    expect(await mailsTo(me.user.email)).toHaveLength(0);

    const on = await request(a)
      .patch('/api/auth/preferences')
      .set(me.auth)
      .send({ remindersEnabled: true })
      .expect(200);
    expect(on.body.user.remindersEnabled).toBe(true);
    await cycle(NOON);
    expect(await mailsTo(me.user.email)).toHaveLength(1);
  });

  it('answers 401 signed out, 400 naming the field, and 403 to a cookie request without the CSRF token', async () => {
    const workshop = await createWorkshop();
    const me = await createMember(db.config, workshop, 'client');
    const a = app();
    await request(a).patch('/api/auth/preferences').send({ remindersEnabled: false }).expect(401);
    const bad = await request(a)
      .patch('/api/auth/preferences')
      .set(me.auth)
      .send({ remindersEnabled: 'no' })
      .expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['remindersEnabled']);
    await request(a)
      .patch('/api/auth/preferences')
      .set('Cookie', sessionCookies(me.token, 'csrf-value'))
      .send({ remindersEnabled: false })
      .expect(403);
    await request(a)
      .patch('/api/auth/preferences')
      .set('Cookie', sessionCookies(me.token, 'csrf-value'))
      .set('x-csrf-token', 'csrf-value')
      .send({ remindersEnabled: false })
      .expect(200);
    expect((await User.findByPk(me.user.id))!.remindersEnabled).toBe(false);
  });
});

describe('startJob', () => {
  it('never overlaps runs, and stop() waits for the run in progress', async () => {
    let active = 0;
    let maxActive = 0;
    let finished = 0;
    const job = startJob({
      intervalMs: 20,
      task: async () => {
        active += 1;
        maxActive = Math.max(maxActive, active);
        await new Promise((r) => setTimeout(r, 60));
        active -= 1;
        finished += 1;
      },
      onError: () => undefined,
    });
    await new Promise((r) => setTimeout(r, 200));
    await job.stop();
    const atStop = finished;
    expect(active).toBe(0);
    expect(maxActive).toBe(1);
    expect(atStop).toBeGreaterThanOrEqual(2);
    await new Promise((r) => setTimeout(r, 150));
    expect(finished).toBe(atStop);
  });

  it('goes on after a failed run', async () => {
    const errors: unknown[] = [];
    let runs = 0;
    const job = startJob({
      intervalMs: 10,
      task: async () => {
        runs += 1;
        if (runs === 1) throw new Error('database away');
      },
      onError: (e) => errors.push(e),
    });
    await new Promise((r) => setTimeout(r, 120));
    await job.stop();
    expect(errors).toHaveLength(1);
    expect(runs).toBeGreaterThan(1);
  });
});
