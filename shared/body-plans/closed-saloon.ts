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
import { centre, doorShapes, doorZones, numbered, pair } from './members';
import { chassisBelow, planBonnet, planFrontWings, planRunningBoards, sideFront } from './outlines';
import type { BodyPlan, BodyPlanView, Zone } from './schema';

/**
 * Closed four-door saloon on a separate chassis: an ash frame skinned in sheet metal.
 * Front doors hang on the front pillars and rear doors on the rear hinge pillars, so
 * both shut on the centre (lock) pillar. About 0.2 px per mm, front to the left.
 */
const W = 1000;
const H = 420;
const FRONT_WHEEL: Pt = [190, 327];
const REAR_WHEEL: Pt = [765, 327];
const WHEEL_R = 68;
const SLATS = 4;

const zones: Zone[] = [
  ...pair('sill-{side}', '{Side} sill', {
    trade: 'sill',
    cls: 'primary',
    species: 'white-ash',
    section: [95, 50],
    lengthMm: 1720,
  }),
  ...pair('hinge-pillar-front-{side}', '{Side} front hinge pillar', {
    trade: 'hinge-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 50],
    lengthMm: 1050,
  }),
  ...pair('lock-pillar-{side}', '{Side} lock pillar', {
    trade: 'lock-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [65, 50],
    lengthMm: 1000,
  }),
  ...pair('hinge-pillar-rear-{side}', '{Side} rear hinge pillar', {
    trade: 'hinge-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [65, 50],
    lengthMm: 1000,
  }),
  ...pair('rear-pillar-{side}', '{Side} rear pillar', {
    trade: 'rear-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 45],
    lengthMm: 950,
  }),
  ...pair('roof-rail-{side}', '{Side} roof rail', {
    trade: 'roof-rail',
    cls: 'primary',
    species: 'white-ash',
    section: [60, 45],
    lengthMm: 2600,
  }),
  ...pair('waist-rail-rear-{side}', '{Side} rear quarter waist rail', {
    trade: 'waist-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 38],
    lengthMm: 1000,
  }),
  ...pair('wheel-arch-{side}', '{Side} rear wheel arch', {
    trade: 'wheel-arch',
    cls: 'secondary',
    species: 'white-ash',
    section: [60, 40],
    lengthMm: 1100,
  }),
  ...doorZones('front', { railMm: 700, stileMm: 520 }),
  ...doorZones('rear', { railMm: 540, stileMm: 520 }),
  centre('header-rail-front', 'Front header rail', {
    trade: 'header-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 40],
    lengthMm: 1280,
    assembly: 'roof-frame',
  }),
  centre('header-rail-rear', 'Rear header rail', {
    trade: 'header-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 40],
    lengthMm: 1280,
    assembly: 'roof-frame',
  }),
  ...numbered(SLATS, 'roof-slat', 'Roof slat', {
    trade: 'roof-slat',
    cls: 'non-structural',
    species: 'white-ash',
    section: [45, 12],
    lengthMm: 1300,
    assembly: 'roof-frame',
  }),
  centre('dash-rail', 'Dash rail', {
    trade: 'dash-rail',
    cls: 'primary',
    species: 'white-ash',
    section: [75, 45],
    lengthMm: 1480,
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
  centre('floor-board-1', 'Front floor board 1', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [400, 19],
    lengthMm: 1440,
  }),
  centre('floor-board-2', 'Front floor board 2', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [400, 19],
    lengthMm: 1440,
  }),
  centre('floor-board-3', 'Rear floor board', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [560, 19],
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

// Side view: waist line at y 180, roof rail underside at y 86, sill top at y 285.
const WAIST = 180;
const DOOR_BOTTOM = 284;

const left: BodyPlanView = {
  key: 'left',
  title: 'Left side',
  width: W,
  height: H,
  outline: [
    // Body shell, with the rear wheel opening cut out of its lower edge.
    closed([
      [96, 300],
      [96, 168],
      [336, 158],
      [354, 70],
      [374, 62],
      [780, 62],
      [834, 72],
      [868, 100],
      [898, 186],
      [926, 212],
      [936, 256],
      [934, 300],
      [920, 308],
      ...arc(REAR_WHEEL[0], REAR_WHEEL[1], 92, 308),
      [336, 308],
      [336, 300],
    ]),
    ...sideFront({ wheel: FRONT_WHEEL, boardEndX: 676, boardY: 312, bonnetY: 168 }),
    closed(rect(938, 296, 10, 26)),
    // Glass.
    closed([
      [372, 96],
      [503, 96],
      [503, 176],
      [356, 176],
    ]),
    closed(rect(549, 96, 103, 80)),
    closed([
      [686, 96],
      [778, 96],
      [814, 104],
      [838, 124],
      [856, 176],
      [686, 176],
    ]),
    ...wheel(...FRONT_WHEEL, WHEEL_R),
    ...wheel(...REAR_WHEEL, WHEEL_R),
  ],
  shapes: [
    shape('sill-left', rect(338, 285, 344, 19)),
    shape('hinge-pillar-front-left', [
      [338, 285],
      [352, 285],
      [352, WAIST],
      [370, 86],
      [356, 86],
      [338, WAIST],
    ]),
    shape('lock-pillar-left', [
      [519, 285],
      [533, 285],
      [532, 86],
      [520, 86],
    ]),
    shape('hinge-pillar-rear-left', [
      [668, 285],
      [682, 285],
      [682, 86],
      [670, 86],
    ]),
    shape(
      'roof-rail-left',
      strip(
        [
          [352, 80],
          [780, 80],
          [826, 90],
          [858, 114],
        ],
        12,
      ),
    ),
    shape(
      'rear-pillar-left',
      strip(
        [
          [858, 114],
          [884, 186],
          [892, 292],
        ],
        14,
      ),
    ),
    shape('waist-rail-rear-left', rect(684, WAIST, 192, 10)),
    shape('wheel-arch-left', archBand(REAR_WHEEL[0], REAR_WHEEL[1], 76, 88, 304)),
    ...doorShapes('front', {
      x0: 354,
      x1: 517,
      waistY: WAIST,
      bottomY: DOOR_BOTTOM,
      hingeAtFront: true,
    }),
    ...doorShapes('rear', {
      x0: 535,
      x1: 666,
      waistY: WAIST,
      bottomY: DOOR_BOTTOM,
      hingeAtFront: false,
    }),
  ],
};

// Plan views share the side views' x; y runs across the car (1700 mm ≈ 340 px), and the
// outline is symmetric about y = 210 so the underside can use it unchanged.
const planBody = [
  closed(roundedRect(320, 42, 600, 336, 28)),
  ...planBonnet(FRONT_WHEEL[0], 320),
  ...planRunningBoards(300, 676),
  closed(rect(930, 120, 10, 180)),
];
const rearWing: Pt[] = [
  [688, 42],
  [706, 30],
  [780, 24],
  [836, 30],
  [856, 42],
];
const ROOF_Y0 = 70;
const ROOF_Y1 = 350;

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
    // Windscreen and back light.
    closed(rect(340, 66, 6, 288)),
    closed(rect(870, 96, 8, 228)),
  ],
  shapes: [
    shape('roof-rail-right', rect(354, ROOF_Y0, 508, 12)),
    shape('roof-rail-left', rect(354, ROOF_Y1 - 12, 508, 12)),
    shape('header-rail-front', rect(354, ROOF_Y0 + 12, 12, ROOF_Y1 - ROOF_Y0 - 24)),
    shape('header-rail-rear', rect(850, ROOF_Y0 + 12, 12, ROOF_Y1 - ROOF_Y0 - 24)),
    ...spread(SLATS, 366, 850, 9).map((x, i) =>
      shape(`roof-slat-${i + 1}`, rect(x, ROOF_Y0 + 12, 9, ROOF_Y1 - ROOF_Y0 - 24)),
    ),
    shape('dash-rail', rect(322, 62, 14, 296)),
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
  outline: [...planBody, ...chassisBelow(FRONT_WHEEL[0], REAR_WHEEL[0], WHEEL_R, 926)],
  shapes: [
    shape('sill-left', rect(338, SILL_L[0], 344, SILL_L[1] - SILL_L[0])),
    shape('sill-right', rect(338, SILL_R[0], 344, SILL_R[1] - SILL_R[0])),
    shape('cross-member-front', rect(338, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-centre', rect(518, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-rear', rect(667, SILL_L[1], 15, BETWEEN)),
    ...boards(2, 355, 516, 2).map(([x, w], i) =>
      shape(`floor-board-${i + 1}`, rect(x, SILL_L[1] + 2, w, BETWEEN - 4)),
    ),
    shape('floor-board-3', rect(535, SILL_L[1] + 2, 112, BETWEEN - 4)),
    shape('heel-board', rect(650, SILL_L[1] + 2, 15, BETWEEN - 4)),
  ],
};

export const closedSaloon: BodyPlan = {
  key: 'closed-saloon-4d',
  name: 'Closed saloon, four doors',
  description:
    'Ash-framed four-door saloon with a slatted roof: front doors hung on the front pillars, rear doors on the rear hinge pillars, both shutting on the centre lock pillar.',
  views: [left, mirrorSideView(left, 'Right side'), top, underside],
  zones,
};
