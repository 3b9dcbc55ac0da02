import * as fc from 'fast-check';
import { DomainError } from '@/shared/wood';
import {
  addCalendarDays,
  calendarDaysBetween,
  DEFAULT_TREATMENT_SETTINGS,
  localDate,
  planGroupFor,
  recheckDueDates,
  spokenDate,
  treatmentSettingsSchema,
  type TreatmentSettings,
} from '@/shared/treatments';
import { fieldOf } from './support/domain-error';

const withPlan = (over: Partial<TreatmentSettings>): TreatmentSettings => ({
  ...DEFAULT_TREATMENT_SETTINGS,
  ...over,
});

describe('DEFAULT_TREATMENT_SETTINGS', () => {
  it('are valid settings', () => {
    expect(treatmentSettingsSchema.safeParse(DEFAULT_TREATMENT_SETTINGS).success).toBe(true);
  });

  it('run the beetle plan over a full year, the first check after two weeks', () => {
    expect(DEFAULT_TREATMENT_SETTINGS.recheckPlans.beetles).toEqual([14, 42, 90, 180, 365]);
    expect(DEFAULT_TREATMENT_SETTINGS.clearance).toEqual({
      cleanChecksRequired: 3,
      minSpanDays: 365,
    });
  });

  it('reject an unknown time zone, offsets out of order and a plan without checks', () => {
    const bad = (over: object) =>
      treatmentSettingsSchema.safeParse({ ...DEFAULT_TREATMENT_SETTINGS, ...over }).success;
    expect(bad({ timeZone: 'Mars/Olympus' })).toBe(false);
    expect(bad({ timeZone: 'America/Chicago' })).toBe(true);
    const plans = DEFAULT_TREATMENT_SETTINGS.recheckPlans;
    expect(bad({ recheckPlans: { ...plans, fungi: [90, 30] } })).toBe(false);
    expect(bad({ recheckPlans: { ...plans, fungi: [30, 30] } })).toBe(false);
    expect(bad({ recheckPlans: { ...plans, fungi: [] } })).toBe(false);
    expect(bad({ recheckPlans: { ...plans, fungi: [0, 30] } })).toBe(false);
  });
});

describe('planGroupFor', () => {
  it('follows the agent whatever the method', () => {
    expect(planGroupFor('anobiid-beetles', 'brush')).toBe('beetles');
    expect(planGroupFor('old-house-borer', 'heat')).toBe('beetles');
    expect(planGroupFor('drywood-termites', 'fumigation')).toBe('termites');
    expect(planGroupFor('subterranean-termites', 'bait')).toBe('termites');
    expect(planGroupFor('brown-rot-fungi', 'spray')).toBe('fungi');
    expect(planGroupFor('carpenter-ants', 'bait')).toBe('ants');
  });

  it('uses the method only when the agent is not known', () => {
    expect(planGroupFor('unknown', 'bait')).toBe('termites');
    expect(planGroupFor('unknown', 'spray')).toBe('other');
    expect(planGroupFor('unknown', 'fumigation')).toBe('other');
  });
});

describe('recheckDueDates', () => {
  it('counts the beetle plan from the treatment date', () => {
    expect(
      recheckDueDates(
        '2026-05-04T09:00:00Z',
        'lyctid-beetles',
        'brush',
        DEFAULT_TREATMENT_SETTINGS,
      ),
    ).toEqual(['2026-05-18', '2026-06-15', '2026-08-02', '2026-10-31', '2027-05-04']);
  });

  it('fumigation of drywood termites starts a week later, then 30 and 90 days', () => {
    expect(
      recheckDueDates(
        '2026-06-10T15:00:00Z',
        'drywood-termites',
        'fumigation',
        DEFAULT_TREATMENT_SETTINGS,
      ).slice(0, 3),
    ).toEqual(['2026-06-17', '2026-07-10', '2026-09-08']);
  });

  it('crosses month ends: Jan 31 + 30 days is Mar 2 (Mar 1 in a leap year)', () => {
    const s = withPlan({
      recheckPlans: { ...DEFAULT_TREATMENT_SETTINGS.recheckPlans, other: [30] },
    });
    expect(recheckDueDates('2026-01-31T12:00:00Z', 'unknown', 'spray', s)).toEqual(['2026-03-02']);
    expect(recheckDueDates('2028-01-31T12:00:00Z', 'unknown', 'spray', s)).toEqual(['2028-03-01']);
  });

  it('crosses a leap day: 2028-02-29 + 365 days is 2029-02-28, + 1 day is 2028-03-01', () => {
    const s = withPlan({
      recheckPlans: { ...DEFAULT_TREATMENT_SETTINGS.recheckPlans, fungi: [1, 365, 366] },
    });
    expect(recheckDueDates('2028-02-29T10:00:00Z', 'white-rot-fungi', 'spray', s)).toEqual([
      '2028-03-01',
      '2029-02-28',
      '2029-03-01',
    ]);
    expect(recheckDueDates('2028-02-28T10:00:00Z', 'white-rot-fungi', 'spray', s)[0]).toBe(
      '2028-02-29',
    );
  });

  it('counts from the local date in the workshop time zone (Berlin, the night DST starts)', () => {
    const appliedAt = '2026-03-29T23:30:00Z'; // 01:30 on 30 March in Berlin (CEST, +02:00)
    const berlin = withPlan({ timeZone: 'Europe/Berlin' });
    const utc = withPlan({ timeZone: 'UTC' });
    expect(recheckDueDates(appliedAt, 'anobiid-beetles', 'brush', berlin)[0]).toBe('2026-04-13');
    expect(recheckDueDates(appliedAt, 'anobiid-beetles', 'brush', utc)[0]).toBe('2026-04-12');
  });

  it('keeps the calendar date across a US DST change (Chicago, 8 March 2026)', () => {
    // 23:30 local on 7 March is 05:30Z on 8 March; a naive UTC date would be a day late.
    const appliedAt = '2026-03-08T05:30:00Z';
    const chicago = withPlan({
      timeZone: 'America/Chicago',
      recheckPlans: { ...DEFAULT_TREATMENT_SETTINGS.recheckPlans, termites: [1, 7] },
    });
    expect(localDate(appliedAt, 'America/Chicago')).toBe('2026-03-07');
    expect(recheckDueDates(appliedAt, 'subterranean-termites', 'bait', chicago)).toEqual([
      '2026-03-08',
      '2026-03-14',
    ]);
    // Back to standard time at 02:00 on 1 November: 04:30Z is still 23:30 CDT on 31 October.
    expect(localDate('2026-11-01T04:30:00Z', 'America/Chicago')).toBe('2026-10-31');
    expect(
      recheckDueDates('2026-11-01T04:30:00Z', 'subterranean-termites', 'bait', chicago),
    ).toEqual(['2026-11-01', '2026-11-07']);
  });

  it('sorts the offsets of a plan given out of order', () => {
    const s = withPlan({
      recheckPlans: { ...DEFAULT_TREATMENT_SETTINGS.recheckPlans, ants: [90, 14, 30] },
    });
    expect(recheckDueDates('2026-07-01T08:00:00Z', 'carpenter-ants', 'bait', s)).toEqual([
      '2026-07-15',
      '2026-07-31',
      '2026-09-29',
    ]);
  });

  it('rejects a date that is not a date, naming the field', () => {
    expect(() =>
      recheckDueDates('not a date', 'lyctid-beetles', 'brush', DEFAULT_TREATMENT_SETTINGS),
    ).toThrow(DomainError);
    expect(
      fieldOf(() =>
        recheckDueDates(
          '2026-13-45T00:00:00Z',
          'lyctid-beetles',
          'brush',
          DEFAULT_TREATMENT_SETTINGS,
        ),
      ),
    ).toBe('appliedAt');
    expect(() => addCalendarDays('2027-02-29', 1)).toThrow(DomainError);
  });

  it('every due date lies the plan offset after the local treatment date (any zone, any instant)', () => {
    const zones = ['UTC', 'Europe/Berlin', 'America/Chicago', 'Pacific/Auckland', 'Asia/Kolkata'];
    fc.assert(
      fc.property(
        fc.date({ min: new Date('2020-01-01'), max: new Date('2035-12-31'), noInvalidDate: true }),
        fc.constantFrom(...zones),
        (at, timeZone) => {
          const iso = at.toISOString();
          const dates = recheckDueDates(iso, 'anobiid-beetles', 'spray', withPlan({ timeZone }));
          const start = localDate(iso, timeZone);
          expect(dates.map((d) => calendarDaysBetween(start, d))).toEqual(
            DEFAULT_TREATMENT_SETTINGS.recheckPlans.beetles,
          );
          expect(dates).toEqual([...dates].sort());
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('spokenDate', () => {
  it.each([
    ['2027-01-12', '12 Jan 2027'],
    ['2028-02-29', '29 Feb 2028'],
    ['2026-12-01', '1 Dec 2026'],
  ])('writes %s as %s (the calendar day, no time zone shift)', (iso, words) => {
    expect(spokenDate(iso)).toBe(words);
  });

  it('refuses a value that is not a calendar date, naming the field', () => {
    expect(() => spokenDate('2027-02-30', 'dueDate')).toThrow(
      'dueDate must be a date as YYYY-MM-DD.',
    );
    expect(() => spokenDate('12/01/2027', 'dueDate')).toThrow(DomainError);
  });
});
