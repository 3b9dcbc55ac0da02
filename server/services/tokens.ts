import crypto from 'node:crypto';

/** What newLinkToken makes (32 random bytes, base64url): anything else is refused before a lookup. */
export const LINK_TOKEN_FORMAT = /^[A-Za-z0-9_-]{43}$/;

/** The secret of an e-mailed link (invitation, report share). */
export const newLinkToken = () => crypto.randomBytes(32).toString('base64url');

/** Only this digest is stored; the token itself exists only in the link. */
export const hashLinkToken = (token: string) =>
  crypto.createHash('sha256').update(token, 'utf8').digest('hex');
