import { arc, circle, closed, flipY, line, rect, type Pt } from './geometry';
import type { Outline } from './schema';

/**
 * Outline pieces the plans have in common: the bonnet and wings ahead of the body and the
 * chassis under it. They are decoration for orientation, not zones, so they are drawn
 * the same way on every plan and placed by the wheel positions.
 */

/** Side view: radiator shell, bonnet louvres, headlamp, front wing and running board. */
export function sideFront(opts: {
  wheel: Pt;
  /** Where the running board ends, at the rear wing or wheel arch. */
  boardEndX: number;
  /** Top of the running board. */
  boardY: number;
  /** Bonnet top at the radiator. */
  bonnetY: number;
}): Outline[] {
  const [wx, wy] = opts.wheel;
  const { boardY } = opts;
  return [
    closed([
      [wx - 120, 302],
      [wx - 120, opts.bonnetY + 8],
      [wx - 110, opts.bonnetY - 2],
      [wx - 94, opts.bonnetY - 2],
      [wx - 94, 302],
    ]),
    ...[0, 1, 2, 3, 4].map((i) =>
      line([
        [wx + 10 + i * 18, opts.bonnetY + 34],
        [wx + 10 + i * 18, opts.bonnetY + 84],
      ]),
    ),
    closed(circle(wx - 70, opts.bonnetY + 22, 16, 20)),
    line([
      [wx - 126, boardY + 6],
      ...arc(wx, wy, 86, boardY + 6).reverse(),
      [wx + 110, boardY],
      [opts.boardEndX, boardY],
    ]),
    closed(rect(wx + 110, boardY, opts.boardEndX - wx - 110, 6)),
    closed(rect(wx - 140, 304, 10, 26)),
  ];
}

/** Plan view (seen from above or below): radiator, bonnet back to the scuttle, bumper. */
export function planBonnet(wheelX: number, scuttleX: number): Outline[] {
  return [
    closed(rect(wheelX - 118, 148, scuttleX - wheelX + 118, 124)),
    closed(rect(wheelX - 128, 148, 10, 124)),
    closed(rect(wheelX - 142, 130, 10, 160)),
  ];
}

/** Plan view from above: both front wings over the wheels. */
export function planFrontWings(wheelX: number): Outline[] {
  const wing: Pt[] = [
    [wheelX - 96, 148],
    [wheelX - 92, 100],
    [wheelX - 72, 62],
    [wheelX - 34, 44],
    [wheelX + 40, 40],
    [wheelX + 96, 44],
    [wheelX + 114, 62],
    [wheelX + 120, 148],
  ];
  return [closed(wing), closed(flipY(wing, 210))];
}

/** Plan view: running boards along both sides. */
export function planRunningBoards(x0: number, x1: number): Outline[] {
  return [closed(rect(x0, 30, x1 - x0, 12)), closed(rect(x0, 378, x1 - x0, 12))];
}

/** Underside: the chassis side members, both axles and the four tyres. */
export function chassisBelow(
  frontX: number,
  rearX: number,
  wheelR: number,
  endX: number,
): Outline[] {
  return [
    closed(rect(frontX - 114, 120, endX - frontX + 114, 10)),
    closed(rect(frontX - 114, 290, endX - frontX + 114, 10)),
    ...[frontX, rearX].flatMap((x) => [
      line([
        [x, 70],
        [x, 350],
      ]),
      closed(rect(x - wheelR, 44, wheelR * 2, 26)),
      closed(rect(x - wheelR, 350, wheelR * 2, 26)),
    ]),
  ];
}
