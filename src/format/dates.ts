import { format, isValid, parseISO } from 'date-fns';

/**
 * Every date the app shows, in one style ("14 Mar 2026"), the same the PDFs and e-mails use.
 * A calendar date (YYYY-MM-DD: a survey date, a due date) is read as that day wherever the reader
 * is; a timestamp is shown on the reader's own clock. An unreadable value is shown as it came.
 */
function shown(value: string, pattern: string): string {
  const d = parseISO(value);
  return isValid(d) ? format(d, pattern) : value;
}

/** "14 Mar 2026". */
export const formatDay = (value: string) => shown(value, 'd MMM yyyy');
/** "14 Mar 2026, 09:30" (for timestamps). */
export const formatMoment = (iso: string) => shown(iso, 'd MMM yyyy, HH:mm');
/** "Sat 14 Mar 2026", for lists of due dates. */
export const formatWeekday = (value: string) => shown(value, 'EEE d MMM yyyy');
/** "Saturday 14 March 2026", for a heading. */
export const formatLongDay = (value: string) => shown(value, 'EEEE d MMMM yyyy');
/** The reader's today as YYYY-MM-DD. */
export const todayLocal = (now = new Date()) => format(now, 'yyyy-MM-dd');
