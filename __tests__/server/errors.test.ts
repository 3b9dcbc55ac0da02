import express from 'express';
import {
  OptimisticLockError,
  UniqueConstraintError,
  ValidationError,
  ValidationErrorItem,
} from 'sequelize';
import request from 'supertest';
import { z } from 'zod';
import {
  AppError,
  badRequest,
  forbidden,
  notFound,
  staleVersion,
  unauthenticated,
} from '@/server/errors';
import { errorHandler } from '@/server/middleware/error-handler';
import { validate } from '@/server/middleware/validate';

/** Sequelize's own error item, as the driver layer builds it for a failed column. */
const item = (
  message: string,
  type: 'unique violation' | 'validation error',
  path: string,
  value: string,
) => new ValidationErrorItem(message, type, path, value, undefined as never, '', '', []);

/** A bare app whose routes throw each kind of error at the one error handler. */
function appThrowing(errors: Record<string, () => unknown>) {
  const app = express();
  app.use(express.json());
  app.post(
    '/validated',
    validate({
      body: z.object({
        name: z.string().min(2, 'Too short'),
        moisture: z.object({ meterReading: z.number() }),
      }),
    }),
    (_req, res) => {
      res.json({ ok: true });
    },
  );
  for (const [name, make] of Object.entries(errors))
    app.get(`/${name}`, async () => {
      throw make();
    });
  app.use(errorHandler);
  return app;
}

const app = appThrowing({
  zod: () => z.object({ year: z.number() }).parse({ year: 'old' }),
  'zod-root': () => z.string().parse(42),
  optimistic: () =>
    new OptimisticLockError({ message: 'stale', modelName: 'Finding', values: {}, where: {} }),
  unique: () =>
    new UniqueConstraintError({
      errors: [item('email must be unique', 'unique violation', 'email', 'a@example.test')],
    }),
  sequelizeValidation: () =>
    new ValidationError('bad', [
      item('Validation isIn on stage failed', 'validation error', 'stage', 'nowhere'),
    ]),
  app: () => new AppError(418, 'teapot', 'Short and stout.', { spout: 'Tip me over' }),
  notFound: () => notFound('Vehicle'),
  forbidden: () => forbidden(),
  unauthenticated: () => unauthenticated(),
  stale: () => staleVersion('finding'),
  badRequest: () => badRequest({ year: 'Enter a year' }),
  unknown: () => new Error('ER_ACCESS_DENIED for user root at /srv/secret/path.ts:12'),
  thrownString: () => 'just a string',
});

beforeEach(() => {
  jest.spyOn(console, 'error').mockImplementation(() => undefined);
});
afterEach(() => jest.restoreAllMocks());

describe('errorHandler', () => {
  it('maps a ZodError to 400 naming each field by its path', async () => {
    const res = await request(app).get('/zod').expect(400);
    expect(res.body).toEqual({
      error: {
        code: 'validation_failed',
        message: 'Check year.',
        fields: { year: expect.any(String) },
      },
    });
  });

  it('names the root of a non-object ZodError "body"', async () => {
    const res = await request(app).get('/zod-root').expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['body']);
  });

  it('reports nested paths from validate() with dots', async () => {
    const res = await request(app)
      .post('/validated')
      .send({ name: 'x', moisture: { meterReading: 'high' } })
      .expect(400);
    expect(res.body.error.fields).toEqual({
      name: 'Too short',
      'moisture.meterReading': expect.any(String),
    });
    await request(app)
      .post('/validated')
      .send({ name: 'ok', moisture: { meterReading: 18 } })
      .expect(200);
  });

  it('maps OptimisticLockError to 409 stale_version', async () => {
    const res = await request(app).get('/optimistic').expect(409);
    expect(res.body.error.code).toBe('stale_version');
    expect(res.body.error.message).toMatch(/changed by someone else/);
  });

  it('maps UniqueConstraintError to 409 conflict naming the column', async () => {
    const res = await request(app).get('/unique').expect(409);
    expect(res.body.error).toEqual({
      code: 'conflict',
      message: 'That already exists.',
      fields: { email: 'Already in use' },
    });
  });

  it('maps a Sequelize ValidationError to 400 naming the column', async () => {
    const res = await request(app).get('/sequelizeValidation').expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields)).toEqual(['stage']);
  });

  it.each([
    ['app', 418, 'teapot'],
    ['notFound', 404, 'not_found'],
    ['forbidden', 403, 'forbidden'],
    ['unauthenticated', 401, 'unauthenticated'],
    ['stale', 409, 'stale_version'],
    ['badRequest', 400, 'validation_failed'],
  ])('passes an AppError (%s) through with its status and code', async (name, status, code) => {
    const res = await request(app).get(`/${name}`).expect(status);
    expect(res.body.error.code).toBe(code);
    expect(typeof res.body.error.message).toBe('string');
  });

  it('keeps the fields of an AppError', async () => {
    const res = await request(app).get('/app').expect(418);
    expect(res.body.error.fields).toEqual({ spout: 'Tip me over' });
  });

  it.each(['unknown', 'thrownString'])(
    'answers anything else (%s) with a 500 that leaks nothing',
    async (name) => {
      const res = await request(app).get(`/${name}`).expect(500);
      expect(res.body).toEqual({
        error: { code: 'internal_error', message: 'Something went wrong on our side.' },
      });
      expect(res.text).not.toMatch(/ER_ACCESS_DENIED|secret|stack|just a string/);
    },
  );
});
