import { roundPoint, type ViewPoint } from './view-point';

/**
 * Where a click landed, in view units: the browser knows the drawing's current transform,
 * so the viewBox scaling is undone exactly (the scale argument is not needed here).
 */
export function pressPoint(event: unknown, _scale?: number): ViewPoint | undefined {
  const e = event as { clientX?: unknown; clientY?: unknown; currentTarget?: unknown } | undefined;
  if (typeof e?.clientX !== 'number' || typeof e.clientY !== 'number') return undefined;
  const svg = (e.currentTarget as SVGGraphicsElement | undefined)?.ownerSVGElement;
  const matrix = svg?.getScreenCTM();
  if (!svg || !matrix) return undefined;
  const p = svg.createSVGPoint();
  p.x = e.clientX;
  p.y = e.clientY;
  const local = p.matrixTransform(matrix.inverse());
  return roundPoint(local.x, local.y);
}
