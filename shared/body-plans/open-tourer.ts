import {
  arc,
  archBand,
  boards,
  circle,
  closed,
  flipY,
  line,
  mirrorSideView,
  rect,
  roundedRect,
  shape,
  strip,
  wheel,
  type Pt,
} from './geometry';
import { centre, doorShapes, doorZones, pair } from './members';
import { chassisBelow, planBonnet, planFrontWings, planRunningBoards, sideFront } from './outlines';
import type { BodyPlan, BodyPlanView, Zone } from './schema';

/**
 * Open four-door tourer: no roof, so the sills are heavier (oak) and the body is stiffened
 * by the cross members and the dash rail. The top of the body sides is the door waist
 * rails and, behind the rear doors, the bent tonneau rails. Front to the left.
 */
const W = 1000;
const H = 420;
const FRONT_WHEEL: Pt = [190, 327];
const REAR_WHEEL: Pt = [760, 327];
const WHEEL_R = 68;

const zones: Zone[] = [
  ...pair('sill-{side}', '{Side} sill', {
    trade: 'sill',
    cls: 'primary',
    species: 'white-oak',
    section: [110, 55],
    lengthMm: 1710,
  }),
  ...pair('hinge-pillar-front-{side}', '{Side} front hinge pillar', {
    trade: 'hinge-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 55],
    lengthMm: 460,
  }),
  ...pair('lock-pillar-{side}', '{Side} lock pillar', {
    trade: 'lock-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 55],
    lengthMm: 420,
  }),
  ...pair('hinge-pillar-rear-{side}', '{Side} rear hinge pillar', {
    trade: 'hinge-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 55],
    lengthMm: 420,
  }),
  ...pair('rear-pillar-{side}', '{Side} rear corner pillar', {
    trade: 'rear-pillar',
    cls: 'secondary',
    species: 'white-ash',
    section: [60, 45],
    lengthMm: 320,
  }),
  ...pair('windscreen-pillar-{side}', '{Side} windscreen pillar', {
    trade: 'windscreen-pillar',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 38],
    lengthMm: 470,
  }),
  ...pair('wheel-arch-{side}', '{Side} rear wheel arch', {
    trade: 'wheel-arch',
    cls: 'secondary',
    species: 'white-ash',
    section: [60, 40],
    lengthMm: 1100,
  }),
  ...pair('tonneau-rail-{side}', '{Side} tonneau rail', {
    trade: 'tonneau-rail',
    cls: 'non-structural',
    species: 'white-ash',
    section: [50, 32],
    lengthMm: 1250,
  }),
  ...doorZones('front', { railMm: 700, stileMm: 420 }),
  ...doorZones('rear', { railMm: 540, stileMm: 420 }),
  centre('tonneau-rail-rear', 'Rear tonneau rail', {
    trade: 'tonneau-rail',
    cls: 'non-structural',
    species: 'white-ash',
    section: [60, 32],
    lengthMm: 1520,
  }),
  centre('dash-rail', 'Dash rail', {
    trade: 'dash-rail',
    cls: 'primary',
    species: 'white-ash',
    section: [75, 50],
    lengthMm: 1480,
  }),
  ...(
    [
      ['front', 'Front cross member', 1420],
      ['centre', 'Centre cross member', 1420],
      ['rear', 'Rear cross member', 1420],
      ['tail', 'Tail cross member', 1200],
    ] as const
  ).map(([pos, label, lengthMm]) =>
    centre(`cross-member-${pos}`, label, {
      trade: 'cross-member',
      cls: 'primary',
      species: 'white-ash',
      section: [75, 50],
      lengthMm,
    }),
  ),
  centre('floor-board-1', 'Front floor board 1', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [390, 19],
    lengthMm: 1400,
  }),
  centre('floor-board-2', 'Front floor board 2', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [390, 19],
    lengthMm: 1400,
  }),
  centre('floor-board-3', 'Rear floor board', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [570, 19],
    lengthMm: 1400,
  }),
  centre('heel-board', 'Heel board', {
    trade: 'heel-board',
    cls: 'secondary',
    species: 'yellow-poplar',
    section: [240, 19],
    lengthMm: 1400,
  }),
  centre('seat-frame-front', 'Front seat frame', {
    trade: 'seat-frame',
    cls: 'secondary',
    species: 'white-ash',
    section: [45, 32],
    lengthMm: 1240,
  }),
  centre('seat-frame-rear', 'Rear seat frame', {
    trade: 'seat-frame',
    cls: 'secondary',
    species: 'yellow-poplar',
    section: [45, 32],
    lengthMm: 1240,
  }),
];

// Side view: the body top (waist) at y 200, sill top at y 284.
const WAIST = 200;
const DOOR_BOTTOM = 283;

const SPARE: Pt = [950, 252];

const left: BodyPlanView = {
  key: 'left',
  title: 'Left side',
  width: W,
  height: H,
  outline: [
    // Body: bonnet, scuttle cowl, the open cockpit rim and the rounded tail.
    closed([
      [96, 300],
      [96, 180],
      [316, 172],
      [336, 176],
      [348, 196],
      [902, 196],
      [924, 214],
      [936, 252],
      [934, 300],
      [920, 308],
      ...arc(REAR_WHEEL[0], REAR_WHEEL[1], 92, 308),
      [330, 308],
      [330, 300],
    ]),
    ...sideFront({ wheel: FRONT_WHEEL, boardEndX: 670, boardY: 312, bonnetY: 180 }),
    // Windscreen glass, seat backs, steering wheel, folded hood and the spare wheel.
    closed([
      [350, 102],
      [356, 102],
      [346, 186],
      [340, 186],
    ]),
    closed([
      [462, 196],
      [466, 164],
      [484, 156],
      [500, 164],
      [502, 196],
    ]),
    closed([
      [700, 196],
      [704, 158],
      [726, 150],
      [744, 158],
      [746, 196],
    ]),
    line([
      [398, 150],
      [420, 186],
    ]),
    closed([
      [800, 196],
      [810, 174],
      [850, 166],
      [884, 176],
      [894, 196],
    ]),
    ...wheel(...SPARE, 44),
    ...wheel(...FRONT_WHEEL, WHEEL_R),
    ...wheel(...REAR_WHEEL, WHEEL_R),
  ],
  shapes: [
    shape('sill-left', rect(330, 284, 342, 22)),
    shape('hinge-pillar-front-left', [
      [330, 284],
      [344, 284],
      [344, 196],
      [330, 190],
    ]),
    shape(
      'windscreen-pillar-left',
      strip(
        [
          [339, 184],
          [353, 98],
        ],
        10,
      ),
    ),
    shape('lock-pillar-left', rect(508, WAIST, 14, 84)),
    shape('hinge-pillar-rear-left', rect(656, WAIST, 14, 84)),
    shape(
      'tonneau-rail-left',
      strip(
        [
          [672, 205],
          [850, 205],
          [884, 214],
          [904, 234],
        ],
        10,
      ),
    ),
    shape(
      'rear-pillar-left',
      strip(
        [
          [908, 242],
          [912, 300],
        ],
        12,
      ),
    ),
    shape('wheel-arch-left', archBand(REAR_WHEEL[0], REAR_WHEEL[1], 76, 88, 306)),
    ...doorShapes('front', {
      x0: 346,
      x1: 506,
      waistY: WAIST,
      bottomY: DOOR_BOTTOM,
      hingeAtFront: true,
    }),
    ...doorShapes('rear', {
      x0: 524,
      x1: 654,
      waistY: WAIST,
      bottomY: DOOR_BOTTOM,
      hingeAtFront: false,
    }),
  ],
};

// Plan views: y runs across the car (body 1620 mm ≈ 324 px), symmetric about y = 210.
const RIM_R: [number, number] = [58, 68];
const RIM_L: [number, number] = [352, 362];
const rearWing: Pt[] = [
  [684, 48],
  [702, 34],
  [780, 28],
  [834, 34],
  [852, 48],
];
const planBody = [
  closed(roundedRect(316, 48, 604, 324, 30)),
  ...planBonnet(FRONT_WHEEL[0], 316),
  ...planRunningBoards(300, 670),
  closed(rect(970, 130, 10, 160)),
];
// A steering wheel seen from above is a narrow ellipse.
const steering = circle(404, 130, 26, 24).map(([x, y]): Pt => [404 + (x - 404) * 0.35, y]);

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
    closed(rect(338, 66, 6, 288)),
    closed(steering),
    closed(rect(896, 76, 20, 268)),
    closed(rect(936, 142, 28, 136)),
  ],
  shapes: [
    shape('dash-rail', rect(318, 62, 14, 296)),
    ...(['left', 'right'] as const).flatMap((side) => {
      const [y0, y1] = side === 'left' ? RIM_L : RIM_R;
      return [
        shape(`door-front-${side}-waist-rail`, rect(358, y0, 136, y1 - y0)),
        shape(`door-rear-${side}-waist-rail`, rect(536, y0, 106, y1 - y0)),
        shape(`tonneau-rail-${side}`, rect(672, y0, 206, y1 - y0)),
      ];
    }),
    shape('tonneau-rail-rear', rect(880, RIM_R[0], 12, RIM_L[1] - RIM_R[0])),
    shape('seat-frame-front', rect(432, 86, 60, 248)),
    shape('seat-frame-rear', rect(690, 86, 70, 248)),
  ],
};

// Seen from below the left side is at the top of the drawing.
const SILL_L: [number, number] = [48, 68];
const SILL_R: [number, number] = [352, 372];
const BETWEEN = SILL_R[0] - SILL_L[1];

const underside: BodyPlanView = {
  key: 'underside',
  title: 'Underside (seen from below, front to the left, left side at the top)',
  width: W,
  height: H,
  outline: [...planBody, ...chassisBelow(FRONT_WHEEL[0], REAR_WHEEL[0], WHEEL_R, 930)],
  shapes: [
    shape('sill-left', rect(330, SILL_L[0], 342, SILL_L[1] - SILL_L[0])),
    shape('sill-right', rect(330, SILL_R[0], 342, SILL_R[1] - SILL_R[0])),
    shape('cross-member-front', rect(330, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-centre', rect(507, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-rear', rect(656, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-tail', rect(896, 90, 15, 240)),
    ...boards(2, 347, 505, 2).map(([x, w], i) =>
      shape(`floor-board-${i + 1}`, rect(x, SILL_L[1] + 2, w, BETWEEN - 4)),
    ),
    shape('floor-board-3', rect(524, SILL_L[1] + 2, 114, BETWEEN - 4)),
    shape('heel-board', rect(640, SILL_L[1] + 2, 14, BETWEEN - 4)),
  ],
};

export const openTourer: BodyPlan = {
  key: 'open-tourer-4d',
  name: 'Open tourer, four doors',
  description:
    'Four-door open tourer with a folding hood: oak sills, low door frames, tonneau rails round the rear cockpit and seat frames open to view from above.',
  views: [left, mirrorSideView(left, 'Right side'), top, underside],
  zones,
};
