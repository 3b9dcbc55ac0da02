import { addDays } from 'date-fns';
import * as fc from 'fast-check';
import {
  zoneStateItems,
  zoneStates,
  type ClearanceRule,
  type ZoneFindingInput,
  type ZoneRecheckInput,
  type ZoneStatesInput,
  type ZoneTreatmentInput,
} from '@/shared/treatments';

const RULE: ClearanceRule = { cleanChecksRequired: 3, minSpanDays: 365 };
const TREATED_AT = '2026-01-12T09:00:00Z';

const finding = (over: Partial<ZoneFindingInput> = {}): ZoneFindingInput => ({
  zoneKey: 'left-sill',
  date: '2026-01-10',
  createdAt: '2026-01-10T10:00:00Z',
  severity: 2,
  activity: 'active',
  insectEvidence: ['frass-powder', 'exit-holes-round'],
  ...over,
});

const treatment = (over: Partial<ZoneTreatmentInput> = {}): ZoneTreatmentInput => ({
  appliedAt: TREATED_AT,
  zoneKeys: ['left-sill'],
  ...over,
});

/** A re-check done `days` after `from`, at the same time of day. */
const checkAfter = (
  days: number,
  status: ZoneRecheckInput['status'] = 'clean',
  over: Partial<ZoneRecheckInput> = {},
  from = TREATED_AT,
): ZoneRecheckInput => {
  const at = addDays(new Date(from), days).toISOString();
  return {
    zoneKeys: ['left-sill'],
    dueDate: at.slice(0, 10),
    status,
    completedAt: status === 'pending' ? null : at,
    ...over,
  };
};

const history = (over: Partial<ZoneStatesInput>): ZoneStatesInput => ({
  zoneKeys: ['left-sill'],
  findings: [],
  treatments: [],
  rechecks: [],
  ...over,
});

const stateOf = (input: ZoneStatesInput, rule = RULE, timeZone?: string, zone = 'left-sill') =>
  zoneStates(input, rule, timeZone)[zone];

describe('zoneStates before any treatment', () => {
  it('no findings: no evidence', () => {
    expect(stateOf(history({}))).toMatchObject({ state: 'no-evidence', flagged: false });
  });

  it('sound findings only: no evidence', () => {
    const s = stateOf(history({ findings: [finding({ severity: 0, activity: 'inactive' })] }));
    expect(s.state).toBe('no-evidence');
  });

  it('damage without activity is old damage, naming the worst severity', () => {
    const s = stateOf(
      history({
        findings: [
          finding({ severity: 1, activity: 'inactive', insectEvidence: ['exit-holes-round'] }),
          finding({ severity: 3, activity: 'unknown', insectEvidence: [] }),
        ],
      }),
    );
    expect(s).toMatchObject({ state: 'old-damage', flagged: false });
    expect(s.reason).toContain('severity 3');
  });

  it('active insects or active decay: active, not flagged (nothing has failed yet)', () => {
    expect(stateOf(history({ findings: [finding()] }))).toMatchObject({
      state: 'active',
      flagged: false,
    });
    const decay = finding({ insectEvidence: [], severity: 2 });
    expect(stateOf(history({ findings: [decay] })).state).toBe('active');
  });

  it('live insects count as activity even when the activity was left unknown', () => {
    const f = finding({ activity: 'unknown', insectEvidence: ['live-insects'] });
    expect(stateOf(history({ findings: [f] })).state).toBe('active');
  });
});

describe('zoneStates: active → treated → cleared', () => {
  const base = { findings: [finding()], treatments: [treatment()] };

  it('walks the scripted history one re-check at a time', () => {
    const plan = [14, 42, 90, 180, 365];
    const steps = plan.map((_, i) =>
      stateOf(
        history({
          ...base,
          rechecks: plan.map((d, j) => checkAfter(d, j <= i ? 'clean' : 'pending')),
        }),
      ),
    );
    expect(stateOf(history(base)).state).toBe('treated-watching');
    expect(steps.map((s) => s.state)).toEqual([
      'treated-watching',
      'treated-watching',
      'treated-watching', // three clean, but over 90 days only
      'treated-watching',
      'cleared', // the check at 365 days completes the span
    ]);
    expect(steps[4].reason).toContain('5 clean re-checks in a row over 365 days');
    expect(steps[2].reason).toContain('on or after 12 Jan 2027');
    expect(steps[2].reason).toContain('Next re-check due 11 Jul 2026');
  });

  it('is not cleared with N clean re-checks spanning less than D days', () => {
    const rechecks = [checkAfter(100), checkAfter(200), checkAfter(364)];
    expect(stateOf(history({ ...base, rechecks })).state).toBe('treated-watching');
    expect(stateOf(history({ ...base, rechecks: [...rechecks, checkAfter(365)] })).state).toBe(
      'cleared',
    );
  });

  it('is not cleared with fewer than N clean re-checks however long they span', () => {
    const rechecks = [checkAfter(30), checkAfter(400)];
    const s = stateOf(history({ ...base, rechecks }));
    expect(s.state).toBe('treated-watching');
    expect(s.reason).toContain('1 more clean');
  });

  it('the workshop rule decides: 2 clean over 30 days clears under a 2/30 rule', () => {
    const rechecks = [checkAfter(10), checkAfter(30)];
    expect(stateOf(history({ ...base, rechecks }), RULE).state).toBe('treated-watching');
    expect(
      stateOf(history({ ...base, rechecks }), { cleanChecksRequired: 2, minSpanDays: 30 }).state,
    ).toBe('cleared');
  });

  it('is not cleared with a fresh-evidence re-check in between, flagged instead', () => {
    const rechecks = [
      checkAfter(14),
      checkAfter(42, 'fresh-evidence'),
      checkAfter(90),
      checkAfter(180),
      checkAfter(400),
    ];
    const s = stateOf(history({ ...base, rechecks }));
    expect(s).toMatchObject({ state: 'active', flagged: true });
    expect(s.reason).toContain('possible treatment failure — call a licensed operator');
    expect(s.reason).toContain('23 Feb 2026'); // the day of the fresh evidence
  });

  it('clean re-checks of an earlier treatment do not count after a new treatment', () => {
    const second = treatment({ appliedAt: '2027-06-01T08:00:00Z' });
    const rechecks = [checkAfter(100), checkAfter(200), checkAfter(380)];
    expect(stateOf(history({ ...base, rechecks })).state).toBe('cleared');
    const s = stateOf(history({ ...base, treatments: [treatment(), second], rechecks }));
    expect(s.state).toBe('treated-watching');
    expect(s.reason).toContain('Treated on 1 Jun 2027; 0 of 3');
  });

  it('pending re-checks count for nothing', () => {
    const rechecks = [
      checkAfter(100, 'pending'),
      checkAfter(200, 'pending'),
      checkAfter(400, 'pending'),
    ];
    expect(stateOf(history({ ...base, rechecks })).state).toBe('treated-watching');
  });
});

describe('zoneStates: fresh evidence after a treatment', () => {
  const base = { treatments: [treatment()], rechecks: [checkAfter(14)] };

  it('an active finding recorded after the treatment reopens the zone and flags it', () => {
    const fresh = finding({ createdAt: '2026-03-01T10:00:00Z', date: '2026-03-01' });
    const s = stateOf(history({ ...base, findings: [finding(), fresh] }));
    expect(s).toMatchObject({ state: 'active', flagged: true });
    expect(s.reason).toContain('call a licensed operator');
  });

  it('counts by when the finding was recorded, even in an older survey', () => {
    const fresh = finding({ date: '2026-01-10', createdAt: '2026-02-20T10:00:00Z' });
    expect(stateOf(history({ ...base, findings: [fresh] }))).toMatchObject({
      state: 'active',
      flagged: true,
    });
  });

  it('frass recorded after the treatment is fresh unless marked inactive', () => {
    const frass = (activity: string) =>
      finding({ createdAt: '2026-03-01T10:00:00Z', activity, insectEvidence: ['frass-powder'] });
    expect(stateOf(history({ ...base, findings: [frass('unknown')] }))).toMatchObject({
      state: 'active',
      flagged: true,
    });
    expect(stateOf(history({ ...base, findings: [frass('inactive')] })).state).toBe(
      'treated-watching',
    );
    // Before any treatment, frass of unknown activity is old damage, not activity.
    const old = finding({ activity: 'unknown', insectEvidence: ['frass-powder'] });
    expect(stateOf(history({ findings: [old] })).state).toBe('old-damage');
  });

  it('an inactive finding after the treatment (old damage noted) does not reopen it', () => {
    const noted = finding({ createdAt: '2026-03-01T10:00:00Z', activity: 'inactive', severity: 3 });
    expect(stateOf(history({ ...base, findings: [finding(), noted] })).state).toBe(
      'treated-watching',
    );
  });

  it('a treatment after the fresh evidence puts the zone back under watch, unflagged', () => {
    const fresh = finding({ createdAt: '2026-03-01T10:00:00Z' });
    const again = treatment({ appliedAt: '2026-03-05T08:00:00Z' });
    const s = stateOf(
      history({ ...base, findings: [finding(), fresh], treatments: [treatment(), again] }),
    );
    expect(s).toMatchObject({ state: 'treated-watching', flagged: false });
  });

  it('old damage after clearance stays cleared', () => {
    const damaged = finding({ activity: 'inactive', severity: 3, insectEvidence: ['galleries'] });
    const rechecks = [checkAfter(90), checkAfter(180), checkAfter(365)];
    expect(
      stateOf(history({ findings: [damaged], treatments: [treatment()], rechecks })).state,
    ).toBe('cleared');
  });
});

describe('zoneStates: one zone does not affect another', () => {
  const zones = ['left-sill', 'right-sill', 'rear-crossmember'];
  const findings = [finding(), finding({ zoneKey: 'right-sill' })];

  it('a treatment on one zone leaves the other active', () => {
    const states = zoneStates(
      { zoneKeys: zones, findings, treatments: [treatment()], rechecks: [] },
      RULE,
    );
    expect(states['left-sill'].state).toBe('treated-watching');
    expect(states['right-sill']).toMatchObject({ state: 'active', flagged: false });
    expect(states['rear-crossmember'].state).toBe('no-evidence');
  });

  it('re-checks and fresh evidence stay with their own zones', () => {
    const both = treatment({ zoneKeys: ['left-sill', 'right-sill'] });
    const rechecks = [
      checkAfter(100, 'clean', { zoneKeys: ['left-sill', 'right-sill'] }),
      checkAfter(200, 'clean', { zoneKeys: ['left-sill', 'right-sill'] }),
      checkAfter(370, 'clean', { zoneKeys: ['left-sill'] }),
      checkAfter(370, 'fresh-evidence', { zoneKeys: ['right-sill'] }),
    ];
    const states = zoneStates({ zoneKeys: zones, findings, treatments: [both], rechecks }, RULE);
    expect(states['left-sill']).toMatchObject({ state: 'cleared', flagged: false });
    expect(states['right-sill']).toMatchObject({ state: 'active', flagged: true });
    expect(states['rear-crossmember'].state).toBe('no-evidence');
  });

  it('zoneStateItems answers in the order of the zone keys', () => {
    const items = zoneStateItems(
      { zoneKeys: ['right-sill', 'left-sill'], findings, treatments: [treatment()], rechecks: [] },
      RULE,
    );
    expect(items.map((i) => [i.zoneKey, i.state])).toEqual([
      ['right-sill', 'active'],
      ['left-sill', 'treated-watching'],
    ]);
  });
});

describe('zoneStates: calendar days', () => {
  const one = (minSpanDays: number): ClearanceRule => ({ cleanChecksRequired: 1, minSpanDays });
  const at = (appliedAt: string, completedAt: string) =>
    history({
      findings: [finding({ createdAt: '2020-01-01T00:00:00Z' })],
      treatments: [treatment({ appliedAt })],
      rechecks: [{ ...checkAfter(1), completedAt, dueDate: completedAt.slice(0, 10) }],
    });

  it('spans a month end: Jan 31 + 30 days is Mar 2', () => {
    expect(stateOf(at('2026-01-31T12:00:00Z', '2026-03-02T12:00:00Z'), one(30)).state).toBe(
      'cleared',
    );
    const s = stateOf(at('2026-01-31T12:00:00Z', '2026-03-01T12:00:00Z'), one(30));
    expect(s.state).toBe('treated-watching');
    expect(s.reason).toContain('on or after 2 Mar 2026');
  });

  it('spans a leap day: a year from 2028-02-29 is 2029-02-28', () => {
    expect(stateOf(at('2028-02-29T12:00:00Z', '2029-02-28T12:00:00Z'), one(365)).state).toBe(
      'cleared',
    );
    expect(stateOf(at('2028-02-29T12:00:00Z', '2029-02-27T12:00:00Z'), one(365)).state).toBe(
      'treated-watching',
    );
  });

  it('counts days in the workshop time zone (Berlin vs UTC)', () => {
    // Treated 01:30 on 30 March in Berlin (still 29 March in UTC); checked 23:30 on 8 April in Berlin.
    const h = at('2026-03-29T23:30:00Z', '2026-04-08T21:30:00Z');
    expect(stateOf(h, one(10), 'Europe/Berlin').state).toBe('treated-watching');
    expect(stateOf(h, one(10), 'UTC').state).toBe('cleared');
    expect(stateOf(h, one(10), 'Europe/Berlin').reason).toContain('Treated on 30 Mar 2026');
  });

  it('counts days in a US time zone across the DST change', () => {
    // 23:30 CST on 7 March (05:30Z on the 8th), DST starts on the 8th; checked 00:30 CDT on 15 March.
    const h = at('2026-03-08T05:30:00Z', '2026-03-15T05:30:00Z');
    expect(stateOf(h, one(8), 'America/Chicago').state).toBe('cleared');
    expect(stateOf(h, one(8), 'UTC').state).toBe('treated-watching');
  });
});

describe('zoneStates: the clearance rule over any history of clean checks', () => {
  it('clears exactly when N clean checks reach D days; any fresh evidence keeps it active', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: 1, max: 800 }), { maxLength: 8 }),
        fc.integer({ min: 1, max: 5 }),
        fc.integer({ min: 0, max: 700 }),
        fc.option(fc.integer({ min: 0, max: 7 }), { nil: null }),
        (days, needed, span, freshAt) => {
          const sorted = [...days].sort((a, b) => a - b);
          const rechecks = sorted.map((d, i) =>
            checkAfter(d, i === freshAt ? 'fresh-evidence' : 'clean'),
          );
          const rule = { cleanChecksRequired: needed, minSpanDays: span };
          const s = stateOf(
            history({ findings: [finding()], treatments: [treatment()], rechecks }),
            rule,
          );
          const anyFresh = freshAt !== null && freshAt < sorted.length;
          if (anyFresh) {
            expect(s).toMatchObject({ state: 'active', flagged: true });
          } else {
            const clears = sorted.length >= needed && (sorted.at(-1) ?? 0) >= span;
            expect(s.state).toBe(clears ? 'cleared' : 'treated-watching');
            expect(s.flagged).toBe(false);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});
