import { ERROR_CODES } from '@/shared/schemas/common';

/** The one error type the API throws; the error handler turns it into `{ error: { code, message, fields? } }`. */
export class AppError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what = 'Record') =>
  new AppError(404, ERROR_CODES.notFound, `${what} not found.`);
export const forbidden = (message = 'Your role in this workshop does not allow that.') =>
  new AppError(403, ERROR_CODES.forbidden, message);
export const unauthenticated = (message = 'Sign in to continue.') =>
  new AppError(401, ERROR_CODES.unauthenticated, message);
export const staleVersion = (what = 'record') =>
  new AppError(
    409,
    ERROR_CODES.staleVersion,
    `This ${what} was changed by someone else since you loaded it. Reload and apply your change again.`,
  );
export const conflict = (message: string, fields?: Record<string, string>) =>
  new AppError(409, ERROR_CODES.conflict, message, fields);
export const badRequest = (fields: Record<string, string>, message?: string) =>
  new AppError(
    400,
    ERROR_CODES.validation,
    message ?? `Check ${Object.keys(fields).join(', ')}.`,
    fields,
  );
