import { getBodyPlan, getZone } from '@/shared/body-plans';
import {
  assessMember,
  DEFAULT_WOOD_SETTINGS,
  recommendVerdict,
  residualSection,
  scarfLength,
} from '@/shared/wood';

// assessMember is what both the client preview and the server's stored verdict call.
const plan = getBodyPlan('estate-timber')!;
const zone = getZone(plan, 'sill-left')!;
const context = {
  structuralClass: zone.structuralClass,
  worstSeverity: 3,
  activeAgent: false,
  assemblyMembersNeedingReplacement: 0,
};

describe('assessMember', () => {
  it('combines residualSection and recommendVerdict with the workshop scarf slope', () => {
    const m = {
      widthMm: 55,
      depthMm: 110,
      decayMm: { top: 20, left: 5 },
      affectedLengthMm: 300,
      memberLengthMm: 1800,
      atJointOrFitting: false,
    };
    const { section, verdictInput, verdict } = assessMember(m, context, DEFAULT_WOOD_SETTINGS);
    expect(section).toEqual(residualSection({ width: 55, depth: 110, decay: m.decayMm }));
    // 110 mm deep at 1:10 → 1100 mm scarf (FAA AC 43.13-1B slope convention).
    expect(verdictInput.scarfLengthMm).toBe(scarfLength(110, 10));
    expect(verdict).toEqual(recommendVerdict(verdictInput, DEFAULT_WOOD_SETTINGS.verdictRules));
  });

  it('turns a splice whose scarfs do not fit the member into a replacement', () => {
    const base = {
      widthMm: 40,
      depthMm: 45,
      decayMm: { top: 20 },
      affectedLengthMm: 100,
      atJointOrFitting: false,
    };
    const long = assessMember({ ...base, memberLengthMm: 3000 }, context, DEFAULT_WOOD_SETTINGS);
    expect(long.verdict.option).toBe('splice');
    // 100 mm of damage + 2 × 450 mm scarfs = 1000 mm of new wood: more than a 520 mm stile.
    const short = assessMember({ ...base, memberLengthMm: 520 }, context, DEFAULT_WOOD_SETTINGS);
    expect(short.verdict.option).toBe('replace-member');
  });
});
