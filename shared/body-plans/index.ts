import type { BodyPlan, Zone } from './schema';

export * from './schema';

/**
 * Filled in by the body-plan data modules (one file per plan in this folder). Kept as a
 * function-backed registry so the client and server share one list.
 */
import { BODY_PLANS } from './plans';

export { BODY_PLANS };

export function getBodyPlan(key: string): BodyPlan | undefined {
  return BODY_PLANS.find((p) => p.key === key);
}

export function getZone(plan: BodyPlan, zoneKey: string): Zone | undefined {
  return plan.zones.find((z) => z.key === zoneKey);
}

/** Centroid of a polygon (for labels and default pin positions). */
export function polygonCentroid(points: [number, number][]): [number, number] {
  let x = 0;
  let y = 0;
  for (const [px, py] of points) {
    x += px;
    y += py;
  }
  return [x / points.length, y / points.length];
}
