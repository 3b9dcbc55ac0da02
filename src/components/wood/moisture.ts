import {
  correctedMoisture,
  decayRisk,
  DomainError,
  equilibriumMoistureContent,
  moistureHint,
} from '@/shared/wood';
import type { DecayRisk } from '@/shared/wood/types';
import { parseNumber } from '@/src/components/findings/form-values';

export type ShopClimate = { airTempC: number | null; relativeHumidity: number | null };

export type MoistureView = {
  /** What the typed reading means; null until a usable reading is typed. */
  reading: {
    meter: number;
    woodTempC: number | null;
    temperatureCorrected: number;
    corrected: number;
    notes: string[];
    risk: DecayRisk;
  } | null;
  /** The survey's equilibrium moisture content; null when no shop climate was recorded. */
  emc: { percent: number; airTempC: number; relativeHumidity: number } | null;
  /** "Look for a water source" when the reading is far above what the climate explains. */
  hint: string | null;
  /** Why a typed value cannot be used (the shared functions' own words). */
  problem: string | null;
};

type Input = {
  meterReading: string;
  woodTempC: string;
  species: string | null;
  climate: ShopClimate | null;
};

/** Reads the half-typed form values through the shared wood functions, never throwing. */
export function readMoisture({ meterReading, woodTempC, species, climate }: Input): MoistureView {
  let problem: string | null = null;
  const guard = <T>(fn: () => T): T | null => {
    try {
      return fn();
    } catch (e) {
      if (!(e instanceof DomainError)) throw e;
      problem ??= e.message;
      return null;
    }
  };

  const air = climate?.airTempC ?? null;
  const rh = climate?.relativeHumidity ?? null;
  const emcPercent =
    air === null || rh === null ? null : guard(() => equilibriumMoistureContent(air, rh));
  const emc =
    emcPercent === null || air === null || rh === null
      ? null
      : { percent: emcPercent, airTempC: air, relativeHumidity: rh };

  const meter = parseNumber(meterReading);
  const temp = parseNumber(woodTempC);
  let reading: MoistureView['reading'] = null;
  if (meter !== null && !Number.isNaN(meter) && !Number.isNaN(temp)) {
    reading = guard(() => {
      const c = correctedMoisture({ meterReading: meter, woodTempC: temp, species });
      return {
        meter,
        woodTempC: temp,
        temperatureCorrected: c.temperatureCorrected,
        corrected: c.corrected,
        notes: c.notes,
        risk: decayRisk(c.corrected),
      };
    });
  }
  const hint =
    reading && emc
      ? guard(() => moistureHint({ correctedPercent: reading.corrected, emcPercent: emc.percent }))
      : null;
  return { reading, emc, hint, problem };
}

/** One decimal, as the meter and the tables give it. */
export function mc(percent: number): string {
  return `${(Math.round(percent * 10) / 10).toFixed(1)} %`;
}
