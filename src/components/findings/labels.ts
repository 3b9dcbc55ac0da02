import type { SpeciesKey } from '@/shared/body-plans';
import type { ACTIVITY, DECAY_TYPES } from '@/shared/schemas';

export type DecayType = (typeof DECAY_TYPES)[number];
export type Activity = (typeof ACTIVITY)[number];

/** Decay types with the sign a practitioner looks for, so the choice can be made at the car. */
export const DECAY_TYPE_LABELS: Record<DecayType, { label: string; description: string }> = {
  none: {
    label: 'No decay seen',
    description: 'Any damage is from insects or mechanical wear only.',
  },
  'brown-rot': {
    label: 'Brown rot',
    description: 'Darkened wood that shrinks and cracks across the grain into cubes.',
  },
  'white-rot': {
    label: 'White rot',
    description: 'Bleached, stringy or spongy wood, sometimes with dark zone lines.',
  },
  'soft-rot': {
    label: 'Soft rot',
    description: 'A soft, shallow surface layer over sound wood; fine cracks when dry.',
  },
  unknown: { label: 'Not sure', description: 'Decay is present but its type could not be told.' },
};

export const ACTIVITY_LABELS: Record<Activity, string> = {
  active: 'Active',
  inactive: 'Inactive',
  unknown: 'Not known',
};

export const SPECIES_LABELS: Record<SpeciesKey, string> = {
  'white-ash': 'White ash',
  'northern-red-oak': 'Northern red oak',
  'white-oak': 'White oak',
  'hard-maple': 'Hard maple',
  'yellow-poplar': 'Yellow poplar',
  'douglas-fir': 'Douglas-fir',
};

export function speciesLabel(key: string | null | undefined): string {
  if (!key) return '';
  return SPECIES_LABELS[key as SpeciesKey] ?? key;
}
