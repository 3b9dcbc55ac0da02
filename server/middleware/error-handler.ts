import type { NextFunction, Request, Response } from 'express';
import {
  OptimisticLockError,
  UniqueConstraintError,
  ValidationError as SequelizeValidationError,
} from 'sequelize';
import { ZodError } from 'zod';
import { ERROR_CODES } from '@/shared/schemas/common';
import { DomainError } from '@/shared/wood/errors';
import { AppError } from '../errors';

type Body = { error: { code: string; message: string; fields?: Record<string, string> } };

/** Field path → message, e.g. `moisture.meterReading`; the root path is `body`. */
export function zodFields(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : 'body';
    fields[key] ??= issue.message;
  }
  return fields;
}

function toResponse(err: unknown): { status: number; body: Body } {
  if (err instanceof AppError)
    return {
      status: err.status,
      body: { error: { code: err.code, message: err.message, fields: err.fields } },
    };
  // A wood-science function refused its input: the caller's data, not a fault on our side.
  if (err instanceof DomainError)
    return {
      status: 400,
      body: {
        error: {
          code: ERROR_CODES.validation,
          message: err.message,
          fields: { [err.field]: err.message },
        },
      },
    };
  if (err instanceof ZodError) {
    const fields = zodFields(err);
    return {
      status: 400,
      body: {
        error: {
          code: ERROR_CODES.validation,
          message: `Check ${Object.keys(fields).join(', ')}.`,
          fields,
        },
      },
    };
  }
  if (err instanceof OptimisticLockError)
    return {
      status: 409,
      body: {
        error: {
          code: ERROR_CODES.staleVersion,
          message: 'This record was changed by someone else. Reload and try again.',
        },
      },
    };
  if (err instanceof UniqueConstraintError) {
    const fields = Object.fromEntries(err.errors.map((e) => [e.path ?? 'id', 'Already in use']));
    return {
      status: 409,
      body: { error: { code: ERROR_CODES.conflict, message: 'That already exists.', fields } },
    };
  }
  if (err instanceof SequelizeValidationError) {
    const fields = Object.fromEntries(err.errors.map((e) => [e.path ?? 'body', e.message]));
    return {
      status: 400,
      body: {
        error: { code: ERROR_CODES.validation, message: 'Check the highlighted fields.', fields },
      },
    };
  }
  const e = err as { type?: string; status?: number };
  if (e?.type === 'entity.too.large')
    return {
      status: 413,
      body: { error: { code: ERROR_CODES.tooLarge, message: 'The request body is too large.' } },
    };
  if (e?.type === 'entity.parse.failed')
    return {
      status: 400,
      body: {
        error: {
          code: ERROR_CODES.validation,
          message: 'The request body is not valid JSON.',
          fields: { body: 'Not valid JSON' },
        },
      },
    };
  return {
    status: 500,
    body: { error: { code: ERROR_CODES.internal, message: 'Something went wrong on our side.' } },
  };
}

/** The one error handler: every error leaves as `{ error: { code, message, fields? } }`; no stack leaks. */
export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  const { status, body } = toResponse(err);
  if (status >= 500 && process.env.NODE_ENV !== 'test')
    console.error(`[${req.method} ${req.originalUrl}]`, err);
  if (status >= 500 && process.env.NODE_ENV === 'test') console.error(err);
  if (res.headersSent) return;
  res.status(status).json(body);
}
