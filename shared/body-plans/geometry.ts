import type { BodyPlanView, Outline, ZoneShape } from './schema';

/**
 * Drawing helpers for the plan modules. The side, top and underside views share
 * one scale (about 0.2 px per mm) and one x axis, with the front of the vehicle to the
 * left, so a member sits at the same x in every view it appears in.
 */
export type Pt = [number, number];

const round = (n: number) => Math.round(n * 10) / 10;
const pt = (x: number, y: number): Pt => [round(x), round(y)];

export function rect(x: number, y: number, w: number, h: number): Pt[] {
  return [pt(x, y), pt(x + w, y), pt(x + w, y + h), pt(x, y + h)];
}

/**
 * A member of even width along a centreline (a straight bar, or a bent rail when the
 * path has several points). Corners are mitred so the two edges stay parallel.
 */
export function strip(path: Pt[], width: number): Pt[] {
  const half = width / 2;
  const normals = path.map((_, i) => {
    const a = path[Math.max(0, i - 1)];
    const b = path[Math.min(path.length - 1, i + 1)];
    const dx = b[0] - a[0];
    const dy = b[1] - a[1];
    const len = Math.hypot(dx, dy) || 1;
    return [-dy / len, dx / len] as Pt;
  });
  // At a bend the offset grows by 1/cos(half the turn) so the edges meet square.
  const scale = path.map((_, i) => {
    if (i === 0 || i === path.length - 1) return 1;
    const seg = (p: Pt, q: Pt): Pt => {
      const l = Math.hypot(q[0] - p[0], q[1] - p[1]) || 1;
      return [(q[0] - p[0]) / l, (q[1] - p[1]) / l];
    };
    const u = seg(path[i - 1], path[i]);
    const v = seg(path[i], path[i + 1]);
    const cosHalf = Math.sqrt(Math.max(0.05, (1 + u[0] * v[0] + u[1] * v[1]) / 2));
    return 1 / cosHalf;
  });
  const side = (sign: number) =>
    path.map(([x, y], i) =>
      pt(x + sign * normals[i][0] * half * scale[i], y + sign * normals[i][1] * half * scale[i]),
    );
  return [...side(1), ...side(-1).reverse()];
}

/** Points on a circle (wheels, hubs); y grows downwards as in the views. */
export function circle(cx: number, cy: number, r: number, steps = 36): Pt[] {
  return Array.from({ length: steps }, (_, i) => {
    const a = (2 * Math.PI * i) / steps;
    return pt(cx + r * Math.cos(a), cy + r * Math.sin(a));
  });
}

/**
 * Points on the part of a circle above the line y = `baseY`, from the right-hand foot over
 * the top to the left-hand foot (wheel openings in outlines).
 */
export function arc(cx: number, cy: number, r: number, baseY: number, steps = 18): Pt[] {
  const start = Math.asin(Math.max(-1, Math.min(1, (cy - baseY) / r)));
  return Array.from({ length: steps + 1 }, (_, i) => {
    const a = start + ((Math.PI - 2 * start) * i) / steps;
    return pt(cx + r * Math.cos(a), cy - r * Math.sin(a));
  });
}

/**
 * A wheel arch: a band between two radii over the wheel, cut off flat at `baseY` so both
 * feet land on the same line (the underside of the sill).
 */
export function archBand(
  cx: number,
  cy: number,
  rInner: number,
  rOuter: number,
  baseY: number,
  steps = 18,
): Pt[] {
  return [...arc(cx, cy, rOuter, baseY, steps), ...arc(cx, cy, rInner, baseY, steps).reverse()];
}

/** A rectangle with rounded corners (outlines only). */
export function roundedRect(
  x: number,
  y: number,
  w: number,
  h: number,
  r: number,
  steps = 5,
): Pt[] {
  const corner = (cx: number, cy: number, from: number) =>
    Array.from({ length: steps + 1 }, (_, i) => {
      const a = from + (Math.PI / 2) * (i / steps);
      return pt(cx + r * Math.cos(a), cy + r * Math.sin(a));
    });
  return [
    ...corner(x + w - r, y + r, -Math.PI / 2),
    ...corner(x + w - r, y + h - r, 0),
    ...corner(x + r, y + h - r, Math.PI / 2),
    ...corner(x + r, y + r, Math.PI),
  ];
}

/** The same points reflected across the horizontal line y = `axis`. */
export function flipY(points: Pt[], axis: number): Pt[] {
  return points.map(([x, y]) => pt(x, 2 * axis - y)).reverse();
}

/**
 * Start positions of `count` members of thickness `size` spread evenly over [from, to],
 * with equal gaps between them and at both ends.
 */
export function spread(count: number, from: number, to: number, size: number): number[] {
  const gap = (to - from - count * size) / (count + 1);
  return Array.from({ length: count }, (_, i) => round(from + gap + i * (size + gap)));
}

/**
 * `count` boards laid edge to edge over [from, to], each leaving `gap` to the next.
 * Returns [start, width] for each board.
 */
export function boards(count: number, from: number, to: number, gap: number): [number, number][] {
  const width = (to - from - (count - 1) * gap) / count;
  return Array.from({ length: count }, (_, i) => [round(from + i * (width + gap)), round(width)]);
}

/** The right-side counterpart of a left-side key ('sill-left' → 'sill-right'). */
export function mirrorZoneKey(key: string): string {
  return key
    .split('-')
    .map((t) => (t === 'left' ? 'right' : t === 'right' ? 'left' : t))
    .join('-');
}

/**
 * The right side view drawn from the left one: seen from the other side the vehicle
 * faces the other way, so x is mirrored and each sided member becomes its counterpart.
 */
export function mirrorSideView(left: BodyPlanView, title: string): BodyPlanView {
  const flip = (points: Pt[]): Pt[] => points.map(([x, y]) => pt(left.width - x, y)).reverse();
  return {
    key: 'right',
    title,
    width: left.width,
    height: left.height,
    outline: left.outline.map((o): Outline => ({
      closed: o.closed,
      points: flip(o.points as Pt[]),
    })),
    shapes: left.shapes.map((s): ZoneShape => ({
      zone: mirrorZoneKey(s.zone),
      points: flip(s.points as Pt[]),
    })),
  };
}

export const shape = (zone: string, points: Pt[]): ZoneShape => ({ zone, points });
export const closed = (points: Pt[]): Outline => ({ points, closed: true });
export const line = (points: Pt[]): Outline => ({ points, closed: false });

/** Tyre, wheel disc and hub as outlines. */
export function wheel(cx: number, cy: number, r: number): Outline[] {
  return [
    closed(circle(cx, cy, r)),
    closed(circle(cx, cy, r * 0.65)),
    closed(circle(cx, cy, r * 0.18, 16)),
  ];
}
