import {
  formatDay,
  formatLongDay,
  formatMoment,
  formatWeekday,
  todayLocal,
} from '@/src/format/dates';

// Jest runs in America/New_York (jest.config.js), where midnight UTC is the evening before.
describe('the dates the app shows', () => {
  it('keeps a calendar date on its own day wherever the reader is', () => {
    expect(formatDay('2026-09-01')).toBe('1 Sep 2026');
    expect(formatWeekday('2026-09-01')).toBe('Tue 1 Sep 2026');
    expect(formatLongDay('2026-09-01')).toBe('Tuesday 1 September 2026');
  });

  it('shows a timestamp on the reader’s clock', () => {
    // 02:30 UTC on 1 Sep is 22:30 on 31 Aug in New York (EDT, UTC−4).
    expect(formatDay('2026-09-01T02:30:00.000Z')).toBe('31 Aug 2026');
    expect(formatMoment('2026-09-01T02:30:00.000Z')).toBe('31 Aug 2026, 22:30');
    expect(todayLocal(new Date('2026-09-01T02:30:00.000Z'))).toBe('2026-08-31');
  });

  it('shows an unreadable value as it came instead of “Invalid Date”', () => {
    expect(formatDay('soon')).toBe('soon');
    expect(formatMoment('')).toBe('');
  });
});
