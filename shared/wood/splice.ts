/**
 * Scarf splices. FAA AC 43.13-1B (1998), ch. 1: §1-39 the scarf is the most satisfactory end
 * joint between solid members; §1-40 two splices, or a splice and a reinforcing plate, no
 * closer than three times the length of the longer splice; slopes about 1:10 to 1:12 for
 * solid members (Fig. 1-4, memory). Aircraft practice is the strictest published reference,
 * so these are conservative defaults for a vehicle body, not rules.
 */
import { requireInRange, requirePositive } from './errors';
import type { SpliceGeometry } from './types';

/** Splice spacing as a multiple of the longer splice's length (FAA AC 43.13-1B §1-40). */
export const SPLICE_SPACING_FACTOR = 3;

/** Length of a scarf through `depth` at a slope of 1:`slope`, same unit as depth. */
export function scarfLength(depth: number, slope: number): number {
  requirePositive('depth', depth);
  requireInRange('slope', slope, 1, 100);
  return depth * slope;
}

export function spliceGeometry(depthMm: number, slope: number): SpliceGeometry {
  const scarfLengthMm = scarfLength(requirePositive('depthMm', depthMm), slope);
  return { slope, scarfLengthMm, minSpacingMm: SPLICE_SPACING_FACTOR * scarfLengthMm };
}
