import { getBodyPlan } from '@/shared/body-plans';
import type { STORAGE_PLACES, VehicleResponse, VehicleStage } from '@/shared/schemas';
import type { BadgeTone } from '@/src/components/ui';

export const STAGE_LABELS: Record<VehicleStage, string> = {
  intake: 'Booked in',
  surveying: 'Surveying',
  treating: 'Treating',
  repairing: 'Repairing',
  complete: 'Complete',
};

export const STAGE_TONES: Record<VehicleStage, BadgeTone> = {
  intake: 'neutral',
  surveying: 'accent',
  treating: 'caution',
  repairing: 'caution',
  complete: 'ok',
};

export const STORAGE_LABELS: Record<(typeof STORAGE_PLACES)[number], string> = {
  indoors: 'Indoors',
  covered: 'Under cover',
  outdoors: 'Outdoors',
};

export function vehicleTitle(v: Pick<VehicleResponse, 'year' | 'make' | 'model'>): string {
  return `${v.year} ${v.make} ${v.model}`;
}

export function bodyPlanName(key: string): string {
  return getBodyPlan(key)?.name ?? key;
}

const DAY_FORMAT: Intl.DateTimeFormatOptions = { day: 'numeric', month: 'short', year: 'numeric' };

/**
 * A calendar date (YYYY-MM-DD, read as that local day, no time-zone shift) or an ISO
 * timestamp (shown as the reader's local day), in the reader's format.
 */
export function formatDay(value: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  const date = m ? new Date(Number(m[1]), Number(m[2]) - 1, Number(m[3])) : new Date(value);
  return Number.isNaN(date.getTime()) ? value : date.toLocaleDateString(undefined, DAY_FORMAT);
}
