import { z } from 'zod';

export const PLAN_GROUPS = ['beetles', 'termites', 'fungi', 'ants', 'other'] as const;
export type PlanGroup = (typeof PLAN_GROUPS)[number];

export const PLAN_GROUP_LABELS: Record<PlanGroup, string> = {
  beetles: 'Wood-boring beetles',
  termites: 'Termites',
  fungi: 'Decay fungi',
  ants: 'Carpenter ants',
  other: 'Other or not known',
};

/** True when the runtime knows the IANA time zone name. */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return true;
  } catch {
    return false;
  }
}

/** Days after the treatment date, each a re-check. */
const planOffsets = z
  .array(z.number().int().min(1, 'A re-check is at least one day after').max(3650))
  .min(1, 'A plan needs at least one re-check')
  .max(20)
  .refine((days) => days.every((d, i) => i === 0 || d > days[i - 1]), {
    message: 'List the days in increasing order, each once',
  });

export const clearanceRuleSchema = z.object({
  cleanChecksRequired: z.number().int().min(1).max(20),
  minSpanDays: z.number().int().min(0).max(3650),
});
export type ClearanceRule = z.infer<typeof clearanceRuleSchema>;

export const treatmentSettingsSchema = z.object({
  recheckPlans: z.object(
    Object.fromEntries(PLAN_GROUPS.map((g) => [g, planOffsets])) as Record<
      PlanGroup,
      typeof planOffsets
    >,
  ),
  clearance: clearanceRuleSchema,
  /** Due dates are calendar days in this zone (IANA name). */
  timeZone: z.string().refine(isTimeZone, 'Choose a known time zone, e.g. Europe/Berlin'),
  /** The owner's notes on local rules, shown beside the cautions. */
  regulatoryNotes: z.string().trim().max(4000),
});
export type TreatmentSettings = z.infer<typeof treatmentSettingsSchema>;

/**
 * Common practice defaults (rules of thumb of the trade, not published rules); every workshop
 * can change them. Beetles may keep emerging for months after a surface treatment, so their
 * plan runs a full year, the first check once the old frass has been cleaned away; drywood
 * termites can survive up to a week after fumigation, hence a first termite check at 7 days.
 * Every plan reaches a year so that the default clearance rule (3 clean checks over 365 days) can be met.
 */
export const DEFAULT_TREATMENT_SETTINGS: TreatmentSettings = {
  recheckPlans: {
    beetles: [14, 42, 90, 180, 365],
    termites: [7, 30, 90, 180, 365],
    fungi: [30, 90, 180, 365],
    ants: [14, 30, 90, 365],
    other: [30, 90, 180, 365],
  },
  clearance: { cleanChecksRequired: 3, minSpanDays: 365 },
  timeZone: 'UTC',
  regulatoryNotes: '',
};
