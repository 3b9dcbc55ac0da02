import * as fc from 'fast-check';
import { STRUCTURAL_CLASSES } from '@/shared/body-plans';
import {
  DEFAULT_VERDICT_RULES,
  recommendVerdict,
  verdictRank,
  verdictRulesSchema,
  type VerdictInput,
  type VerdictRules,
} from '@/shared/wood';
import { fieldOf } from './support/domain-error';

const sound: VerdictInput = {
  structuralClass: 'primary',
  sectionModulusRatio: 1,
  areaRatio: 1,
  affectedLengthMm: 0,
  memberLengthMm: 1800,
  atJointOrFitting: false,
  severity: 0,
  activeAgent: false,
  assemblyMembersNeedingReplacement: 0,
};

function verdict(partial: Partial<VerdictInput>, rules?: VerdictRules) {
  return recommendVerdict({ ...sound, ...partial }, rules);
}

// The default thresholds are common practice (keep ≥ 90 %, consolidate ≥ 75 % of the section
// modulus, splice up to 35 % of the length, 3 members → assembly), not published rules.
describe('recommendVerdict with the default (common practice) rules', () => {
  it('keeps a sound primary member and says to monitor it', () => {
    const v = verdict({});
    expect(v.option).toBe('keep');
    expect(v.decisionClass).toBe('monitor');
    expect(v.reasons[0]).toMatch(/100 % of the section modulus remains/);
  });

  it('consolidates when 78 % of the section modulus remains, and says so with the numbers', () => {
    const v = verdict({
      sectionModulusRatio: 0.78,
      areaRatio: 0.88,
      affectedLengthMm: 200,
      severity: 2,
    });
    expect(v.option).toBe('consolidate');
    expect(v.decisionClass).toBe('structural-must-fix');
    expect(v.reasons[0]).toBe(
      '78 % of the section modulus remains (88 % of the area): below the 90 % to keep it as it is, at least the 75 % to consolidate.',
    );
  });

  it('never rounds a ratio up to a threshold it missed', () => {
    const v = verdict({ sectionModulusRatio: 0.8999, areaRatio: 0.95 });
    expect(v.option).toBe('consolidate');
    expect(v.reasons[0]).toMatch(/^89 % of the section modulus remains/);
    expect(verdict({ sectionModulusRatio: 0.5, areaRatio: 0.7 }).reasons[0]).toMatch(/^50 %/);
  });

  it('shows a decimal where whole percents would hide which side of a threshold a ratio is on', () => {
    // 631 of 1800 mm is 35.06 %: over the 35 % splice limit, shown as 35.1 %, not "35 % … more than 35 %".
    const v = verdict({ sectionModulusRatio: 0.5, areaRatio: 0.7, affectedLengthMm: 631 });
    expect(v.option).toBe('replace-member');
    expect(v.reasons.join(' ')).toMatch(/35\.1 % of the member, more than the 35 %/);
  });

  it('splices when less than 75 % remains over a short length', () => {
    const v = verdict({ sectionModulusRatio: 0.5, areaRatio: 0.7, affectedLengthMm: 300 });
    expect(v.option).toBe('splice');
    expect(v.reasons.join(' ')).toMatch(/16 % of the member, within the 35 %/);
  });

  it('replaces the member when the affected length is more than 35 % of it', () => {
    const v = verdict({ sectionModulusRatio: 0.5, areaRatio: 0.7, affectedLengthMm: 900 });
    expect(v.option).toBe('replace-member');
    expect(v.reasons.join(' ')).toMatch(/50 % of the member, more than the 35 %/);
  });

  it('rules out consolidation at a joint or fitting of a structural member, not of a panel', () => {
    const atJoint = {
      sectionModulusRatio: 0.8,
      areaRatio: 0.9,
      affectedLengthMm: 150,
      atJointOrFitting: true,
    };
    expect(verdict(atJoint).option).toBe('splice');
    expect(verdict(atJoint).reasons.join(' ')).toMatch(/joint or fitting/);
    expect(verdict({ ...atJoint, structuralClass: 'non-structural' }).option).toBe('consolidate');
    const lenient = { ...DEFAULT_VERDICT_RULES, jointDamageRulesOutConsolidation: false };
    expect(verdict(atJoint, lenient).option).toBe('consolidate');
  });

  it('replaces the assembly when this makes three members of it to replace', () => {
    const long = { sectionModulusRatio: 0.3, areaRatio: 0.5, affectedLengthMm: 1200 };
    expect(verdict({ ...long, assemblyMembersNeedingReplacement: 1 }).option).toBe(
      'replace-member',
    );
    const v = verdict({ ...long, assemblyMembersNeedingReplacement: 2 });
    expect(v.option).toBe('replace-assembly');
    expect(v.reasons.join(' ')).toMatch(/3 members of the assembly/);
  });

  it('replaces the member when a splice with its scarfs would be longer than the member', () => {
    // A 600 mm door rail, 50 mm deep, 100 mm affected: scarfs of 500 mm at 1:10 need 1100 mm of new wood.
    const rail = {
      sectionModulusRatio: 0.5,
      areaRatio: 0.7,
      affectedLengthMm: 100,
      memberLengthMm: 600,
    };
    expect(verdict(rail).option).toBe('splice');
    const v = verdict({ ...rail, scarfLengthMm: 500 });
    expect(v.option).toBe('replace-member');
    expect(v.reasons.join(' ')).toMatch(/1100 mm of new wood/);
    expect(verdict({ ...rail, scarfLengthMm: 200 }).option).toBe('splice');
  });

  it('does not let a lost member (severity 4) be kept or merely consolidated', () => {
    expect(verdict({ severity: 4, affectedLengthMm: 200 }).option).toBe('splice');
    expect(verdict({ severity: 3 }).option).toBe('consolidate');
  });

  it('classes non-structural work as cosmetic, and a kept member with an active agent as monitor', () => {
    const panel = { structuralClass: 'non-structural' as const };
    expect(
      verdict({ ...panel, sectionModulusRatio: 0.4, areaRatio: 0.6, affectedLengthMm: 100 })
        .decisionClass,
    ).toBe('cosmetic');
    expect(verdict(panel).decisionClass).toBe('cosmetic');
    const v = verdict({ ...panel, activeAgent: true });
    expect(v.decisionClass).toBe('monitor');
    expect(v.reasons.join(' ')).toMatch(/still active/);
    expect(
      verdict({ structuralClass: 'secondary', sectionModulusRatio: 0.6, areaRatio: 0.8 })
        .decisionClass,
    ).toBe('structural-must-fix');
  });

  it('always says the thresholds are common practice the workshop can change', () => {
    for (const v of [
      verdict({}),
      verdict({ sectionModulusRatio: 0.2, areaRatio: 0.4, affectedLengthMm: 1500 }),
    ]) {
      expect(v.reasons[v.reasons.length - 1]).toMatch(/common practice/);
      expect(v.reasons[v.reasons.length - 1]).toMatch(/not published rules/);
    }
  });

  it('follows the workshop’s own thresholds', () => {
    const strict: VerdictRules = {
      ...DEFAULT_VERDICT_RULES,
      keepMinSectionModulusRatio: 0.95,
      consolidateMinSectionModulusRatio: 0.9,
    };
    expect(
      verdict({ sectionModulusRatio: 0.92, areaRatio: 0.96, affectedLengthMm: 100 }).option,
    ).toBe('keep');
    expect(
      verdict({ sectionModulusRatio: 0.92, areaRatio: 0.96, affectedLengthMm: 100 }, strict).option,
    ).toBe('consolidate');
  });

  it.each([
    ['sectionModulusRatio', { sectionModulusRatio: 1.2 }],
    ['sectionModulusRatio', { sectionModulusRatio: Number.NaN }],
    ['areaRatio', { areaRatio: -0.1 }],
    ['affectedLengthMm', { affectedLengthMm: -5 }],
    ['memberLengthMm', { memberLengthMm: 0 }],
    ['severity', { severity: 7 }],
    ['scarfLengthMm', { scarfLengthMm: -1 }],
    ['structuralClass', { structuralClass: 'load-bearing' as never }],
  ])('rejects a bad %s', (field, partial) => {
    expect(fieldOf(() => verdict(partial))).toBe(field);
  });

  it('rejects rules with the consolidate threshold above the keep threshold', () => {
    const bad = { ...DEFAULT_VERDICT_RULES, consolidateMinSectionModulusRatio: 0.95 };
    expect(fieldOf(() => verdict({}, bad))).toBe('rules.consolidateMinSectionModulusRatio');
  });
});

describe('recommendVerdict never gets milder as damage grows, all else equal (property)', () => {
  const ratio = fc.double({ min: 0, max: 1, noNaN: true });
  const inputArb = fc.record({
    structuralClass: fc.constantFrom(...STRUCTURAL_CLASSES),
    sectionModulusRatio: ratio,
    areaRatio: ratio,
    affectedLengthMm: fc.double({ min: 0, max: 3000, noNaN: true }),
    memberLengthMm: fc.double({ min: 100, max: 3000, noNaN: true }),
    atJointOrFitting: fc.boolean(),
    severity: fc.integer({ min: 0, max: 4 }),
    activeAgent: fc.boolean(),
    assemblyMembersNeedingReplacement: fc.integer({ min: 0, max: 6 }),
    scarfLengthMm: fc.option(fc.double({ min: 0, max: 1500, noNaN: true })),
  });
  const rulesArb = fc
    .record({
      keepMinSectionModulusRatio: ratio,
      consolidateMinSectionModulusRatio: ratio,
      spliceMaxAffectedLengthRatio: ratio,
      jointDamageRulesOutConsolidation: fc.boolean(),
      replaceAssemblyMinMembers: fc.integer({ min: 1, max: 6 }),
    })
    .map((r) => ({
      ...r,
      keepMinSectionModulusRatio: Math.max(
        r.keepMinSectionModulusRatio,
        r.consolidateMinSectionModulusRatio,
      ),
      consolidateMinSectionModulusRatio: Math.min(
        r.keepMinSectionModulusRatio,
        r.consolidateMinSectionModulusRatio,
      ),
    }));

  const worse: Record<string, (i: VerdictInput, k: number) => VerdictInput> = {
    'section modulus ratio falls': (i, k) => ({
      ...i,
      sectionModulusRatio: i.sectionModulusRatio * k,
    }),
    'affected length grows': (i, k) => ({
      ...i,
      affectedLengthMm: i.affectedLengthMm + (1 - k) * 2000,
    }),
    'joint damage appears': (i) => ({ ...i, atJointOrFitting: true }),
    'severity rises': (i, k) => ({
      ...i,
      severity: Math.min(4, i.severity + Math.ceil((1 - k) * 4)),
    }),
    'more assembly members need replacing': (i, k) => ({
      ...i,
      assemblyMembersNeedingReplacement:
        i.assemblyMembersNeedingReplacement + Math.ceil((1 - k) * 3),
    }),
  };

  it.each(Object.keys(worse))('when the %s', (name) => {
    fc.assert(
      fc.property(
        inputArb,
        rulesArb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        (input, rules, k) => {
          expect(verdictRulesSchema.safeParse(rules).success).toBe(true);
          const before = recommendVerdict(input, rules);
          const after = recommendVerdict(worse[name](input, k), rules);
          expect(verdictRank(after.option)).toBeGreaterThanOrEqual(verdictRank(before.option));
        },
      ),
      { numRuns: 300 },
    );
  });
});
