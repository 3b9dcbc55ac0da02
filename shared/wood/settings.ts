import { z } from 'zod';
import { SPECIES_KEYS } from '../body-plans/schema';
import { VERDICT_OPTIONS } from './types';

/**
 * Common practice defaults (rules of thumb of the trade, not published rules); every workshop
 * can change them in its settings.
 */
export const DEFAULT_VERDICT_RULES: VerdictRules = {
  keepMinSectionModulusRatio: 0.9,
  consolidateMinSectionModulusRatio: 0.75,
  spliceMaxAffectedLengthRatio: 0.35,
  jointDamageRulesOutConsolidation: true,
  replaceAssemblyMinMembers: 3,
};

/** Workshop-configurable thresholds: common practice defaults, not published rules. */
export const verdictRulesSchema = z
  .object({
    /** Keep the member when at least this share of its section modulus remains (0–1). */
    keepMinSectionModulusRatio: z.number().min(0).max(1),
    /** Consolidate (harden, fill) when at least this much remains and the damage is local. */
    consolidateMinSectionModulusRatio: z.number().min(0).max(1),
    /** Splice in new wood when the affected length is at most this share of the member length (0–1). */
    spliceMaxAffectedLengthRatio: z.number().min(0).max(1),
    /** Damage at a joint or fitting (hinge, lock, belt or seat mounting) on a structural member → no consolidation. */
    jointDamageRulesOutConsolidation: z.boolean(),
    /** Replace the whole assembly when at least this many of its members need replacement. */
    replaceAssemblyMinMembers: z.number().int().min(1).max(50),
  })
  .refine((r) => r.consolidateMinSectionModulusRatio <= r.keepMinSectionModulusRatio, {
    message: 'The consolidate threshold must not be above the keep threshold',
    path: ['consolidateMinSectionModulusRatio'],
  });
export type VerdictRules = z.infer<typeof verdictRulesSchema>;

/** Hours per operation, common practice defaults for an ash-framed body member. */
export const DEFAULT_HOURS: Record<(typeof VERDICT_OPTIONS)[number], number> = {
  keep: 0.25,
  consolidate: 2,
  splice: 4,
  'replace-member': 8,
  'replace-assembly': 24,
};

export const woodSettingsSchema = z.object({
  verdictRules: verdictRulesSchema,
  /** Scarf slope as 1:N; FAA AC 43.13-1B gives about 1:10 to 1:12 for solid members. */
  scarfSlope: z.number().min(4).max(20),
  hoursPerOperation: z.object(
    Object.fromEntries(VERDICT_OPTIONS.map((o) => [o, z.number().min(0).max(500)])) as Record<
      (typeof VERDICT_OPTIONS)[number],
      z.ZodNumber
    >,
  ),
  /** Price per board foot, rough, by species (workshop currency). */
  timberPricePerBoardFoot: z.object(
    Object.fromEntries(SPECIES_KEYS.map((k) => [k, z.number().min(0).max(10000)])) as Record<
      (typeof SPECIES_KEYS)[number],
      z.ZodNumber
    >,
  ),
  /** Extra timber bought for defects, checks and saw kerf, percent. */
  wasteFactorPercent: z.number().min(0).max(200),
});
export type WoodSettings = z.infer<typeof woodSettingsSchema>;

export const DEFAULT_WOOD_SETTINGS: WoodSettings = {
  verdictRules: DEFAULT_VERDICT_RULES,
  scarfSlope: 10,
  hoursPerOperation: DEFAULT_HOURS,
  timberPricePerBoardFoot: {
    'white-ash': 9,
    'northern-red-oak': 8,
    'white-oak': 11,
    'hard-maple': 9,
    'yellow-poplar': 5,
    'douglas-fir': 6,
  },
  wasteFactorPercent: 30,
};
