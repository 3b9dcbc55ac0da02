/**
 * Moisture: equilibrium moisture content of the shop air, pin-meter corrections, and what a
 * corrected reading means for decay. Sources are listed in /work/shared/SOURCES.md
 * ("Moisture").
 */
import { SPECIES_KEYS, type SpeciesKey } from '../body-plans/schema';
import { DomainError, requireFinite, requireInRange, requireNonNegative } from './errors';
import type { DecayRisk } from './types';

/**
 * Air temperatures accepted for EMC, °C. Table 4-2 starts at 30 °F (−1.1 °C); below that the
 * equation is extrapolated, smoothly. The range is wider than the survey form's shop-climate
 * range (−30 to 60 °C), so every temperature the form accepts is valid here.
 */
export const EMC_TEMP_RANGE_C = { min: -30, max: 70 } as const;

/** Wood temperatures accepted for the meter correction, °C (the finding form's range). */
export const METER_TEMP_RANGE_C = { min: -30, max: 70 } as const;

/** Fibre saturation averages about 30 % MC (Wood Handbook, FPL-GTR-190, ch. 4). */
export const FIBRE_SATURATION_PERCENT = 30;
/** Decay cannot start or progress below about 20 % MC (Wood Handbook, FPL-GTR-190, ch. 5). */
export const DECAY_THRESHOLD_PERCENT = 20;
/**
 * Common practice: at or above about 15 % wood is wetter than heated indoor air keeps it, and
 * anobiid beetles need about 15 % or more (Wood Handbook Table 14-2).
 */
export const ELEVATED_THRESHOLD_PERCENT = 15;
/** Common practice: a reading this many points above the EMC is more than the climate explains. */
export const WATER_SOURCE_MARGIN_POINTS = 5;

/**
 * Equilibrium moisture content, % — Wood Handbook (FPL-GTR-190, 2010), ch. 4, Eq. 4-5, °C form
 * (Hailwood–Horrobin sorption model fitted to the tabulated values of Table 4-2).
 */
export function equilibriumMoistureContent(tempC: number, relativeHumidityPercent: number): number {
  requireInRange('tempC', tempC, EMC_TEMP_RANGE_C.min, EMC_TEMP_RANGE_C.max);
  requireInRange('relativeHumidityPercent', relativeHumidityPercent, 0, 100);
  const T = tempC;
  const h = relativeHumidityPercent / 100;
  const W = 349 + 1.29 * T + 0.0135 * T * T;
  const K = 0.805 + 0.000736 * T - 0.00000273 * T * T;
  const K1 = 6.27 - 0.00938 * T - 0.000303 * T * T;
  const K2 = 1.91 + 0.0407 * T - 0.000293 * T * T;
  const Kh = K * h;
  const single = Kh / (1 - Kh);
  const multi = (K1 * Kh + 2 * K1 * K2 * Kh * Kh) / (1 + K1 * Kh + K1 * K2 * Kh * Kh);
  return (1800 / W) * (single + multi);
}

/**
 * Temperature-corrected moisture content, %, from a pin (resistance) meter reading calibrated
 * at 20 °C — the equation attributed to Garrahan (1988, Forintek Canada), used with ASTM D7438
 * (memory for the citation): MC = (R + 0.567 − 0.0260·T + 0.000051·T²) / (0.881 · 1.0056^T).
 */
export function correctMeterTemperature(readingPercent: number, woodTempC: number): number {
  requireNonNegative('readingPercent', readingPercent);
  requireInRange('woodTempC', woodTempC, METER_TEMP_RANGE_C.min, METER_TEMP_RANGE_C.max);
  const T = woodTempC;
  const mc =
    (readingPercent + 0.567 - 0.026 * T + 0.000051 * T * T) / (0.881 * Math.pow(1.0056, T));
  return Math.max(0, mc);
}

export interface MeterSpeciesCorrection {
  a: number;
  b: number;
  source: string;
}

const REFERENCE =
  'Reference species: pin meters are commonly calibrated for Douglas-fir (W. L. James, FPL-GTR-6, 1988), so no correction';
const RECALLED =
  'memory: approximate coefficients recalled from meter makers’ species tables for Douglas-fir-calibrated pin meters, not confirmed from a published table; check against your meter’s own table';

/**
 * Species correction MC_species = (MC − b) / a, applied after the temperature correction
 * (James, FPL-GTR-6, 1988, describes the method). Douglas-fir is the reference. The other
 * coefficients are recalled, not confirmed, and `source` says so.
 */
export const SPECIES_METER_CORRECTIONS: Record<SpeciesKey, MeterSpeciesCorrection> = {
  'douglas-fir': { a: 1, b: 0, source: REFERENCE },
  'white-ash': { a: 0.98, b: 0.3, source: RECALLED },
  'northern-red-oak': { a: 1.01, b: 0.4, source: RECALLED },
  'white-oak': { a: 1.03, b: 0.6, source: RECALLED },
  'hard-maple': { a: 1.02, b: 0.5, source: RECALLED },
  'yellow-poplar': { a: 0.96, b: 0.2, source: RECALLED },
};

export function isSpeciesKey(species: string): species is SpeciesKey {
  return (SPECIES_KEYS as readonly string[]).includes(species);
}

/** Species-corrected moisture content, % (MC − b) / a; Douglas-fir unchanged. */
export function correctMeterSpecies(moisturePercent: number, species: string): number {
  requireNonNegative('moisturePercent', moisturePercent);
  if (!isSpeciesKey(species)) {
    throw new DomainError('species', `Unknown species "${species}".`);
  }
  const { a, b } = SPECIES_METER_CORRECTIONS[species];
  return Math.max(0, (moisturePercent - b) / a);
}

export interface CorrectedMoisture {
  temperatureCorrected: number;
  corrected: number;
  notes: string[];
}

/** Temperature then species correction of one reading, with notes on what was not corrected. */
export function correctedMoisture(input: {
  meterReading: number;
  woodTempC: number | null;
  species: string | null;
}): CorrectedMoisture {
  const { meterReading, woodTempC, species } = input;
  requireNonNegative('meterReading', meterReading);
  const notes: string[] = [];
  let temperatureCorrected = meterReading;
  if (woodTempC === null) {
    notes.push(
      'No wood temperature given, so the reading is not corrected for temperature (meters are calibrated at 20 °C).',
    );
  } else {
    temperatureCorrected = correctMeterTemperature(meterReading, woodTempC);
  }
  let corrected = temperatureCorrected;
  if (species === null || species === '') {
    notes.push(
      'No species given, so the reading is not corrected for species (meters are commonly calibrated for Douglas-fir).',
    );
  } else {
    corrected = correctMeterSpecies(temperatureCorrected, species);
  }
  if (corrected > FIBRE_SATURATION_PERCENT || meterReading > FIBRE_SATURATION_PERCENT) {
    notes.push(
      'Above fibre saturation (about 30 %) pin meters are unreliable: treat this as “very wet”, not as an exact figure (Wood Handbook ch. 4; James, FPL-GTR-6).',
    );
  }
  return { temperatureCorrected, corrected, notes };
}

/**
 * Decay-risk level of a corrected moisture content. Below 20 % decay fungi cannot start or
 * progress (Wood Handbook ch. 5); about 30 % is fibre saturation (ch. 4); the 15 % step is
 * common practice.
 */
export function decayRisk(moisturePercent: number): DecayRisk {
  requireNonNegative('moisturePercent', moisturePercent);
  const mc = round1(moisturePercent);
  if (moisturePercent >= FIBRE_SATURATION_PERCENT) {
    return {
      level: 'saturated',
      reason: `${mc} % is at or above fibre saturation (about 30 %, Wood Handbook ch. 4): free water in the wood, decay can be active.`,
    };
  }
  if (moisturePercent >= DECAY_THRESHOLD_PERCENT) {
    return {
      level: 'decay-possible',
      reason: `${mc} % is at or above 20 %, where decay fungi can grow (Wood Handbook ch. 5).`,
    };
  }
  if (moisturePercent >= ELEVATED_THRESHOLD_PERCENT) {
    return {
      level: 'elevated',
      reason: `${mc} % is below the 20 % decay threshold (Wood Handbook ch. 5) but at or above 15 %, wetter than indoor air keeps wood and enough for anobiid beetles (common practice; Wood Handbook Table 14-2).`,
    };
  }
  return {
    level: 'dry',
    reason: `${mc} % is below 15 %, well under the 20 % at which decay fungi can grow (Wood Handbook ch. 5).`,
  };
}

/**
 * A hint when the wood is much wetter than the shop air can explain: more than 5 points above
 * the EMC (common practice) suggests liquid water from somewhere.
 */
export function moistureHint(input: {
  correctedPercent: number;
  emcPercent: number;
}): string | null {
  requireNonNegative('correctedPercent', input.correctedPercent);
  requireNonNegative('emcPercent', input.emcPercent);
  const excess = input.correctedPercent - input.emcPercent;
  if (excess <= WATER_SOURCE_MARGIN_POINTS) return null;
  return `The wood reads ${round1(input.correctedPercent)} %, ${round1(excess)} points above the ${round1(input.emcPercent)} % the shop air would give it. The climate does not explain that: look for a water source (a leak, a blocked drain hole, a damp floor or trapped water under a panel).`;
}

function round1(n: number): number {
  return Math.round(requireFinite('value', n) * 10) / 10;
}
