import {
  arc,
  archBand,
  boards,
  closed,
  flipY,
  line,
  mirrorSideView,
  rect,
  roundedRect,
  shape,
  spread,
  strip,
  wheel,
  type Pt,
} from './geometry';
import { centre, doorZones, numbered, pair } from './members';
import { chassisBelow, planBonnet, planFrontWings, planRunningBoards, sideFront } from './outlines';
import type { BodyPlan, BodyPlanView, Zone } from './schema';

/**
 * Two-door fixed-head coupé: long doors with a timber window frame (top rail), a short
 * quarter window, the roof sweeping down into raked rear pillars, and a boot lid on a
 * sloping tail. Front to the left, about 0.2 px per mm.
 */
const W = 1000;
const H = 420;
const FRONT_WHEEL: Pt = [200, 327];
const REAR_WHEEL: Pt = [760, 327];
const WHEEL_R = 68;
const SLATS = 5;

const zones: Zone[] = [
  ...pair('sill-{side}', '{Side} sill', {
    trade: 'sill',
    cls: 'primary',
    species: 'white-ash',
    section: [95, 50],
    lengthMm: 1600,
  }),
  ...pair('hinge-pillar-{side}', '{Side} hinge pillar', {
    trade: 'hinge-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 50],
    lengthMm: 980,
  }),
  ...pair('lock-pillar-{side}', '{Side} lock pillar', {
    trade: 'lock-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 50],
    lengthMm: 900,
  }),
  ...pair('rear-pillar-{side}', '{Side} rear pillar', {
    trade: 'rear-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 45],
    lengthMm: 480,
  }),
  ...pair('roof-rail-{side}', '{Side} roof rail', {
    trade: 'roof-rail',
    cls: 'primary',
    species: 'white-ash',
    section: [60, 45],
    lengthMm: 1750,
  }),
  ...pair('waist-rail-rear-{side}', '{Side} quarter waist rail', {
    trade: 'waist-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 38],
    lengthMm: 780,
  }),
  ...pair('wheel-arch-{side}', '{Side} rear wheel arch', {
    trade: 'wheel-arch',
    cls: 'secondary',
    species: 'white-ash',
    section: [60, 40],
    lengthMm: 1100,
  }),
  ...doorZones(null, { railMm: 940, stileMm: 880, topRail: true }),
  centre('header-rail-front', 'Front header rail', {
    trade: 'header-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 40],
    lengthMm: 1260,
    assembly: 'roof-frame',
  }),
  centre('header-rail-rear', 'Rear header rail', {
    trade: 'header-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 40],
    lengthMm: 1260,
    assembly: 'roof-frame',
  }),
  ...numbered(SLATS, 'roof-slat', 'Roof slat', {
    trade: 'roof-slat',
    cls: 'non-structural',
    species: 'white-ash',
    section: [45, 12],
    lengthMm: 1280,
    assembly: 'roof-frame',
  }),
  centre('dash-rail', 'Dash rail', {
    trade: 'dash-rail',
    cls: 'primary',
    species: 'white-ash',
    section: [75, 45],
    lengthMm: 1460,
  }),
  centre('belt-rail-rear', 'Rear belt rail', {
    trade: 'belt-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [60, 38],
    lengthMm: 1340,
  }),
  centre('boot-frame', 'Boot lid frame', {
    trade: 'boot-frame',
    cls: 'secondary',
    species: 'yellow-poplar',
    section: [45, 32],
    lengthMm: 1200,
    assembly: 'boot-lid',
  }),
  ...(['front', 'centre', 'rear'] as const).map((pos) =>
    centre(`cross-member-${pos}`, `${pos[0].toUpperCase()}${pos.slice(1)} cross member`, {
      trade: 'cross-member',
      cls: 'primary',
      species: 'white-ash',
      section: [75, 50],
      lengthMm: 1460,
    }),
  ),
  centre('floor-board-1', 'Floor board 1', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [520, 19],
    lengthMm: 1440,
  }),
  centre('floor-board-2', 'Floor board 2', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [520, 19],
    lengthMm: 1440,
  }),
  centre('floor-board-3', 'Seat pan board', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [200, 19],
    lengthMm: 1440,
  }),
  centre('heel-board', 'Heel board', {
    trade: 'heel-board',
    cls: 'secondary',
    species: 'yellow-poplar',
    section: [220, 19],
    lengthMm: 1440,
  }),
];

// Side view: waist at y 186, roof rail underside at y 106, sill top at y 285.
const WAIST = 186;
const ROOF = 106;

const left: BodyPlanView = {
  key: 'left',
  title: 'Left side',
  width: W,
  height: H,
  outline: [
    closed([
      [106, 300],
      [106, 178],
      [344, 168],
      [384, 94],
      [404, 88],
      [640, 88],
      [700, 98],
      [744, 126],
      [792, 190],
      [862, 204],
      [908, 236],
      [928, 290],
      [920, 308],
      ...arc(REAR_WHEEL[0], REAR_WHEEL[1], 92, 308),
      [360, 308],
      [360, 300],
    ]),
    ...sideFront({ wheel: FRONT_WHEEL, boardEndX: 676, boardY: 312, bonnetY: 178 }),
    closed(rect(936, 296, 10, 26)),
    // Door glass and quarter light.
    closed([
      [414, 120],
      [574, 120],
      [574, 182],
      [394, 182],
    ]),
    closed([
      [610, 110],
      [640, 110],
      [684, 118],
      [712, 136],
      [746, 182],
      [610, 182],
    ]),
    ...wheel(...FRONT_WHEEL, WHEEL_R),
    ...wheel(...REAR_WHEEL, WHEEL_R),
  ],
  shapes: [
    shape('sill-left', rect(360, 285, 315, 19)),
    shape('hinge-pillar-left', [
      [360, 285],
      [374, 285],
      [374, WAIST],
      [398, ROOF],
      [384, ROOF],
      [360, WAIST],
    ]),
    shape('lock-pillar-left', rect(592, ROOF, 14, 285 - ROOF)),
    shape(
      'roof-rail-left',
      strip(
        [
          [384, 100],
          [640, 100],
          [690, 110],
          [726, 132],
        ],
        12,
      ),
    ),
    shape(
      'rear-pillar-left',
      strip(
        [
          [726, 132],
          [752, 160],
          [776, 196],
        ],
        14,
      ),
    ),
    shape('waist-rail-rear-left', rect(608, WAIST, 154, 10)),
    shape('wheel-arch-left', archBand(REAR_WHEEL[0], REAR_WHEEL[1], 76, 88, 304)),
    shape(
      'boot-frame',
      strip(
        [
          [792, 202],
          [850, 214],
          [892, 242],
          [910, 292],
        ],
        12,
      ),
    ),
    // The door: its window frame follows the rake of the hinge pillar.
    shape('door-left-hinge-stile', [
      [376, 284],
      [388, 284],
      [388, WAIST],
      [410, 116],
      [402, 108],
      [376, WAIST],
    ]),
    shape('door-left-top-rail', rect(405, 108, 173, 8)),
    shape('door-left-shut-stile', rect(578, 108, 12, 176)),
    shape('door-left-waist-rail', rect(389, WAIST, 189, 10)),
    shape('door-left-bottom-rail', rect(389, 268, 189, 16)),
  ],
};

// Plan views: y runs across the car (1640 mm ≈ 328 px), symmetric about y = 210.
const ROOF_Y0 = 70;
const ROOF_Y1 = 350;
const rearWing: Pt[] = [
  [686, 46],
  [704, 32],
  [780, 26],
  [836, 32],
  [854, 46],
];
const planBody = [
  closed(roundedRect(344, 46, 584, 328, 44)),
  ...planBonnet(FRONT_WHEEL[0], 344),
  ...planRunningBoards(310, 676),
  closed(rect(936, 130, 10, 160)),
];

const top: BodyPlanView = {
  key: 'top',
  title: 'Top (front to the left, left side at the bottom)',
  width: W,
  height: H,
  outline: [
    ...planBody,
    ...planFrontWings(FRONT_WHEEL[0]),
    line(rearWing),
    line(flipY(rearWing, 210)),
    closed(rect(364, 66, 6, 288)),
    closed(rect(734, 100, 30, 220)),
  ],
  shapes: [
    shape('dash-rail', rect(344, 64, 14, 292)),
    shape('roof-rail-right', rect(386, ROOF_Y0, 340, 12)),
    shape('roof-rail-left', rect(386, ROOF_Y1 - 12, 340, 12)),
    shape('header-rail-front', rect(386, ROOF_Y0 + 12, 12, ROOF_Y1 - ROOF_Y0 - 24)),
    shape('header-rail-rear', rect(714, ROOF_Y0 + 12, 12, ROOF_Y1 - ROOF_Y0 - 24)),
    ...spread(SLATS, 398, 714, 9).map((x, i) =>
      shape(`roof-slat-${i + 1}`, rect(x, ROOF_Y0 + 12, 9, ROOF_Y1 - ROOF_Y0 - 24)),
    ),
    shape('belt-rail-rear', rect(772, 76, 12, 268)),
    shape('boot-frame', rect(796, 96, 110, 228)),
  ],
};

// Seen from below the left side is at the top of the drawing.
const SILL_L: [number, number] = [48, 64];
const SILL_R: [number, number] = [356, 372];
const BETWEEN = SILL_R[0] - SILL_L[1];

const underside: BodyPlanView = {
  key: 'underside',
  title: 'Underside (seen from below, front to the left, left side at the top)',
  width: W,
  height: H,
  outline: [...planBody, ...chassisBelow(FRONT_WHEEL[0], REAR_WHEEL[0], WHEEL_R, 930)],
  shapes: [
    shape('sill-left', rect(360, SILL_L[0], 315, SILL_L[1] - SILL_L[0])),
    shape('sill-right', rect(360, SILL_R[0], 315, SILL_R[1] - SILL_R[0])),
    shape('cross-member-front', rect(360, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-centre', rect(591, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-rear', rect(660, SILL_L[1], 15, BETWEEN)),
    ...boards(2, 377, 589, 2).map(([x, w], i) =>
      shape(`floor-board-${i + 1}`, rect(x, SILL_L[1] + 2, w, BETWEEN - 4)),
    ),
    shape('heel-board', rect(608, SILL_L[1] + 2, 14, BETWEEN - 4)),
    shape('floor-board-3', rect(624, SILL_L[1] + 2, 34, BETWEEN - 4)),
  ],
};

export const twoDoorCoupe: BodyPlan = {
  key: 'coupe-2d',
  name: 'Fixed-head coupé, two doors',
  description:
    'Two-door coupé with a slatted roof and long doors carrying a timber window frame; the roof rails sweep down into raked rear pillars over a sloping boot lid.',
  views: [left, mirrorSideView(left, 'Right side'), top, underside],
  zones,
};
