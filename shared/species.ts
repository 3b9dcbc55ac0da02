import { SPECIES_KEYS, type SpeciesKey } from '@/shared/body-plans/schema';

/**
 * Clear-wood properties of the body-framing species at 12 % moisture content, for the
 * section and strength checks. Specific gravity is on oven-dry weight and volume at 12 % MC.
 *
 * Source: USDA Forest Products Laboratory, Wood Handbook — Wood as an Engineering
 * Material, FPL-GTR-190 (2010), Chapter 5, Table 5-3a (metric) and Table 5-3b
 * (inch-pound). Listed in /work/shared/SOURCES.md ("Sections"), which gives the metric
 * values and white ash's inch-pound values. The other inch-pound values are recalled from
 * Table 5-3b and agree with the metric ones to within rounding; the metric white-oak values
 * are recalled too (SOURCES.md marks them "memory"). Each record says which is which.
 */
export interface Species {
  key: SpeciesKey;
  name: string;
  botanicalName: string;
  specificGravity: number;
  /** Modulus of rupture, MPa. */
  morMPa: number;
  /** Modulus of rupture, lbf/in². */
  morPsi: number;
  /** Modulus of elasticity, GPa. */
  moeGPa: number;
  /** Modulus of elasticity, 10⁶ lbf/in². */
  moeMpsi: number;
  source: string;
}

const TABLE = 'Wood Handbook (FPL-GTR-190, 2010), Table 5-3a/5-3b, 12 % MC';
const IMPERIAL_RECALLED = `${TABLE}; inch-pound values from memory of Table 5-3b`;

export const SPECIES: readonly Species[] = [
  {
    key: 'white-ash',
    name: 'White ash',
    botanicalName: 'Fraxinus americana',
    specificGravity: 0.6,
    morMPa: 103,
    morPsi: 15000,
    moeGPa: 12.0,
    moeMpsi: 1.74,
    source: TABLE,
  },
  {
    key: 'northern-red-oak',
    name: 'Northern red oak',
    botanicalName: 'Quercus rubra',
    specificGravity: 0.63,
    morMPa: 99,
    morPsi: 14300,
    moeGPa: 12.5,
    moeMpsi: 1.82,
    source: IMPERIAL_RECALLED,
  },
  {
    key: 'white-oak',
    name: 'White oak',
    botanicalName: 'Quercus alba',
    specificGravity: 0.68,
    morMPa: 105,
    morPsi: 15200,
    moeGPa: 12.3,
    moeMpsi: 1.78,
    source: `${TABLE}; metric and inch-pound values from memory of the tables`,
  },
  {
    key: 'hard-maple',
    name: 'Hard maple (sugar maple)',
    botanicalName: 'Acer saccharum',
    specificGravity: 0.63,
    morMPa: 109,
    morPsi: 15800,
    moeGPa: 12.6,
    moeMpsi: 1.83,
    source: IMPERIAL_RECALLED,
  },
  {
    key: 'yellow-poplar',
    name: 'Yellow-poplar',
    botanicalName: 'Liriodendron tulipifera',
    specificGravity: 0.42,
    morMPa: 70,
    morPsi: 10100,
    moeGPa: 10.9,
    moeMpsi: 1.58,
    source: IMPERIAL_RECALLED,
  },
  {
    key: 'douglas-fir',
    name: 'Douglas-fir (coast)',
    botanicalName: 'Pseudotsuga menziesii var. menziesii',
    specificGravity: 0.48,
    morMPa: 85,
    morPsi: 12400,
    moeGPa: 13.4,
    moeMpsi: 1.95,
    source: IMPERIAL_RECALLED,
  },
];

export { SPECIES_KEYS };
export type { SpeciesKey };

export const SPECIES_LABELS: Record<SpeciesKey, string> = Object.fromEntries(
  SPECIES.map((s) => [s.key, s.name]),
) as Record<SpeciesKey, string>;

export function getSpecies(key: string): Species | undefined {
  return SPECIES.find((s) => s.key === key);
}
