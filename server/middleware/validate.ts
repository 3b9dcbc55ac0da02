import type { NextFunction, Request, Response } from 'express';
import type { z } from 'zod';

/**
 * Parses the body and/or query with shared zod schemas. The parsed body replaces `req.body`;
 * the parsed query goes to `res.locals.query` (Express 5's `req.query` is read-only).
 * A ZodError reaches the error handler, which answers 400 naming the fields.
 */
export function validate(schemas: { body?: z.ZodType; query?: z.ZodType }) {
  return (req: Request, res: Response, next: NextFunction) => {
    if (schemas.body) req.body = schemas.body.parse(req.body ?? {});
    if (schemas.query) res.locals.query = schemas.query.parse(req.query ?? {});
    next();
  };
}

export function queryOf<T>(res: Response): T {
  return res.locals.query as T;
}
