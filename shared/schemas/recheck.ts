import { z } from 'zod';
import { ACTIVITY, findingFields } from './finding';
import { isoDate, isoDateTime, uuid } from './common';

export const RECHECK_STATUSES = ['pending', 'clean', 'fresh-evidence'] as const;
export type RecheckStatus = (typeof RECHECK_STATUSES)[number];
export const RECHECK_RESULTS = ['clean', 'fresh-evidence'] as const;
export type RecheckResult = (typeof RECHECK_RESULTS)[number];

export const RECHECK_STATUS_LABELS: Record<RecheckStatus, string> = {
  pending: 'Not done yet',
  clean: 'Clean',
  'fresh-evidence': 'Fresh evidence',
};

export const recheckResponse = z.object({
  id: uuid,
  vehicleId: uuid,
  treatmentId: uuid,
  zoneKeys: z.array(z.string()),
  dueDate: isoDate,
  assigneeId: uuid.nullable(),
  assigneeName: z.string().nullable(),
  status: z.enum(RECHECK_STATUSES),
  completedAt: isoDateTime.nullable(),
  completedByName: z.string().nullable(),
  frassCleaned: z.boolean(),
  notes: z.string(),
  findingId: uuid.nullable(),
  moveReason: z.string(),
  version: z.number(),
  vehicleLabel: z.string(),
});
export type RecheckResponse = z.infer<typeof recheckResponse>;

const version = z.number().int().min(0);

/** The finding a re-check with fresh evidence creates (in the vehicle's latest survey). */
export const recheckFinding = z.object({
  zoneKey: findingFields.zoneKey,
  severity: findingFields.severity,
  insectEvidence: findingFields.insectEvidence,
  /** Fresh evidence means live attack unless the inspector says otherwise. */
  activity: z.enum(ACTIVITY).default('active'),
  notes: findingFields.notes,
});

/** POST /api/workshops/:wid/rechecks/:rid/result */
export const recordRecheckRequest = z
  .object({
    version,
    result: z.enum(RECHECK_RESULTS),
    frassCleaned: z.boolean().default(false),
    notes: z.string().trim().max(4000).default(''),
    finding: recheckFinding.optional(),
  })
  .superRefine((body, ctx) => {
    if (body.result === 'fresh-evidence' && !body.finding) {
      ctx.addIssue({
        code: 'custom',
        path: ['finding'],
        message: 'Describe the fresh evidence (zone, severity, what was seen)',
      });
    }
  });
export type RecordRecheckRequest = z.input<typeof recordRecheckRequest>;

/** POST /api/workshops/:wid/rechecks/:rid/move */
export const moveRecheckRequest = z.object({
  version,
  dueDate: isoDate,
  reason: z.string().trim().min(1, 'Say why the re-check moves').max(1000),
});
export type MoveRecheckRequest = z.input<typeof moveRecheckRequest>;

/** POST /api/workshops/:wid/rechecks/:rid/assign */
export const assignRecheckRequest = z.object({ version, assigneeId: uuid.nullable() });
export type AssignRecheckRequest = z.input<typeof assignRecheckRequest>;

/** GET /api/workshops/:wid/rechecks/due — pending re-checks only. */
export const dueListQuery = z.object({
  assigneeId: uuid.optional(),
  days: z.coerce.number().int().min(1).max(90).default(7),
});
export type DueListQuery = z.infer<typeof dueListQuery>;

export const dueListResponse = z.object({
  overdue: z.array(recheckResponse),
  thisWeek: z.array(recheckResponse),
  upcoming: z.array(recheckResponse),
});
export type DueListResponse = z.infer<typeof dueListResponse>;

export const ZONE_STATES = [
  'no-evidence',
  'active',
  'treated-watching',
  'cleared',
  'old-damage',
] as const;
export type ZoneState = (typeof ZONE_STATES)[number];

export const ZONE_STATE_LABELS: Record<ZoneState, string> = {
  'no-evidence': 'No evidence',
  active: 'Active',
  'treated-watching': 'Treated, watching',
  cleared: 'Cleared',
  'old-damage': 'Old damage',
};

/** GET /api/workshops/:wid/vehicles/:vid/zone-states → { items: zoneStateResponse[] } */
export const zoneStateResponse = z.object({
  zoneKey: z.string(),
  state: z.enum(ZONE_STATES),
  /** Fresh evidence after a treatment: a possible treatment failure. */
  flagged: z.boolean(),
  reason: z.string(),
});
export type ZoneStateResponse = z.infer<typeof zoneStateResponse>;

export const TIMELINE_KINDS = ['survey', 'finding', 'treatment', 'recheck'] as const;
export type TimelineKind = (typeof TIMELINE_KINDS)[number];

export const timelineItem = z.object({
  kind: z.enum(TIMELINE_KINDS),
  id: uuid,
  at: isoDateTime,
  /** `at` stands for a calendar day (a survey date, a due date): show the day, never a clock time. */
  allDay: z.boolean(),
  /** Still to be done (a re-check not yet recorded): listed apart from what has happened. */
  planned: z.boolean(),
  title: z.string(),
  detail: z.string(),
  zoneKeys: z.array(z.string()),
});
export type TimelineItem = z.infer<typeof timelineItem>;

/** GET /api/workshops/:wid/vehicles/:vid/timeline?kinds=survey,finding — every kind when left out. */
export const timelineQuery = z.object({
  kinds: z
    .string()
    .optional()
    .transform((s) => (s ? s.split(',').map((k) => k.trim()) : [...TIMELINE_KINDS]))
    .pipe(z.array(z.enum(TIMELINE_KINDS)).min(1)),
});
export type TimelineQuery = z.infer<typeof timelineQuery>;
