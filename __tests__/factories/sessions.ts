import type { Response } from 'supertest';

/** Cookie header for a cookie-authenticated (web) request; the same `csrf` goes in `x-csrf-token`. */
export function sessionCookies(token: string, csrf?: string) {
  return csrf ? `sf_session=${token}; sf_csrf=${csrf}` : `sf_session=${token}`;
}

/** The Set-Cookie lines of a response, by cookie name. */
export function setCookies(res: Response): Record<string, string> {
  const raw = res.headers['set-cookie'] as unknown as string[] | string | undefined;
  const lines = raw === undefined ? [] : Array.isArray(raw) ? raw : [raw];
  return Object.fromEntries(lines.map((line) => [line.slice(0, line.indexOf('=')), line]));
}

/** The value of one cookie in a Set-Cookie line. */
export function cookieValue(line: string | undefined): string | undefined {
  if (!line) return undefined;
  return decodeURIComponent(line.slice(line.indexOf('=') + 1, line.indexOf(';')));
}
