import { z } from 'zod';
import { SPECIES_KEYS } from '../body-plans/schema';
import { DECISION_CLASSES, VERDICT_OPTIONS } from '../wood/types';
import { isoDateTime, uuid } from './common';

const mm = z.number().min(0).max(10000);

/** What the inspector measured for the member; the server recomputes the recommendation from it. */
export const decisionInputs = z.object({
  widthMm: z.number().positive().max(1000),
  depthMm: z.number().positive().max(1000),
  decayMm: z.object({
    top: mm.default(0),
    bottom: mm.default(0),
    left: mm.default(0),
    right: mm.default(0),
  }),
  affectedLengthMm: mm,
  memberLengthMm: z.number().positive().max(10000),
  atJointOrFitting: z.boolean().default(false),
  species: z.enum(SPECIES_KEYS),
});
export type DecisionInputs = z.infer<typeof decisionInputs>;

/**
 * PUT /api/workshops/:wid/vehicles/:vid/decisions/:zoneKey — create or replace the zone's decision.
 * `version` is required when one exists (stale → 409). A chosen option other than the
 * recommendation needs `overrideReason`.
 */
export const saveDecisionRequest = z.object({
  version: z.number().int().min(0).optional(),
  inputs: decisionInputs,
  chosenOption: z.enum(VERDICT_OPTIONS),
  overrideReason: z.string().trim().max(2000).default(''),
  notes: z.string().trim().max(4000).default(''),
});
export type SaveDecisionRequest = z.input<typeof saveDecisionRequest>;

export const decisionResponse = z.object({
  id: uuid,
  vehicleId: uuid,
  zoneKey: z.string(),
  inputs: decisionInputs,
  recommendedOption: z.enum(VERDICT_OPTIONS),
  recommendationReasons: z.array(z.string()),
  chosenOption: z.enum(VERDICT_OPTIONS),
  overrideReason: z.string(),
  decisionClass: z.enum(DECISION_CLASSES),
  estimatedHours: z.number(),
  labourCost: z.number(),
  materialCost: z.number(),
  totalCost: z.number(),
  materials: z.array(
    z.object({
      species: z.enum(SPECIES_KEYS),
      finishedThicknessMm: z.number(),
      finishedWidthMm: z.number(),
      finishedLengthMm: z.number(),
      roughQuarters: z.number(),
      boardFeet: z.number(),
      boardFeetWithWaste: z.number(),
      cost: z.number(),
    }),
  ),
  splice: z
    .object({ slope: z.number(), scarfLengthMm: z.number(), minSpacingMm: z.number() })
    .nullable(),
  notes: z.string(),
  decidedById: uuid.nullable(),
  decidedByName: z.string().nullable(),
  version: z.number(),
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
});
export type DecisionResponse = z.infer<typeof decisionResponse>;
