import * as fc from 'fast-check';
import {
  cToF,
  DomainError,
  formatArea,
  formatInchFraction,
  formatLength,
  formatMomentOfInertia,
  formatSectionModulus,
  formatTemperature,
  fToC,
  inToMm,
  mmToIn,
} from '@/shared/wood';

describe('units', () => {
  // 1 in = 25.4 mm exactly (international inch, 1959); °F = °C × 9/5 + 32.
  it('converts with the exact definitions', () => {
    expect(inToMm(1)).toBe(25.4);
    expect(mmToIn(254)).toBe(10);
    expect(cToF(100)).toBe(212);
    expect(cToF(-40)).toBe(-40);
    expect(fToC(32)).toBe(0);
    expect(fToC(70)).toBeCloseTo(21.111, 3);
  });

  it('round-trips (property)', () => {
    const n = fc.double({ min: -1e6, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(n, (x) => {
        expect(mmToIn(inToMm(x))).toBeCloseTo(x, 6);
        expect(fToC(cToF(x))).toBeCloseTo(x, 6);
      }),
    );
  });

  it('reads inches to the nearest sixteenth, in lowest terms', () => {
    expect(formatInchFraction(9.8)).toBe('9 13/16');
    expect(formatInchFraction(0.5)).toBe('1/2');
    expect(formatInchFraction(2)).toBe('2');
    expect(formatInchFraction(1.99)).toBe('2');
  });

  it('formats lengths, temperatures and section properties per unit system', () => {
    expect(formatLength(250, 'metric')).toBe('250 mm');
    expect(formatLength(12.36, 'metric')).toBe('12.4 mm');
    expect(formatLength(250, 'imperial')).toBe('9 13/16 in');
    expect(formatTemperature(20, 'metric')).toBe('20 °C');
    expect(formatTemperature(20, 'imperial')).toBe('68 °F');
    expect(formatTemperature(21.1, 'imperial')).toBe('70 °F');
    expect(formatArea(2800, 'metric')).toBe('2800 mm²');
    expect(formatArea(645.16, 'imperial')).toBe('1 in²');
    expect(formatSectionModulus(16387.064, 'imperial')).toBe('1 in³');
    expect(formatMomentOfInertia(2 * 416231.4256, 'imperial')).toBe('2 in⁴');
    expect(formatMomentOfInertia(583333.3, 'metric')).toBe('583333 mm⁴');
  });

  it('refuses NaN rather than print it', () => {
    expect(() => formatLength(Number.NaN, 'metric')).toThrow(DomainError);
    expect(() => mmToIn(Number.POSITIVE_INFINITY)).toThrow(DomainError);
  });
});
