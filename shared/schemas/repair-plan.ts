import { z } from 'zod';
import { isoDate } from './common';
import { conditionSummarySchema } from './report';
import { UNITS } from './workshop';

/** One member decision as the repair plan lists it. */
export const repairPlanItem = z.object({
  zoneKey: z.string(),
  zoneLabel: z.string(),
  verdictLabel: z.string(),
  reasons: z.array(z.string()),
  worstSeverity: z.number(),
  hours: z.number(),
  totalCost: z.number(),
  /** Board feet to buy, waste included. */
  boardFeet: z.number(),
});
export type RepairPlanItem = z.infer<typeof repairPlanItem>;

const classTotals = z.object({ count: z.number(), hours: z.number(), totalCost: z.number() });

/**
 * GET /api/workshops/:wid/vehicles/:vid/repair-plan: the repair scope as it stands now (the same
 * model the repair-scope PDF prints), for planning the work and buying timber before a report.
 */
export const repairPlanResponse = z.object({
  condition: conditionSummarySchema,
  structural: z.array(repairPlanItem),
  cosmetic: z.array(repairPlanItem),
  monitor: z.array(
    z.object({
      zoneKey: z.string(),
      zoneLabel: z.string(),
      stateLabel: z.string(),
      reason: z.string(),
      nextDue: isoDate.nullable(),
      overdue: z.boolean(),
    }),
  ),
  /** Damage (severity ≥ 2) with no decision yet: listed so nothing is left out silently. */
  undecided: z.array(
    z.object({ zoneKey: z.string(), zoneLabel: z.string(), worstSeverity: z.number() }),
  ),
  totals: z.object({
    hours: z.number(),
    totalCost: z.number(),
    currency: z.string(),
    structural: classTotals,
    cosmetic: classTotals,
    boardFeetBySpecies: z.array(
      z.object({ label: z.string(), boardFeet: z.number(), cost: z.number() }),
    ),
  }),
  cutList: z.array(
    z.object({
      zoneLabel: z.string(),
      speciesLabel: z.string(),
      finishedThicknessMm: z.number(),
      finishedWidthMm: z.number(),
      finishedLengthMm: z.number(),
      roughQuarters: z.number(),
      boardFeetWithWaste: z.number(),
      cost: z.number(),
    }),
  ),
  workOrder: z.array(
    z.object({
      key: z.string(),
      title: z.string(),
      why: z.string(),
      zoneLabels: z.array(z.string()),
    }),
  ),
  units: z.enum(UNITS),
});
export type RepairPlanResponse = z.infer<typeof repairPlanResponse>;
