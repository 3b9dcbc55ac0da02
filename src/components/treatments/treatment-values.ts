import { format } from 'date-fns';
import type { z } from 'zod';
import type { TreatmentMethod, TreatmentTarget, treatmentData } from '@/shared/schemas/treatment';

/** Protective equipment often named on wood-treatment labels; the label decides what is worn. */
export const PPE_OPTIONS = [
  'Chemical-resistant gloves',
  'Eye protection',
  'Respirator',
  'Coveralls',
  'Chemical-resistant footwear',
  'Long sleeves and trousers',
] as const;

/** Everything as typed: numbers stay text until the form is sent. */
export type TreatmentFormValues = {
  date: string;
  time: string;
  applicatorName: string;
  licenceNumber: string;
  productName: string;
  registrationNumber: string;
  activeIngredient: string;
  concentration: string;
  formulation: string;
  dilution: string;
  method: TreatmentMethod | null;
  targetAgent: TreatmentTarget;
  zoneKeys: string[];
  quantityAmount: string;
  quantityUnit: string;
  areaTreated: string;
  ventilation: string;
  reentryHours: string;
  ppe: string[];
  airTempC: string;
  woodMoisturePercent: string;
  notes: string;
  labelConfirmed: boolean;
};

export type TreatmentFieldErrors = Record<string, string>;

export function emptyTreatmentValues(
  now: Date,
  applicatorName: string,
  zoneKeys: string[] = [],
): TreatmentFormValues {
  return {
    date: format(now, 'yyyy-MM-dd'),
    time: format(now, 'HH:mm'),
    applicatorName,
    licenceNumber: '',
    productName: '',
    registrationNumber: '',
    activeIngredient: '',
    concentration: '',
    formulation: '',
    dilution: '',
    method: null,
    targetAgent: 'unknown',
    zoneKeys,
    quantityAmount: '',
    quantityUnit: '',
    areaTreated: '',
    ventilation: '',
    reentryHours: '',
    ppe: [],
    airTempC: '',
    woodMoisturePercent: '',
    notes: '',
    labelConfirmed: false,
  };
}

/** A recorded version back into the form (for a correction). */
export function valuesFromTreatment(t: z.infer<typeof treatmentData>): TreatmentFormValues {
  const at = new Date(t.appliedAt);
  return {
    date: format(at, 'yyyy-MM-dd'),
    time: format(at, 'HH:mm'),
    applicatorName: t.applicatorName,
    licenceNumber: t.licenceNumber,
    productName: t.productName,
    registrationNumber: t.registrationNumber,
    activeIngredient: t.activeIngredient,
    concentration: t.concentration,
    formulation: t.formulation,
    dilution: t.dilution,
    method: t.method,
    targetAgent: t.targetAgent,
    zoneKeys: [...t.zoneKeys],
    quantityAmount: String(t.quantity.amount),
    quantityUnit: t.quantity.unit,
    areaTreated: t.areaTreated,
    ventilation: t.ventilation,
    reentryHours: String(t.reentryHours),
    ppe: [...t.ppe],
    airTempC: t.conditions.airTempC === null ? '' : String(t.conditions.airTempC),
    woodMoisturePercent:
      t.conditions.woodMoisturePercent === null ? '' : String(t.conditions.woodMoisturePercent),
    notes: t.notes,
    // A correction is a fresh statement that the label was followed.
    labelConfirmed: false,
  };
}

function readNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (!t) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : Number.NaN;
}

/**
 * The request body as far as it can be read, and the errors only the form can see (numbers
 * that are not numbers, a date that is not a date). Everything else is checked by the shared
 * schema, on both sides; these errors take precedence over the schema's for the same field.
 */
export function toTreatmentBody(v: TreatmentFormValues): {
  body: Record<string, unknown>;
  errors: TreatmentFieldErrors;
} {
  const errors: TreatmentFieldErrors = {};
  const at = new Date(`${v.date.trim()}T${v.time.trim()}:00`);
  if (
    !/^\d{4}-\d{2}-\d{2}$/.test(v.date.trim()) ||
    !/^\d{2}:\d{2}$/.test(v.time.trim()) ||
    Number.isNaN(at.getTime())
  )
    errors.appliedAt = 'Enter the date as YYYY-MM-DD and the time as HH:MM';
  const amount = readNumber(v.quantityAmount);
  if (amount === null) errors.quantity = 'Enter the amount used';
  else if (Number.isNaN(amount)) errors.quantity = 'The amount must be a number';
  const reentry = readNumber(v.reentryHours);
  if (reentry === null)
    errors.reentryHours = 'Enter the re-entry time from the label (0 if it gives none)';
  else if (Number.isNaN(reentry)) errors.reentryHours = 'The re-entry time must be a number';
  const airTempC = readNumber(v.airTempC);
  const woodMoisturePercent = readNumber(v.woodMoisturePercent);
  if (Number.isNaN(airTempC)) errors.conditions = 'The air temperature must be a number';
  else if (Number.isNaN(woodMoisturePercent))
    errors.conditions = 'The wood moisture must be a number';
  if (!v.method) errors.method = 'Choose how it was applied';
  const ok = (n: number | null) => (n === null || Number.isNaN(n) ? undefined : n);
  return {
    errors,
    body: {
      appliedAt: errors.appliedAt ? undefined : at.toISOString(),
      applicatorName: v.applicatorName,
      licenceNumber: v.licenceNumber,
      productName: v.productName,
      registrationNumber: v.registrationNumber,
      activeIngredient: v.activeIngredient,
      concentration: v.concentration,
      formulation: v.formulation,
      dilution: v.dilution,
      method: v.method ?? undefined,
      targetAgent: v.targetAgent,
      zoneKeys: v.zoneKeys,
      quantity: { amount: ok(amount), unit: v.quantityUnit },
      areaTreated: v.areaTreated,
      ventilation: v.ventilation,
      reentryHours: ok(reentry),
      ppe: v.ppe,
      conditions: {
        airTempC: Number.isNaN(airTempC) ? undefined : airTempC,
        woodMoisturePercent: Number.isNaN(woodMoisturePercent) ? undefined : woodMoisturePercent,
      },
      notes: v.notes,
      labelConfirmed: v.labelConfirmed,
    },
  };
}
