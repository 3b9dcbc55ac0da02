/** Numbers, money and dates as the reports print them (one place, so totals and items agree). */
import { formatLength, type UnitSystem } from '@/shared/wood/units';

export function money(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-GB', {
      style: 'currency',
      currency,
      minimumFractionDigits: 2,
      maximumFractionDigits: 2,
    }).format(amount);
  } catch {
    // A workshop may type a currency Intl does not know; print the code before the figure.
    return `${currency} ${amount.toFixed(2)}`;
  }
}

/** Hours to a tenth: 12.5 → "12.5 h". */
export const hours = (h: number) => `${h.toFixed(1)} h`;

/** Board feet to two places: "3.25 bd ft". */
export const boardFeet = (bf: number) => `${bf.toFixed(2)} bd ft`;

/** 2026-03-14 or an ISO timestamp → "14 March 2026". */
export function longDate(iso: string | null): string {
  if (!iso) return 'not recorded';
  const d = new Date(iso.length === 10 ? `${iso}T12:00:00Z` : iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleDateString('en-GB', {
    day: 'numeric',
    month: 'long',
    year: 'numeric',
    timeZone: 'UTC',
  });
}

/** A finished section, "45 × 90 × 1200 mm" or the imperial equivalent. */
export function section(t: number, w: number, l: number, units: UnitSystem): string {
  return `${formatLength(t, units)} × ${formatLength(w, units)} × ${formatLength(l, units)}`;
}

export const percent = (share: number) => `${Math.round(share * 100)}%`;
