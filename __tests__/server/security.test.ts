import request from 'supertest';
import { User } from '@/server/models';
import { createMember, createWorkshop } from '../factories';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(() => {
  t = buildTestApp();
});
afterEach(() => jest.restoreAllMocks());
afterAll(() => t.close());

describe('response headers', () => {
  it.each([
    ['an API answer', '/api/auth/session'],
    ['an unknown API route', '/api/nope'],
  ])('carry helmet headers on %s', async (_label, url) => {
    const res = await request(t.app).get(url);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('share links and verification stay out of search engines', () => {
  it.each([
    ['the share page', '/shared/k7dQ2mX9vN4pR8sT1wY6zB3cF5gH0jL2aE9uI7oP4qW', 'text/html'],
    [
      'a share answer',
      '/api/public/shares/k7dQ2mX9vN4pR8sT1wY6zB3cF5gH0jL2aE9uI7oP4qW',
      'application/json',
    ],
    ['a verification answer', '/api/public/verify/SF-0000-0000', 'application/json'],
  ])('%s carries X-Robots-Tag: noindex', async (_label, url, accept) => {
    const res = await request(t.app).get(url).set('Accept', accept);
    expect(res.headers['x-robots-tag']).toBe('noindex, nofollow');
  });

  it('other pages of the app do not', async () => {
    const res = await request(t.app).get('/vehicles').set('Accept', 'text/html');
    expect(res.headers['x-robots-tag']).toBeUndefined();
  });
});

describe('error answers', () => {
  it('answers an unknown /api path with a JSON 404, not the web app', async () => {
    const res = await request(t.app).get('/api/nope').set('Accept', 'text/html').expect(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'API route not found.' } });
  });

  it('answers a malformed JSON body with a plain 400', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@example.test", "password": ')
      .expect(400);
    expect(res.body).toEqual({
      error: {
        code: 'validation_failed',
        message: 'The request body is not valid JSON.',
        fields: { body: 'Not valid JSON' },
      },
    });
    expect(res.text).not.toMatch(/SyntaxError|at .*\.js|node_modules/);
  });

  it('answers a body over the limit with 413', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'a@example.test', password: 'x'.repeat(300 * 1024) }))
      .expect(413);
    expect(res.body.error.code).toBe('too_large');
  });

  it('answers an unexpected failure with a 500 that leaks no message or stack', async () => {
    const { auth } = await createMember(t.config, await createWorkshop(), 'owner');
    jest
      .spyOn(User, 'findByPk')
      .mockRejectedValueOnce(new Error('connect ECONNREFUSED db-secret-host:3306'));
    jest.spyOn(console, 'error').mockImplementation(() => undefined);
    const res = await request(t.app).get('/api/auth/session').set(auth).expect(500);
    expect(res.body).toEqual({
      error: { code: 'internal_error', message: 'Something went wrong on our side.' },
    });
    expect(res.text).not.toMatch(/ECONNREFUSED|db-secret-host|stack|\.ts:/);
  });
});
