import { BODY_PLANS } from './plans';
import type { BodyPlan, Zone } from './schema';

export * from './schema';
export { mirrorZoneKey } from './geometry';
export { BODY_PLANS };

export function getBodyPlan(key: string): BodyPlan | undefined {
  return BODY_PLANS.find((p) => p.key === key);
}

export function getZone(plan: BodyPlan, zoneKey: string): Zone | undefined {
  return plan.zones.find((z) => z.key === zoneKey);
}

/** The zone's label, or the key itself when the plan (or the zone) is unknown. */
export function zoneLabel(plan: BodyPlan | undefined, zoneKey: string): string {
  return (plan && getZone(plan, zoneKey)?.label) || zoneKey;
}

/**
 * Area centroid of a polygon. Weighting by area (not averaging the vertices) keeps a
 * shape with a finely divided curve, such as a wheel arch, from pulling it to that side.
 */
export function polygonCentroid(points: [number, number][]): [number, number] {
  let area = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % points.length];
    const cross = x0 * y1 - x1 * y0;
    area += cross;
    cx += (x0 + x1) * cross;
    cy += (y0 + y1) * cross;
  }
  if (Math.abs(area) < 1e-9) {
    // Degenerate (all points on a line): fall back to the mean of the vertices.
    const n = points.length;
    return [points.reduce((s, p) => s + p[0], 0) / n, points.reduce((s, p) => s + p[1], 0) / n];
  }
  return [cx / (3 * area), cy / (3 * area)];
}

/** Even-odd test: is the point inside the polygon? */
export function pointInPolygon([px, py]: [number, number], points: [number, number][]): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const [xi, yi] = points[i];
    const [xj, yj] = points[j];
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * A point inside the polygon for a label or a default pin: the centroid when it falls
 * inside, otherwise (an arch, whose centroid lies in the opening) the middle of the
 * widest horizontal run through the shape.
 */
export function interiorPoint(points: [number, number][]): [number, number] {
  const c = polygonCentroid(points);
  if (pointInPolygon(c, points)) return c;
  const ys = points.map((p) => p[1]);
  const top = Math.min(...ys);
  const bottom = Math.max(...ys);
  let best: [number, number] = c;
  let widest = 0;
  const LINES = 24;
  for (let i = 1; i < LINES; i++) {
    const y = top + ((bottom - top) * i) / LINES;
    const xs: number[] = [];
    for (let a = 0, b = points.length - 1; a < points.length; b = a++) {
      const [xa, ya] = points[a];
      const [xb, yb] = points[b];
      if (ya > y !== yb > y) xs.push(xa + ((y - ya) * (xb - xa)) / (yb - ya));
    }
    xs.sort((p, q) => p - q);
    for (let k = 0; k + 1 < xs.length; k += 2) {
      if (xs[k + 1] - xs[k] > widest) {
        widest = xs[k + 1] - xs[k];
        best = [(xs[k] + xs[k + 1]) / 2, y];
      }
    }
  }
  return best;
}
