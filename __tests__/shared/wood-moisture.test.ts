import * as fc from 'fast-check';
import {
  correctedMoisture,
  correctMeterSpecies,
  correctMeterTemperature,
  decayRisk,
  DomainError,
  equilibriumMoistureContent,
  fToC,
  moistureHint,
  SPECIES_METER_CORRECTIONS,
} from '@/shared/wood';
import { SPECIES_KEYS } from '@/shared/species';

const HUMIDITIES = [10, 20, 30, 40, 50, 60, 70, 80, 90];

function domainErrorOf(fn: () => unknown): DomainError {
  try {
    fn();
  } catch (e) {
    if (e instanceof DomainError) return e;
    throw e;
  }
  throw new Error('expected a DomainError');
}

describe('equilibriumMoistureContent', () => {
  // Wood Handbook (FPL-GTR-190, 2010), ch. 4, Table 4-2, 30 °F row (−1.1 °C), 10–90 % RH.
  const row30F = [2.6, 4.6, 6.3, 7.9, 9.5, 11.3, 13.5, 16.5, 21.0];
  // Wood Handbook (FPL-GTR-190, 2010), ch. 4, Table 4-2, 70 °F row (21.1 °C), 10–90 % RH.
  const row70F = [2.5, 4.5, 6.2, 7.7, 9.2, 11.0, 13.1, 16.0, 20.5];

  it.each(HUMIDITIES.map((rh, i) => [rh, row30F[i]]))(
    'Table 4-2: 30 °F, %s %% RH → %s %% within ±0.1',
    (rh, expected) => {
      expect(Math.abs(equilibriumMoistureContent(fToC(30), rh) - expected)).toBeLessThanOrEqual(
        0.1,
      );
    },
  );

  it.each(HUMIDITIES.map((rh, i) => [rh, row70F[i]]))(
    'Table 4-2: 70 °F, %s %% RH → %s %% within ±0.1',
    (rh, expected) => {
      expect(Math.abs(equilibriumMoistureContent(fToC(70), rh) - expected)).toBeLessThanOrEqual(
        0.1,
      );
    },
  );

  it('gives 0 % in perfectly dry air (Eq. 4-5 at h = 0)', () => {
    expect(equilibriumMoistureContent(20, 0)).toBe(0);
  });

  it('rises with humidity at a fixed temperature (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -30, max: 70, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        (t, a, b) => {
          fc.pre(Math.abs(a - b) > 1e-6);
          const [lo, hi] = a < b ? [a, b] : [b, a];
          expect(equilibriumMoistureContent(t, hi)).toBeGreaterThan(
            equilibriumMoistureContent(t, lo),
          );
        },
      ),
    );
  });

  it.each([
    ['relativeHumidityPercent', 20, 100.5],
    ['relativeHumidityPercent', 20, -1],
    ['relativeHumidityPercent', 20, Number.NaN],
    ['tempC', Number.NaN, 50],
    ['tempC', Number.POSITIVE_INFINITY, 50],
    ['tempC', 120, 50],
  ])('rejects a bad %s (%s °C, %s %%)', (field, t, rh) => {
    const e = domainErrorOf(() => equilibriumMoistureContent(t, rh));
    expect(e.field).toBe(field);
    expect(e.message).toMatch(/must be/);
  });
});

describe('correctMeterTemperature', () => {
  // Garrahan (1988) equation as given in SOURCES.md: R 12 at 20 °C → 12.25
  it('R 12 at 20 °C → 12.25', () => {
    expect(correctMeterTemperature(12, 20)).toBeCloseTo(12.25, 2);
  });

  // Garrahan (1988) equation as given in SOURCES.md: R 15 at 10 °C → 16.44
  it('R 15 at 10 °C → 16.44', () => {
    expect(correctMeterTemperature(15, 10)).toBeCloseTo(16.44, 2);
  });

  it('reads high in warm wood and low in cold wood, so the correction goes the other way', () => {
    // James, FPL-GTR-6 (1988): resistance falls as wood warms, so an uncorrected meter reads high.
    expect(correctMeterTemperature(15, 40)).toBeLessThan(15);
    expect(correctMeterTemperature(15, 0)).toBeGreaterThan(15);
  });

  it.each([
    ['readingPercent', -1, 20],
    ['readingPercent', Number.NaN, 20],
    ['woodTempC', 12, Number.NaN],
    ['woodTempC', 12, 90],
  ])('rejects a bad %s', (field, r, t) => {
    expect(domainErrorOf(() => correctMeterTemperature(r, t)).field).toBe(field);
  });
});

describe('correctMeterSpecies', () => {
  it('leaves Douglas-fir, the reference species, unchanged (James, FPL-GTR-6, 1988)', () => {
    expect(correctMeterSpecies(14.3, 'douglas-fir')).toBe(14.3);
    expect(SPECIES_METER_CORRECTIONS['douglas-fir']).toMatchObject({ a: 1, b: 0 });
  });

  it('applies (MC − b) / a from the coefficient table', () => {
    const { a, b } = SPECIES_METER_CORRECTIONS['white-oak'];
    expect(correctMeterSpecies(15, 'white-oak')).toBeCloseTo((15 - b) / a, 10);
    expect(correctMeterSpecies(15, 'white-oak')).not.toBe(15);
  });

  it('has a coefficient with a stated source for every species, recalled ones marked memory', () => {
    for (const key of SPECIES_KEYS) {
      const c = SPECIES_METER_CORRECTIONS[key];
      expect(c.a).toBeGreaterThan(0.8);
      expect(c.a).toBeLessThan(1.2);
      expect(c.source.length).toBeGreaterThan(20);
      if (key !== 'douglas-fir') expect(c.source).toMatch(/memory/);
    }
  });

  it('rejects an unknown species and a negative reading', () => {
    expect(domainErrorOf(() => correctMeterSpecies(12, 'teak')).field).toBe('species');
    expect(domainErrorOf(() => correctMeterSpecies(-2, 'white-ash')).field).toBe('moisturePercent');
  });
});

describe('correctedMoisture', () => {
  it('corrects for temperature, then species', () => {
    const r = correctedMoisture({ meterReading: 15, woodTempC: 10, species: 'white-oak' });
    expect(r.temperatureCorrected).toBeCloseTo(16.44, 2);
    expect(r.corrected).toBeCloseTo(correctMeterSpecies(r.temperatureCorrected, 'white-oak'), 10);
    expect(r.notes).toEqual([]);
  });

  it('says so when the temperature or species is missing, and passes the reading through', () => {
    const r = correctedMoisture({ meterReading: 13, woodTempC: null, species: null });
    expect(r.temperatureCorrected).toBe(13);
    expect(r.corrected).toBe(13);
    expect(r.notes.join(' ')).toMatch(/temperature/);
    expect(r.notes.join(' ')).toMatch(/species/);
  });

  it('warns that meters are unreliable above fibre saturation (Wood Handbook ch. 4: about 30 %)', () => {
    const r = correctedMoisture({ meterReading: 34, woodTempC: 20, species: 'douglas-fir' });
    expect(r.notes.join(' ')).toMatch(/fibre saturation/);
    expect(
      correctedMoisture({ meterReading: 18, woodTempC: 20, species: 'douglas-fir' }).notes,
    ).toEqual([]);
  });

  it('rejects a negative reading and an unknown species', () => {
    expect(
      domainErrorOf(() => correctedMoisture({ meterReading: -1, woodTempC: 20, species: null }))
        .field,
    ).toBe('meterReading');
    expect(
      domainErrorOf(() => correctedMoisture({ meterReading: 12, woodTempC: 20, species: 'balsa' }))
        .field,
    ).toBe('species');
  });
});

describe('decayRisk', () => {
  it.each([
    // common practice: below 15 % counts as dry
    [8, 'dry'],
    [14.9, 'dry'],
    // common practice: 15 % and over is elevated (anobiids need about 15 %, Wood Handbook Table 14-2)
    [15, 'elevated'],
    [19.9, 'elevated'],
    // Wood Handbook (FPL-GTR-190), ch. 5: decay can start or progress at 20 % MC and above
    [20, 'decay-possible'],
    [29.9, 'decay-possible'],
    // Wood Handbook (FPL-GTR-190), ch. 4: fibre saturation averages about 30 % MC
    [30, 'saturated'],
    [80, 'saturated'],
  ] as const)('%s %% → %s', (mc, level) => {
    const r = decayRisk(mc);
    expect(r.level).toBe(level);
    expect(r.reason).toContain(String(mc));
  });

  it('names its source or marks the rule of thumb', () => {
    expect(decayRisk(22).reason).toMatch(/Wood Handbook ch\. 5/);
    expect(decayRisk(17).reason).toMatch(/common practice/);
    expect(decayRisk(31).reason).toMatch(/Wood Handbook ch\. 4/);
  });

  it('rejects negative and NaN moisture', () => {
    expect(domainErrorOf(() => decayRisk(-0.1)).field).toBe('moisturePercent');
    expect(domainErrorOf(() => decayRisk(Number.NaN)).field).toBe('moisturePercent');
  });
});

describe('moistureHint', () => {
  it('points to a water source when the reading is more than 5 points over the EMC (common practice)', () => {
    const hint = moistureHint({ correctedPercent: 22, emcPercent: 11 });
    expect(hint).toMatch(/water source/);
    expect(hint).toContain('11 points');
  });

  it('says nothing when the climate explains the reading', () => {
    expect(moistureHint({ correctedPercent: 15, emcPercent: 11 })).toBeNull();
    expect(moistureHint({ correctedPercent: 16, emcPercent: 11 })).toBeNull();
  });

  it('rejects NaN', () => {
    expect(
      domainErrorOf(() => moistureHint({ correctedPercent: Number.NaN, emcPercent: 11 })).field,
    ).toBe('correctedPercent');
  });
});
