/**
 * Unit conversion and formatting for display, in one place: the app computes in millimetres
 * and °C and shows metric or imperial per the workshop's setting. 1 in = 25.4 mm exactly
 * (international inch, 1959).
 */
import type { UNITS } from '../schemas/workshop';
import { requireFinite } from './errors';

export type UnitSystem = (typeof UNITS)[number];

export const MM_PER_IN = 25.4;

export function mmToIn(mm: number): number {
  return requireFinite('mm', mm) / MM_PER_IN;
}

export function inToMm(inches: number): number {
  return requireFinite('inches', inches) * MM_PER_IN;
}

export function cToF(c: number): number {
  return (requireFinite('c', c) * 9) / 5 + 32;
}

export function fToC(f: number): number {
  return ((requireFinite('f', f) - 32) * 5) / 9;
}

/** 2.5 → "2.5", 2 → "2", 2.46 → "2.5" (at most `decimals` places, no trailing zeros). */
function trim(n: number, decimals: number): string {
  const s = n.toFixed(decimals);
  const t = s.includes('.') ? s.replace(/\.?0+$/, '') : s;
  return t === '-0' ? '0' : t;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Inches to the nearest 1/16, as woodworkers read a rule: 9.8 → "9 13/16". */
export function formatInchFraction(inches: number): string {
  requireFinite('inches', inches);
  const sign = inches < 0 ? '-' : '';
  const sixteenths = Math.round(Math.abs(inches) * 16);
  const whole = Math.floor(sixteenths / 16);
  const rest = sixteenths % 16;
  if (rest === 0) return `${sign}${whole}`;
  const d = gcd(rest, 16);
  const fraction = `${rest / d}/${16 / d}`;
  return whole === 0 ? `${sign}${fraction}` : `${sign}${whole} ${fraction}`;
}

/** "250 mm" or "9 13/16 in". */
export function formatLength(mm: number, units: UnitSystem): string {
  requireFinite('mm', mm);
  return units === 'metric' ? `${trim(mm, 1)} mm` : `${formatInchFraction(mmToIn(mm))} in`;
}

/** "18 °C" or "64 °F", to a tenth. */
export function formatTemperature(c: number, units: UnitSystem): string {
  requireFinite('c', c);
  return units === 'metric' ? `${trim(c, 1)} °C` : `${trim(cToF(c), 1)} °F`;
}

/** Cross-section area: "2800 mm²" or "4.34 in²". */
export function formatArea(mm2: number, units: UnitSystem): string {
  requireFinite('mm2', mm2);
  return units === 'metric'
    ? `${trim(mm2, 0)} mm²`
    : `${trim(mm2 / (MM_PER_IN * MM_PER_IN), 2)} in²`;
}

/** Section modulus: "23333 mm³" or "1.42 in³". */
export function formatSectionModulus(mm3: number, units: UnitSystem): string {
  requireFinite('mm3', mm3);
  return units === 'metric' ? `${trim(mm3, 0)} mm³` : `${trim(mm3 / MM_PER_IN ** 3, 2)} in³`;
}

/** Moment of inertia: "583333 mm⁴" or "1.4 in⁴". */
export function formatMomentOfInertia(mm4: number, units: UnitSystem): string {
  requireFinite('mm4', mm4);
  return units === 'metric' ? `${trim(mm4, 0)} mm⁴` : `${trim(mm4 / MM_PER_IN ** 4, 2)} in⁴`;
}
