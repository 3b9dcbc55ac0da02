import * as fc from 'fast-check';
import { CONDITION_GRADES } from '@/shared/schemas/report';
import { conditionSummary, isPrimarySound, type ConditionInput } from '@/shared/reports';
import type { DecisionClass, VerdictOption } from '@/shared/wood';
import { reportPlan } from '../factories/report-snapshot';

// Our own five-step scale (shared/reports/condition.ts); its thresholds are common practice.
const plan = reportPlan();
const zoneKeys = plan.zones.map((z) => z.key);
const primaryKeys = plan.zones.filter((z) => z.structuralClass === 'primary').map((z) => z.key);

const CLASS_ORDER: DecisionClass[] = ['cosmetic', 'monitor', 'structural-must-fix'];
const NOT_KEEP: VerdictOption[] = ['consolidate', 'splice', 'replace-member', 'replace-assembly'];

type ZoneDraw = {
  severity: number;
  state: 'no-evidence' | 'treated-watching' | 'active';
  decision: { cls: number; keep: boolean } | null;
};

/** Mostly `usual`, now and then something from `rare`: keeps every grade within reach. */
const mostly = <T>(usual: T, rare: fc.Arbitrary<T>, odds = 10) =>
  fc.oneof({ weight: odds, arbitrary: fc.constant(usual) }, { weight: 1, arbitrary: rare });

const CLEAN: ZoneDraw = { severity: 0, state: 'no-evidence', decision: null };
const damagedZone = fc.record<ZoneDraw>({
  severity: fc.integer({ min: 0, max: 4 }),
  state: mostly('no-evidence' as const, fc.constantFrom('treated-watching', 'active'), 3),
  decision: fc.option(fc.record({ cls: fc.integer({ min: 0, max: 2 }), keep: fc.boolean() })),
});
/** A few damaged zones on an otherwise clean vehicle, or damage anywhere: every grade is reachable. */
const vehicleDraw = fc.oneof(
  fc.array(fc.tuple(fc.nat(zoneKeys.length - 1), damagedZone), { maxLength: 12 }).map((hits) => {
    const draws = zoneKeys.map(() => CLEAN);
    for (const [i, d] of hits) draws[i] = d;
    return draws;
  }),
  fc.array(damagedZone, { minLength: zoneKeys.length, maxLength: zoneKeys.length }),
);

function toInput(draws: ZoneDraw[]): ConditionInput {
  return {
    plan,
    worstSeverity: Object.fromEntries(zoneKeys.map((k, i) => [k, draws[i].severity])),
    zoneStates: zoneKeys.map((zoneKey, i) => ({ zoneKey, state: draws[i].state })),
    decisions: zoneKeys.flatMap((zoneKey, i) => {
      const d = draws[i].decision;
      if (!d) return [];
      const chosenOption: VerdictOption = d.keep ? 'keep' : NOT_KEEP[i % NOT_KEEP.length];
      return [{ zoneKey, decisionClass: CLASS_ORDER[d.cls], chosenOption }];
    }),
  };
}

/** The same vehicle with more damage: worse severities, active states, heavier decisions. */
const worsen = (draws: ZoneDraw[]) =>
  fc
    .array(
      fc.record({
        sev: mostly(0, fc.integer({ min: 1, max: 4 }), 15),
        activate: mostly(false, fc.constant(true), 30),
        cls: mostly(0, fc.integer({ min: 1, max: 2 }), 15),
        dropKeep: mostly(false, fc.constant(true), 15),
      }),
      { minLength: draws.length, maxLength: draws.length },
    )
    .map((bumps) =>
      draws.map((d, i): ZoneDraw => {
        const b = bumps[i];
        return {
          severity: Math.min(4, d.severity + b.sev),
          state: b.activate ? 'active' : d.state,
          decision: d.decision && {
            cls: Math.max(d.decision.cls, b.cls),
            keep: d.decision.keep && !b.dropKeep,
          },
        };
      }),
    );

const rank = (input: ConditionInput) => conditionSummary(input).gradeRank;

describe('conditionSummary', () => {
  it('draws vehicles of every grade, so the properties below are not vacuous', () => {
    const seen = new Set(
      fc
        .sample(vehicleDraw, { numRuns: 400, seed: 7 })
        .map((d) => conditionSummary(toInput(d)).grade),
    );
    expect([...seen].sort()).toEqual([...CONDITION_GRADES].sort());
  });

  it('more damage never gives a better grade (fast-check)', () => {
    fc.assert(
      fc.property(
        vehicleDraw.chain((base) => fc.tuple(fc.constant(base), worsen(base))),
        ([base, worse]) => rank(toInput(worse)) >= rank(toInput(base)),
      ),
      { numRuns: 300 },
    );
  });

  it('a structural must-fix item or an active zone keeps the grade at needs-repair or worse', () => {
    const needsRepair = CONDITION_GRADES.indexOf('needs-repair') + 1;
    fc.assert(
      fc.property(vehicleDraw, (draws) => {
        const input = toInput(draws);
        const s = conditionSummary(input);
        const mustFix = input.decisions.some((d) => d.decisionClass === 'structural-must-fix');
        const active = input.zoneStates.some((z) => z.state === 'active');
        return !(mustFix || active) || s.gradeRank >= needsRepair;
      }),
      { numRuns: 300 },
    );
  });

  it('counts by class, active and watched zones, and the sound share agree with the input', () => {
    fc.assert(
      fc.property(vehicleDraw, (draws) => {
        const input = toInput(draws);
        const s = conditionSummary(input);
        const n = (c: DecisionClass) => input.decisions.filter((d) => d.decisionClass === c).length;
        expect(s.countsByClass).toEqual({
          'structural-must-fix': n('structural-must-fix'),
          cosmetic: n('cosmetic'),
          monitor: n('monitor'),
        });
        expect(s.activeZones).toBe(draws.filter((d) => d.state === 'active').length);
        expect(s.watchedZones).toBe(draws.filter((d) => d.state === 'treated-watching').length);
        expect(s.primaryMembers).toBe(primaryKeys.length);
        expect(s.primarySound).toBe(primaryKeys.filter((k) => isPrimarySound(k, input)).length);
        expect(s.primarySoundShare).toBeCloseTo(s.primarySound / s.primaryMembers, 12);
        expect(s.gradeRank).toBe(CONDITION_GRADES.indexOf(s.grade) + 1);
        expect(s.gradeLabel.length).toBeGreaterThan(0);
      }),
      { numRuns: 100 },
    );
  });

  it('defines a sound primary member: severity ≤ 1, not active, no decision but keep', () => {
    const k = primaryKeys[0];
    const base = { worstSeverity: { [k]: 1 }, decisions: [], zoneStates: [] };
    expect(isPrimarySound(k, base)).toBe(true);
    expect(isPrimarySound(k, { ...base, worstSeverity: { [k]: 2 } })).toBe(false);
    expect(
      isPrimarySound(k, { ...base, zoneStates: [{ zoneKey: k, state: 'active' as const }] }),
    ).toBe(false);
    const decided = (chosenOption: VerdictOption) => ({
      ...base,
      decisions: [{ zoneKey: k, decisionClass: 'monitor' as const, chosenOption }],
    });
    expect(isPrimarySound(k, decided('keep'))).toBe(true);
    expect(isPrimarySound(k, decided('splice'))).toBe(false);
  });

  it('a vehicle with nothing found is sound, with every primary member sound', () => {
    const s = conditionSummary({ plan, worstSeverity: {}, decisions: [], zoneStates: [] });
    expect(s.grade).toBe('sound');
    expect(s.primarySoundShare).toBe(1);
    expect(s.undecidedZones).toBe(0);
  });

  it('counts damaged zones without a decision as undecided, and does not call them sound', () => {
    const k = zoneKeys.find((z) => !primaryKeys.includes(z))!;
    const s = conditionSummary({ plan, worstSeverity: { [k]: 2 }, decisions: [], zoneStates: [] });
    expect(s.undecidedZones).toBe(1);
    expect(s.gradeRank).toBeGreaterThanOrEqual(CONDITION_GRADES.indexOf('needs-repair') + 1);
  });
});
