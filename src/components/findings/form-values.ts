import { z } from 'zod';
import { getZone, type BodyPlan } from '@/shared/body-plans';
import {
  createFindingRequest,
  updateFindingRequest,
  type CreateFindingRequest,
  type FindingResponse,
  type INSECT_EVIDENCE,
  type PICK_TEST,
  type UpdateFindingRequest,
} from '@/shared/schemas';
import type { Activity, DecayType } from './labels';

export type InsectEvidence = (typeof INSECT_EVIDENCE)[number];
export type PickTest = (typeof PICK_TEST)[number];
export type Face = 'top' | 'bottom' | 'left' | 'right';
export const FACES: Face[] = ['top', 'bottom', 'left', 'right'];

/** What the form edits: numbers stay text until saving, so half-typed values are not lost. */
export type FindingFormValues = {
  zoneKey: string;
  severity: number | null;
  decayType: DecayType;
  insectEvidence: InsectEvidence[];
  holeDiameterMm: string;
  activity: Activity;
  meterReading: string;
  woodTempC: string;
  species: string | null;
  pickTest: PickTest;
  decayDepthMm: Record<Face, string>;
  affectedLengthMm: string;
  atJointOrFitting: boolean;
  notes: string;
};

export type Pin = { view: string; x: number; y: number } | null;

/** Error messages keyed by the request path ("severity", "moisture.meterReading"). */
export type FindingFieldErrors = Record<string, string>;

export function emptyValues(zoneKey: string, defaultSpecies: string | null): FindingFormValues {
  return {
    zoneKey,
    severity: null,
    decayType: 'none',
    insectEvidence: [],
    holeDiameterMm: '',
    activity: 'unknown',
    meterReading: '',
    woodTempC: '',
    species: defaultSpecies,
    pickTest: 'not-done',
    decayDepthMm: { top: '', bottom: '', left: '', right: '' },
    affectedLengthMm: '',
    atJointOrFitting: false,
    notes: '',
  };
}

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

export function valuesFromFinding(f: FindingResponse): FindingFormValues {
  return {
    zoneKey: f.zoneKey,
    severity: f.severity,
    decayType: f.decayType,
    insectEvidence: [...f.insectEvidence],
    holeDiameterMm: text(f.holeDiameterMm),
    activity: f.activity,
    meterReading: text(f.moisture?.meterReading),
    woodTempC: text(f.moisture?.woodTempC),
    species: f.moisture?.species ?? null,
    pickTest: f.pickTest,
    decayDepthMm: {
      top: f.decayDepthMm.top ? String(f.decayDepthMm.top) : '',
      bottom: f.decayDepthMm.bottom ? String(f.decayDepthMm.bottom) : '',
      left: f.decayDepthMm.left ? String(f.decayDepthMm.left) : '',
      right: f.decayDepthMm.right ? String(f.decayDepthMm.right) : '',
    },
    affectedLengthMm: text(f.affectedLengthMm),
    atJointOrFitting: f.atJointOrFitting,
    notes: f.notes,
  };
}

const NOT_A_NUMBER = 'Enter a number, e.g. 12 or 12.5';

/** '' → null, '12,5' → 12.5 (a comma keyboard is common on phones), junk → NaN. */
export function parseNumber(s: string): number | null {
  const t = s.trim().replace(',', '.');
  if (t === '') return null;
  return /^-?\d+(\.\d+)?$/.test(t) ? Number(t) : NaN;
}

type Built = { body: Record<string, unknown>; errors: FindingFieldErrors };

function build(values: FindingFormValues, pin: Pin): Built {
  const errors: FindingFieldErrors = {};
  const num = (path: string, s: string): number | null => {
    const n = parseNumber(s);
    if (Number.isNaN(n)) errors[path] = NOT_A_NUMBER;
    return Number.isNaN(n) ? null : n;
  };
  if (values.severity === null) errors.severity = 'Choose a severity from 0 to 4';

  const meter = num('moisture.meterReading', values.meterReading);
  const temp = num('moisture.woodTempC', values.woodTempC);
  if (meter === null && temp !== null && !errors['moisture.meterReading'])
    errors['moisture.meterReading'] = 'Enter the meter reading, or clear the wood temperature';

  const depth = Object.fromEntries(
    FACES.map((f) => [f, num(`decayDepthMm.${f}`, values.decayDepthMm[f]) ?? 0]),
  );
  const body = {
    zoneKey: values.zoneKey,
    severity: values.severity ?? undefined,
    decayType: values.decayType,
    insectEvidence: values.insectEvidence,
    holeDiameterMm: num('holeDiameterMm', values.holeDiameterMm),
    activity: values.activity,
    moisture:
      meter === null ? null : { meterReading: meter, woodTempC: temp, species: values.species },
    pickTest: values.pickTest,
    decayDepthMm: depth,
    affectedLengthMm: num('affectedLengthMm', values.affectedLengthMm),
    atJointOrFitting: values.atJointOrFitting,
    pin,
    notes: values.notes,
  };
  return { body, errors };
}

/** Issues from the shared schema, keyed by full path; our own messages win where both exist. */
function schemaErrors(error: z.ZodError, errors: FindingFieldErrors): FindingFieldErrors {
  const out = { ...errors };
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || 'form';
    if (!out[key]) out[key] = friendly(issue);
  }
  return out;
}

function friendly(issue: z.core.$ZodIssue): string {
  if (issue.code === 'too_big' && typeof issue.maximum === 'number')
    return `At most ${issue.maximum}`;
  if (issue.code === 'too_small' && typeof issue.minimum === 'number')
    return `At least ${issue.minimum}`;
  return issue.message;
}

export type Validated<T> = { ok: true; body: T } | { ok: false; errors: FindingFieldErrors };

export function validateCreate(
  values: FindingFormValues,
  pin: Pin,
  id: string,
): Validated<CreateFindingRequest> {
  const { body, errors } = build(values, pin);
  const parsed = createFindingRequest.safeParse({ ...body, id });
  if (!parsed.success) return { ok: false, errors: schemaErrors(parsed.error, errors) };
  if (Object.keys(errors).length) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}

export function validateUpdate(
  values: FindingFormValues,
  pin: Pin,
  version: number,
): Validated<UpdateFindingRequest> {
  const { body, errors } = build(values, pin);
  const parsed = updateFindingRequest.safeParse({ ...body, version });
  if (!parsed.success) return { ok: false, errors: schemaErrors(parsed.error, errors) };
  if (Object.keys(errors).length) return { ok: false, errors };
  return { ok: true, body: parsed.data };
}

/** A message for a field, falling back to its parent ("moisture") when the server named only that. */
export function fieldError(errors: FindingFieldErrors, path: string): string | undefined {
  if (errors[path]) return errors[path];
  const parent = path.split('.')[0];
  return parent !== path ? errors[parent] : undefined;
}

/** The species a meter is set for by default: the zone's usual timber. */
export function defaultSpecies(plan: BodyPlan, zoneKey: string): string | null {
  return getZone(plan, zoneKey)?.defaultSpecies ?? null;
}

/** Error paths each form value feeds (the request nests moisture and depths). */
const PATHS_OF: Partial<Record<keyof FindingFormValues, string[]>> = {
  meterReading: ['moisture', 'moisture.meterReading'],
  woodTempC: ['moisture.woodTempC', 'moisture.meterReading'],
  species: ['moisture.species'],
};

/** Errors still standing after the user changed these values. */
export function errorsAfterChange(
  errors: FindingFieldErrors,
  patch: Partial<FindingFormValues>,
): FindingFieldErrors {
  const changed = Object.keys(patch) as (keyof FindingFormValues)[];
  const cleared = new Set(changed.flatMap((k) => PATHS_OF[k] ?? []));
  return Object.fromEntries(
    Object.entries(errors).filter(
      ([path]) =>
        !cleared.has(path) && !changed.includes(path.split('.')[0] as keyof FindingFormValues),
    ),
  );
}

const FIELD_NAMES: Record<string, string> = {
  zoneKey: 'Zone',
  severity: 'Severity',
  decayType: 'Decay type',
  insectEvidence: 'Insect evidence',
  holeDiameterMm: 'Largest exit hole',
  activity: 'Activity',
  moisture: 'Moisture',
  pickTest: 'Pick test',
  decayDepthMm: 'Decay depth',
  affectedLengthMm: 'Affected length',
  atJointOrFitting: 'At a joint or fitting',
  notes: 'Notes',
};

/** The fields named in a set of errors, for a summary beside the Save button. */
export function errorFieldNames(errors: FindingFieldErrors): string[] {
  return [...new Set(Object.keys(errors).map((k) => FIELD_NAMES[k.split('.')[0]] ?? 'The form'))];
}
