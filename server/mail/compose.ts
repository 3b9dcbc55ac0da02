import { ERROR_CODES } from '@/shared/schemas/common';
import { AppError } from '../errors';

/** Text for an HTML mail body or attribute. */
export const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The mail server refused or was unreachable; `message` says what was (not) saved. */
export const mailFailed = (message: string) => new AppError(502, ERROR_CODES.internal, message);
