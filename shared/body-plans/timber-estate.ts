import {
  arc,
  archBand,
  circle,
  closed,
  flipY,
  line,
  mirrorSideView,
  rect,
  roundedRect,
  shape,
  spread,
  wheel,
  type Pt,
} from './geometry';
import { centre, doorShapes, doorZones, numbered, pair } from './members';
import { chassisBelow, planBonnet, planFrontWings, planRunningBoards, sideFront } from './outlines';
import type { BodyPlan, BodyPlanView, Zone } from './schema';

/**
 * Timber-framed estate (shooting brake): the ash frame is the outside of the body, with
 * maple panels let into it below the belt rail, two side doors, two side windows each side
 * and a bottom-hinged tailgate. Oak sills carry the load floor. Front to the left.
 */
const W = 1000;
const H = 420;
const FRONT_WHEEL: Pt = [190, 327];
const REAR_WHEEL: Pt = [760, 327];
const WHEEL_R = 68;
const SLATS = 5;

const tailgate = { cls: 'secondary', species: 'white-ash', assembly: 'tailgate' } as const;

const zones: Zone[] = [
  ...pair('sill-{side}', '{Side} sill', {
    trade: 'sill',
    cls: 'primary',
    species: 'white-oak',
    section: [100, 55],
    lengthMm: 1710,
  }),
  ...pair('hinge-pillar-{side}', '{Side} hinge pillar', {
    trade: 'hinge-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 50],
    lengthMm: 1060,
  }),
  ...pair('lock-pillar-{side}', '{Side} lock pillar', {
    trade: 'lock-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 50],
    lengthMm: 1010,
  }),
  ...pair('quarter-pillar-{side}', '{Side} quarter pillar', {
    trade: 'rear-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [70, 45],
    lengthMm: 520,
  }),
  ...pair('rear-pillar-{side}', '{Side} rear corner pillar', {
    trade: 'rear-pillar',
    cls: 'primary',
    species: 'white-ash',
    section: [80, 50],
    lengthMm: 1100,
  }),
  ...pair('roof-rail-{side}', '{Side} roof rail', {
    trade: 'roof-rail',
    cls: 'primary',
    species: 'white-ash',
    section: [60, 45],
    lengthMm: 2850,
  }),
  ...pair('belt-rail-{side}', '{Side} belt rail', {
    trade: 'belt-rail',
    cls: 'secondary',
    species: 'white-ash',
    section: [50, 38],
    lengthMm: 1730,
  }),
  ...pair('wheel-arch-{side}', '{Side} rear wheel arch', {
    trade: 'wheel-arch',
    cls: 'secondary',
    species: 'white-ash',
    section: [60, 40],
    lengthMm: 1100,
  }),
  ...pair('quarter-panel-{side}', '{Side} lower quarter panel', {
    trade: 'skin-panel',
    cls: 'non-structural',
    species: 'hard-maple',
    section: [420, 9],
    lengthMm: 1700,
  }),
  ...doorZones(null, { railMm: 860, stileMm: 500, panel: true }),
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
    section: [60, 45],
    lengthMm: 1380,
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
  ...pair('tailgate-stile-{side}', 'Tailgate, {side} stile', {
    ...tailgate,
    trade: 'tailgate-frame',
    section: [70, 38],
    lengthMm: 1070,
  }),
  centre('tailgate-top-rail', 'Tailgate, top rail', {
    ...tailgate,
    trade: 'tailgate-frame',
    section: [60, 38],
    lengthMm: 1360,
  }),
  centre('tailgate-bottom-rail', 'Tailgate, bottom rail', {
    ...tailgate,
    trade: 'tailgate-frame',
    section: [90, 38],
    lengthMm: 1360,
  }),
  centre('tailgate-panel', 'Tailgate, panel', {
    ...tailgate,
    cls: 'non-structural',
    species: 'hard-maple',
    trade: 'skin-panel',
    section: [450, 9],
    lengthMm: 1340,
  }),
  ...(
    [
      ['front', 'Front cross member'],
      ['centre', 'Centre cross member'],
      ['tail', 'Tail cross member'],
    ] as const
  ).map(([pos, label]) =>
    centre(`cross-member-${pos}`, label, {
      trade: 'cross-member',
      cls: 'primary',
      species: 'white-oak',
      section: [80, 55],
      lengthMm: pos === 'tail' ? 1700 : 1440,
    }),
  ),
  centre('floor-board-1', 'Front floor board', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [920, 16],
    lengthMm: 1440,
  }),
  centre('floor-board-2', 'Load floor board', {
    trade: 'floor-board',
    cls: 'non-structural',
    species: 'douglas-fir',
    section: [1650, 19],
    lengthMm: 1440,
  }),
  centre('heel-board', 'Heel board', {
    trade: 'heel-board',
    cls: 'secondary',
    species: 'yellow-poplar',
    section: [240, 19],
    lengthMm: 1440,
  }),
];

// Side view: belt and waist at y 185, roof rail y 70–82, sill top at y 284.
const WAIST = 185;
const ROOF = 82;
const SILL_TOP = 284;

const left: BodyPlanView = {
  key: 'left',
  title: 'Left side',
  width: W,
  height: H,
  outline: [
    closed([
      [96, 300],
      [96, 176],
      [336, 166],
      [354, 68],
      [372, 62],
      [916, 62],
      [930, 70],
      [932, 300],
      [920, 308],
      ...arc(REAR_WHEEL[0], REAR_WHEEL[1], 92, 308),
      [338, 308],
      [338, 300],
    ]),
    ...sideFront({ wheel: FRONT_WHEEL, boardEndX: 676, boardY: 312, bonnetY: 176 }),
    closed(rect(936, 296, 10, 26)),
    // Door glass and the two quarter lights.
    closed([
      [374, 90],
      [536, 90],
      [536, 181],
      [356, 181],
    ]),
    closed(rect(560, 88, 168, 93)),
    closed(rect(746, 88, 158, 93)),
    ...wheel(...FRONT_WHEEL, WHEEL_R),
    ...wheel(...REAR_WHEEL, WHEEL_R),
  ],
  shapes: [
    shape('sill-left', rect(338, SILL_TOP, 337, 20)),
    shape('hinge-pillar-left', [
      [338, SILL_TOP],
      [352, SILL_TOP],
      [352, WAIST],
      [370, ROOF],
      [356, ROOF],
      [338, WAIST],
    ]),
    shape('lock-pillar-left', rect(542, ROOF, 14, SILL_TOP - ROOF)),
    shape('quarter-pillar-left', rect(730, ROOF, 14, WAIST - ROOF)),
    shape('rear-pillar-left', rect(906, ROOF, 16, 220)),
    shape('roof-rail-left', rect(352, 70, 570, 12)),
    shape('belt-rail-left', rect(558, WAIST, 346, 10)),
    shape('wheel-arch-left', archBand(REAR_WHEEL[0], REAR_WHEEL[1], 76, 88, 304)),
    // The panel is let in between the belt rail and the sill and stops short of the arch.
    shape('quarter-panel-left', [
      [558, WAIST + 12],
      [904, WAIST + 12],
      [904, SILL_TOP - 2],
      ...arc(REAR_WHEEL[0], REAR_WHEEL[1], 90, SILL_TOP - 2, 10),
      [558, SILL_TOP - 2],
    ]),
    ...doorShapes(null, {
      x0: 354,
      x1: 540,
      waistY: WAIST,
      bottomY: SILL_TOP - 1,
      hingeAtFront: true,
      panel: true,
    }),
  ],
};

// Plan views: y runs across the car (1700 mm ≈ 340 px), symmetric about y = 210.
const ROOF_Y0 = 70;
const ROOF_Y1 = 350;
const rearWing: Pt[] = [
  [684, 42],
  [702, 30],
  [780, 24],
  [836, 30],
  [854, 42],
];
const planBody = [
  closed(roundedRect(320, 42, 614, 336, 16)),
  ...planBonnet(FRONT_WHEEL[0], 320),
  ...planRunningBoards(300, 676),
  closed(rect(940, 120, 10, 180)),
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
    closed(rect(338, 66, 6, 288)),
  ],
  shapes: [
    shape('roof-rail-right', rect(352, ROOF_Y0, 570, 12)),
    shape('roof-rail-left', rect(352, ROOF_Y1 - 12, 570, 12)),
    shape('header-rail-front', rect(352, ROOF_Y0 + 12, 12, ROOF_Y1 - ROOF_Y0 - 24)),
    shape('header-rail-rear', rect(908, ROOF_Y0 + 12, 14, ROOF_Y1 - ROOF_Y0 - 24)),
    ...spread(SLATS, 364, 908, 9).map((x, i) =>
      shape(`roof-slat-${i + 1}`, rect(x, ROOF_Y0 + 12, 9, ROOF_Y1 - ROOF_Y0 - 24)),
    ),
  ],
};

// Seen from below the left side is at the top of the drawing.
const SILL_L: [number, number] = [48, 66];
const SILL_R: [number, number] = [354, 372];
const BETWEEN = SILL_R[0] - SILL_L[1];

const underside: BodyPlanView = {
  key: 'underside',
  title: 'Underside (seen from below, front to the left, left side at the top)',
  width: W,
  height: H,
  outline: [...planBody, ...chassisBelow(FRONT_WHEEL[0], REAR_WHEEL[0], WHEEL_R, 936)],
  shapes: [
    shape('sill-left', rect(338, SILL_L[0], 337, SILL_L[1] - SILL_L[0])),
    shape('sill-right', rect(338, SILL_R[0], 337, SILL_R[1] - SILL_R[0])),
    // From below each wheel arch shows as a strip over its wheel, in line with the sill.
    shape('wheel-arch-left', rect(677, SILL_L[0], 166, SILL_L[1] - SILL_L[0])),
    shape('wheel-arch-right', rect(677, SILL_R[0], 166, SILL_R[1] - SILL_R[0])),
    shape('cross-member-front', rect(338, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-centre', rect(541, SILL_L[1], 15, BETWEEN)),
    shape('cross-member-tail', rect(906, SILL_L[0], 16, SILL_R[1] - SILL_L[0])),
    shape('floor-board-1', rect(355, SILL_L[1] + 2, 184, BETWEEN - 4)),
    shape('heel-board', rect(558, SILL_L[1] + 2, 14, BETWEEN - 4)),
    shape('floor-board-2', rect(574, SILL_L[1] + 2, 330, BETWEEN - 4)),
  ],
};

// Rear view, seen from behind: the vehicle's left is on the viewer's left.
const RW = 500;
const rear: BodyPlanView = {
  key: 'rear',
  title: 'Rear (seen from behind, left side on the left)',
  width: RW,
  height: H,
  outline: [
    closed([
      [76, 308],
      [76, 76],
      [90, 62],
      [410, 62],
      [424, 76],
      [424, 308],
    ]),
    closed(rect(118, 100, 264, 86)),
    closed(rect(60, 322, 380, 10)),
    closed(rect(95, 320, 30, 76)),
    closed(rect(375, 320, 30, 76)),
    closed(circle(250, 350, 18, 20)),
    line([
      [125, 350],
      [232, 350],
    ]),
    line([
      [268, 350],
      [375, 350],
    ]),
  ],
  shapes: [
    shape('header-rail-rear', rect(80, 70, 340, 12)),
    shape('rear-pillar-left', rect(80, ROOF, 16, 220)),
    shape('rear-pillar-right', rect(404, ROOF, 16, 220)),
    shape('tailgate-stile-left', rect(100, 86, 14, 214)),
    shape('tailgate-stile-right', rect(386, 86, 14, 214)),
    shape('tailgate-top-rail', rect(114, 86, 272, 12)),
    shape('tailgate-bottom-rail', rect(114, 282, 272, 18)),
    shape('tailgate-panel', rect(116, 190, 268, 90)),
    shape('cross-member-tail', rect(80, 304, 340, 14)),
  ],
};

export const timberEstate: BodyPlan = {
  key: 'estate-timber',
  name: 'Timber-framed estate',
  description:
    'Two-door estate whose exposed ash frame is the body: maple panels let in below the belt rails, two side windows each side, oak sills and a bottom-hinged tailgate.',
  views: [left, mirrorSideView(left, 'Right side'), top, underside, rear],
  zones,
};
