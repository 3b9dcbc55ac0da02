/** A position in a body-plan view's own coordinate box (origin top-left, y down). */
export type ViewPoint = { x: number; y: number };

/** Pins are stored to a tenth of a view unit; finer is noise from the finger. */
export function roundPoint(x: number, y: number): ViewPoint {
  return { x: Math.round(x * 10) / 10, y: Math.round(y * 10) / 10 };
}
