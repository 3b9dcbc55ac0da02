import { tz, TZDate } from '@date-fns/tz';
import { addDays, differenceInCalendarDays, format, isValid, parseISO } from 'date-fns';
import { DomainError } from '../wood/errors';

const DAY = 'yyyy-MM-dd';

function instant(field: string, at: string | Date): Date {
  const d = typeof at === 'string' ? parseISO(at) : at;
  if (!isValid(d)) throw new DomainError(field, `${field} is not a valid date and time.`);
  return d;
}

function calendarDay(field: string, date: string): TZDate {
  const d = parseISO(date, { in: tz('UTC') });
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || !isValid(d)) {
    throw new DomainError(field, `${field} must be a date as YYYY-MM-DD.`);
  }
  return d;
}

/** The calendar date ('YYYY-MM-DD') of an instant as a clock in `timeZone` shows it. */
export function localDate(at: string | Date, timeZone: string, field = 'at'): string {
  return format(new TZDate(instant(field, at).getTime(), timeZone), DAY);
}

/** `date` plus `days` calendar days (month ends and leap days by date-fns). */
export function addCalendarDays(date: string, days: number, field = 'date'): string {
  return format(addDays(calendarDay(field, date), days), DAY);
}

/** Whole calendar days from `from` to `to` (negative when `to` is earlier). */
export function calendarDaysBetween(from: string, to: string): number {
  return differenceInCalendarDays(calendarDay('to', to), calendarDay('from', from));
}

/** A calendar date ('YYYY-MM-DD') as people write it: '12 Jan 2027' (for sentences, not storage). */
export function spokenDate(date: string, field = 'date'): string {
  return format(calendarDay(field, date), 'd MMM yyyy');
}
