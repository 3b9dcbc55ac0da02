/** Timber measures: board feet and rough thickness in quarters (SOURCES.md, "Lumber"). */
import { DomainError, requirePositive } from './errors';

/** Board foot = 144 in³ (12 × 12 × 1 in), figured on nominal thickness; under 1 in counts as 1 in. */
export function boardFeet(thicknessIn: number, widthIn: number, lengthIn: number): number {
  const t = Math.max(1, requirePositive('thicknessIn', thicknessIn));
  return (t * requirePositive('widthIn', widthIn) * requirePositive('lengthIn', lengthIn)) / 144;
}

/**
 * Hardwood rough thickness in quarters → standard surfaced-two-sides thickness, inches
 * (NHLA rules; memory for the attribution).
 */
export const SURFACED_THICKNESS_IN: Readonly<Record<number, number>> = {
  4: 13 / 16,
  5: 1 + 1 / 16,
  6: 1 + 5 / 16,
  8: 1 + 3 / 4,
  10: 2 + 1 / 4,
  12: 2 + 3 / 4,
  16: 3 + 3 / 4,
};

export const STANDARD_QUARTERS: readonly number[] = Object.keys(SURFACED_THICKNESS_IN)
  .map(Number)
  .sort((a, b) => a - b);

/** Tolerance for inch values converted from millimetres (well under a planer pass). */
const EPSILON_IN = 1e-6;

/** The smallest standard rough thickness whose S2S thickness covers the finished size. */
export function roughThicknessQuarters(finishedThicknessIn: number): number {
  requirePositive('finishedThicknessIn', finishedThicknessIn);
  const q = STANDARD_QUARTERS.find(
    (n) => SURFACED_THICKNESS_IN[n] + EPSILON_IN >= finishedThicknessIn,
  );
  if (q === undefined) {
    throw new DomainError(
      'finishedThicknessIn',
      `A finished thickness of ${finishedThicknessIn} in is more than 16/4 stock gives (3 3/4 in surfaced); glue up or order special stock.`,
    );
  }
  return q;
}

/** Standard S2S thickness, inches, of rough stock in quarters (4 = 4/4). */
export function surfacedThicknessIn(quarters: number): number {
  const t = SURFACED_THICKNESS_IN[quarters];
  if (t === undefined) {
    throw new DomainError(
      'quarters',
      `${quarters}/4 is not a standard rough thickness (${STANDARD_QUARTERS.map((n) => `${n}/4`).join(', ')}).`,
    );
  }
  return t;
}
