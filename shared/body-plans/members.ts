import { rect, shape } from './geometry';
import type { SpeciesKey, StructuralClass, TradeName, Zone, ZoneShape } from './schema';

/**
 * Builders for the zone records of the plan modules, so each plan lists what its members
 * are and leaves the repetitive parts (pairs, doors) to one place.
 */

/** What a member is, apart from where it sits. */
export interface MemberSpec {
  trade: TradeName;
  cls: StructuralClass;
  species: SpeciesKey;
  /** [width across the face you see, depth into the body], mm. */
  section: [number, number];
  lengthMm: number;
  assembly?: string;
}

function zone(key: string, label: string, side: Zone['side'], spec: MemberSpec): Zone {
  const z: Zone = {
    key,
    label,
    tradeName: spec.trade,
    side,
    structuralClass: spec.cls,
    defaultSpecies: spec.species,
    nominalSection: { widthMm: spec.section[0], depthMm: spec.section[1] },
    lengthMm: spec.lengthMm,
  };
  if (spec.assembly) z.assembly = spec.assembly;
  return z;
}

/** A member on the vehicle's centreline (or spanning it). */
export function centre(key: string, label: string, spec: MemberSpec): Zone {
  return zone(key, label, 'centre', spec);
}

/**
 * A left and right pair. `{side}` in the key or assembly becomes left/right and `{Side}`
 * in the label becomes Left/Right: pair('sill-{side}', '{Side} sill', …).
 */
export function pair(key: string, label: string, spec: MemberSpec): Zone[] {
  return (['left', 'right'] as const).map((side) => {
    const Side = side === 'left' ? 'Left' : 'Right';
    const fill = (s: string) => s.replace(/\{side\}/g, side).replace(/\{Side\}/g, Side);
    return zone(fill(key), fill(label), side, {
      ...spec,
      assembly: spec.assembly ? fill(spec.assembly) : undefined,
    });
  });
}

interface DoorOptions {
  /** Length of the door rails, mm. */
  railMm: number;
  /** Length of the door stiles, mm. */
  stileMm: number;
  /** A wooden top rail over the window (closed doors with a timber window frame). */
  topRail?: boolean;
  /** An exposed timber panel between the rails (timber-framed bodies). */
  panel?: boolean;
}

/**
 * The members of a pair of door frames. `pos` names the door on a four-door body
 * ('front', 'rear'); a two-door body passes null. Keys look like
 * 'door-front-left-hinge-stile' and the assembly is 'door-front-left'.
 */
export function doorZones(pos: 'front' | 'rear' | null, opts: DoorOptions): Zone[] {
  const stem = pos ? `door-${pos}-{side}` : 'door-{side}';
  const name = pos ? `{Side} ${pos} door` : '{Side} door';
  const frame = { cls: 'secondary', species: 'white-ash', assembly: stem } as const;
  const stile: MemberSpec = {
    ...frame,
    trade: 'door-stile',
    section: [60, 38],
    lengthMm: opts.stileMm,
  };
  return [
    ...pair(`${stem}-hinge-stile`, `${name}, hinge stile`, stile),
    ...pair(`${stem}-shut-stile`, `${name}, shut stile`, stile),
    ...(opts.topRail
      ? pair(`${stem}-top-rail`, `${name}, top rail`, {
          ...frame,
          trade: 'door-rail',
          section: [40, 32],
          lengthMm: opts.railMm,
        })
      : []),
    ...pair(`${stem}-waist-rail`, `${name}, waist rail`, {
      ...frame,
      trade: 'waist-rail',
      section: [50, 32],
      lengthMm: opts.railMm,
    }),
    ...pair(`${stem}-bottom-rail`, `${name}, bottom rail`, {
      ...frame,
      trade: 'door-rail',
      section: [80, 38],
      lengthMm: opts.railMm,
    }),
    ...(opts.panel
      ? pair(`${stem}-panel`, `${name}, panel`, {
          ...frame,
          cls: 'non-structural',
          species: 'hard-maple',
          trade: 'skin-panel',
          section: [360, 9],
          lengthMm: opts.railMm,
        })
      : []),
  ];
}

/** `count` like members numbered from 1: 'roof-slat-1' / 'Roof slat 1', … */
export function numbered(count: number, key: string, label: string, spec: MemberSpec): Zone[] {
  return Array.from({ length: count }, (_, i) =>
    centre(`${key}-${i + 1}`, `${label} ${i + 1}`, spec),
  );
}

/**
 * The left-side drawing of one door below the waist: stiles the full height, rails
 * between them, and the panel (if any) inside the frame. Keys match doorZones.
 */
export function doorShapes(
  pos: 'front' | 'rear' | null,
  o: {
    x0: number;
    x1: number;
    waistY: number;
    bottomY: number;
    hingeAtFront: boolean;
    panel?: boolean;
  },
): ZoneShape[] {
  const k = pos ? `door-${pos}-left` : 'door-left';
  const [front, rear] = o.hingeAtFront
    ? ['hinge-stile', 'shut-stile']
    : ['shut-stile', 'hinge-stile'];
  const STILE = 12;
  const WAIST = 10;
  const BOTTOM = 16;
  const inner = o.x1 - o.x0 - 2 * STILE;
  const shapes = [
    shape(`${k}-${front}`, rect(o.x0, o.waistY, STILE, o.bottomY - o.waistY)),
    shape(`${k}-${rear}`, rect(o.x1 - STILE, o.waistY, STILE, o.bottomY - o.waistY)),
    shape(`${k}-waist-rail`, rect(o.x0 + STILE, o.waistY, inner, WAIST)),
    shape(`${k}-bottom-rail`, rect(o.x0 + STILE, o.bottomY - BOTTOM, inner, BOTTOM)),
  ];
  if (o.panel)
    shapes.push(
      shape(
        `${k}-panel`,
        rect(
          o.x0 + STILE + 2,
          o.waistY + WAIST + 2,
          inner - 4,
          o.bottomY - o.waistY - WAIST - BOTTOM - 4,
        ),
      ),
    );
  return shapes;
}
