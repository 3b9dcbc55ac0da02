import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { outboxMessage } from '@/shared/schemas/workshop';
import { createWorkshopWithTeam, unique } from '../factories';
import {
  buildTestApp,
  buildTestAppWithMail,
  type TestApp,
  type TestAppWithMail,
} from './support/test-app';

const PRODUCTION = { NODE_ENV: 'production', JWT_SECRET: 'p'.repeat(40) };

let t: TestAppWithMail;
const apps: TestApp[] = [];
beforeAll(async () => {
  t = await buildTestAppWithMail();
});
// The apps of one file share the models (bound to the newest), so they all close at the end.
afterAll(async () => {
  for (const a of apps) await a.close();
  await t.close();
});

function app(overrides: Record<string, string>) {
  const a = buildTestApp(overrides);
  apps.push(a);
  return a.app;
}

describe('GET /api/dev/outbox', () => {
  it('lists what the sink received, newest first, with the links, without a sign-in', async () => {
    const { workshop, owner } = await createWorkshopWithTeam(t.config);
    const first = `${unique('first')}@example.test`;
    const second = `${unique('second')}@example.test`;
    for (const email of [first, second])
      await request(t.app)
        .post(`/api/workshops/${workshop.id}/invitations`)
        .set(owner.auth)
        .send({ email, role: 'client' })
        .expect(201);

    const res = await request(t.app).get('/api/dev/outbox').expect(200);
    const items = res.body.items.map((i: unknown) => outboxMessage.parse(i));
    const mine = items.filter(
      (m: { to: string[] }) => m.to.includes(first) || m.to.includes(second),
    );
    expect(mine.map((m: { to: string[] }) => m.to)).toEqual([[second], [first]]);
    expect(mine[0].subject).toContain(workshop.name);
    expect(mine[0].links).toEqual([expect.stringMatching(/\/invitation\/[A-Za-z0-9_-]{43}$/)]);
  });

  it('answers an empty list before any mail arrived', async () => {
    const empty = app({ MAIL_SINK_DIR: path.join(os.tmpdir(), unique('sf-no-mail')) });
    const res = await request(empty).get('/api/dev/outbox').expect(200);
    expect(res.body).toEqual({ items: [] });
  });

  it.each<[string, Record<string, string>]>([
    ['in production', { ...PRODUCTION }],
    ['in production even when OUTBOX_ENABLED=1', { ...PRODUCTION, OUTBOX_ENABLED: '1' }],
    ['with OUTBOX_ENABLED=0', { OUTBOX_ENABLED: '0' }],
  ])('answers a JSON 404 %s', async (_label, overrides) => {
    const res = await request(app({ ...overrides, MAIL_SINK_DIR: t.mailDir }))
      .get('/api/dev/outbox')
      .expect(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'not_found', message: expect.any(String) } });
  });
});
