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
