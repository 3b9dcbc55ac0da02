import { z } from 'zod';
import { METER_TEMP_RANGE_C } from '../wood/moisture';
import { isoDateTime, uuid, withoutDefaults } from './common';

export const SEVERITIES = [0, 1, 2, 3, 4] as const;
/** Plain description of each decay-severity level, shown beside the picker and in the legend. */
export const SEVERITY_LABELS: Record<number, { title: string; description: string }> = {
  0: { title: 'Sound', description: 'No decay or insect damage found; the awl does not sink in.' },
  1: {
    title: 'Surface',
    description: 'Staining or softening only at the surface; the section is intact.',
  },
  2: {
    title: 'Shallow',
    description: 'Decay or galleries a few millimetres deep; most of the section is sound.',
  },
  3: {
    title: 'Deep',
    description: 'Decay reaches well into the section or along a joint; strength is reduced.',
  },
  4: {
    title: 'Lost',
    description: 'Wood crumbles, is hollow or broken; the member no longer carries load.',
  },
};

export const DECAY_TYPES = ['none', 'brown-rot', 'white-rot', 'soft-rot', 'unknown'] as const;
export const INSECT_EVIDENCE = [
  'frass-powder',
  'frass-pellets',
  'frass-fibrous',
  'exit-holes-round',
  'exit-holes-oval',
  'galleries',
  'mud-tubes',
  'live-insects',
  'wings',
] as const;
export const INSECT_EVIDENCE_LABELS: Record<(typeof INSECT_EVIDENCE)[number], string> = {
  'frass-powder': 'Frass, fine powder',
  'frass-pellets': 'Frass, hard pellets',
  'frass-fibrous': 'Frass, coarse fibres',
  'exit-holes-round': 'Exit holes, round',
  'exit-holes-oval': 'Exit holes, oval',
  galleries: 'Galleries / tunnels',
  'mud-tubes': 'Mud tubes',
  'live-insects': 'Live insects',
  wings: 'Shed wings',
};
export const ACTIVITY = ['active', 'inactive', 'unknown'] as const;
export const PICK_TEST = ['not-done', 'long-splinter', 'brash-break'] as const;
export const PICK_TEST_LABELS: Record<(typeof PICK_TEST)[number], string> = {
  'not-done': 'Not done',
  'long-splinter': 'Long splinter (sound)',
  'brash-break': 'Breaks short across the grain (decayed)',
};

const mm = z.number().min(0).max(2000);

export const moistureReading = z.object({
  meterReading: z.number().min(0).max(100),
  woodTempC: z
    .number()
    .min(METER_TEMP_RANGE_C.min)
    .max(METER_TEMP_RANGE_C.max)
    .nullable()
    .default(null),
  species: z.string().max(60).nullable().default(null),
});

export const decayDepth = z.object({
  top: mm.default(0),
  bottom: mm.default(0),
  left: mm.default(0),
  right: mm.default(0),
});

export const pinPosition = z.object({
  view: z.string().max(20),
  x: z.number(),
  y: z.number(),
});

/** The fields a finding is written with; a re-check's fresh evidence reuses some. */
export const findingFields = {
  zoneKey: z.string().min(1, 'Choose a zone').max(60),
  severity: z.number().int().min(0).max(4),
  decayType: z.enum(DECAY_TYPES).default('none'),
  insectEvidence: z.array(z.enum(INSECT_EVIDENCE)).max(INSECT_EVIDENCE.length).default([]),
  /** Largest exit-hole diameter seen, mm (helps tell beetles apart). */
  holeDiameterMm: z.number().min(0).max(50).nullable().default(null),
  activity: z.enum(ACTIVITY).default('unknown'),
  moisture: moistureReading.nullable().default(null),
  pickTest: z.enum(PICK_TEST).default('not-done'),
  decayDepthMm: decayDepth.default({ top: 0, bottom: 0, left: 0, right: 0 }),
  affectedLengthMm: mm.nullable().default(null),
  atJointOrFitting: z.boolean().default(false),
  pin: pinPosition.nullable().default(null),
  notes: z.string().trim().max(4000).default(''),
};

/** POST /api/workshops/:wid/surveys/:sid/findings */
export const createFindingRequest = z.object({ id: uuid.optional(), ...findingFields });
export type CreateFindingRequest = z.input<typeof createFindingRequest>;

/** PATCH /api/workshops/:wid/findings/:fid — stale `version` → 409. */
export const updateFindingRequest = z
  .object(withoutDefaults(findingFields))
  .partial()
  .extend({ version: z.number().int().min(0) });
export type UpdateFindingRequest = z.input<typeof updateFindingRequest>;

/** The text fields sent beside the files of POST /api/workshops/:wid/findings/:fid/photos. */
export const uploadPhotosFields = z.object({
  caption: z.string().trim().max(500, 'Keep the caption under 500 characters').default(''),
});

export const photoResponse = z.object({
  id: uuid,
  findingId: uuid,
  width: z.number(),
  height: z.number(),
  /** Authorized URLs (cookie or bearer); never the original bytes. */
  thumbUrl: z.string(),
  displayUrl: z.string(),
  caption: z.string(),
  createdAt: isoDateTime,
});
export type PhotoResponse = z.infer<typeof photoResponse>;

export const findingResponse = z.object({
  id: uuid,
  surveyId: uuid,
  vehicleId: uuid,
  surveyDate: z.string(),
  zoneKey: z.string(),
  severity: z.number(),
  decayType: z.enum(DECAY_TYPES),
  insectEvidence: z.array(z.enum(INSECT_EVIDENCE)),
  holeDiameterMm: z.number().nullable(),
  activity: z.enum(ACTIVITY),
  moisture: z
    .object({
      meterReading: z.number(),
      woodTempC: z.number().nullable(),
      species: z.string().nullable(),
    })
    .nullable(),
  pickTest: z.enum(PICK_TEST),
  decayDepthMm: z.object({
    top: z.number(),
    bottom: z.number(),
    left: z.number(),
    right: z.number(),
  }),
  affectedLengthMm: z.number().nullable(),
  atJointOrFitting: z.boolean(),
  pin: z.object({ view: z.string(), x: z.number(), y: z.number() }).nullable(),
  notes: z.string(),
  photos: z.array(photoResponse),
  authorName: z.string().nullable(),
  version: z.number(),
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
  deletedAt: isoDateTime.nullable(),
});
export type FindingResponse = z.infer<typeof findingResponse>;

export const findingListQuery = z.object({
  zone: z.string().max(60).optional(),
  surveyId: uuid.optional(),
  deleted: z.enum(['only', 'include']).optional(),
});
