import { z } from 'zod';

/**
 * A body plan: one body style drawn as several flat views, each zone a framing member or
 * panel. Shapes are polygons in the view's own coordinate box (origin top-left, y down),
 * so bounds are checkable and pins and labels can sit at a polygon's centroid.
 */
export const VIEW_KEYS = ['left', 'right', 'top', 'underside', 'front', 'rear'] as const;
export type ViewKey = (typeof VIEW_KEYS)[number];

export const TRADE_NAMES = [
  'sill',
  'hinge-pillar',
  'lock-pillar',
  'rear-pillar',
  'windscreen-pillar',
  'roof-rail',
  'roof-slat',
  'roof-bow',
  'header-rail',
  'waist-rail',
  'belt-rail',
  'door-stile',
  'door-rail',
  'floor-board',
  'heel-board',
  'cross-member',
  'wheel-arch',
  'seat-frame',
  'tailgate-frame',
  'boot-frame',
  'tonneau-rail',
  'dash-rail',
  'skin-panel',
] as const;
export type TradeName = (typeof TRADE_NAMES)[number];

export const TRADE_NAME_LABELS: Record<TradeName, string> = {
  sill: 'Sill',
  'hinge-pillar': 'Hinge pillar',
  'lock-pillar': 'Lock pillar',
  'rear-pillar': 'Rear pillar',
  'windscreen-pillar': 'Windscreen pillar',
  'roof-rail': 'Roof rail (cant rail)',
  'roof-slat': 'Roof slat',
  'roof-bow': 'Roof bow',
  'header-rail': 'Header rail',
  'waist-rail': 'Waist rail',
  'belt-rail': 'Belt rail',
  'door-stile': 'Door stile',
  'door-rail': 'Door rail',
  'floor-board': 'Floor board',
  'heel-board': 'Heel board',
  'cross-member': 'Cross member',
  'wheel-arch': 'Wheel arch',
  'seat-frame': 'Seat frame',
  'tailgate-frame': 'Tailgate frame',
  'boot-frame': 'Boot frame',
  'tonneau-rail': 'Tonneau rail',
  'dash-rail': 'Dash rail',
  'skin-panel': 'Skin panel',
};

export const SIDES = ['left', 'right', 'centre'] as const;
export const STRUCTURAL_CLASSES = ['primary', 'secondary', 'non-structural'] as const;
export type StructuralClass = (typeof STRUCTURAL_CLASSES)[number];
export const STRUCTURAL_CLASS_LABELS: Record<StructuralClass, string> = {
  primary: 'Primary structure',
  secondary: 'Secondary structure',
  'non-structural': 'Non-structural',
};

/** Species keys; properties live in shared/species.ts. */
export const SPECIES_KEYS = [
  'white-ash',
  'northern-red-oak',
  'white-oak',
  'hard-maple',
  'yellow-poplar',
  'douglas-fir',
] as const;
export type SpeciesKey = (typeof SPECIES_KEYS)[number];

const point = z.tuple([z.number(), z.number()]);

export const zoneSchema = z.object({
  key: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'kebab-case key'),
  label: z.string().min(2), // e.g. 'Left sill', 'Roof slat 3'
  tradeName: z.enum(TRADE_NAMES),
  side: z.enum(SIDES),
  structuralClass: z.enum(STRUCTURAL_CLASSES),
  defaultSpecies: z.enum(SPECIES_KEYS),
  /** Nominal finished section, mm: width across the face you see, depth into the body. */
  nominalSection: z.object({ widthMm: z.number().positive(), depthMm: z.number().positive() }),
  /** Typical member length, mm (used against affected length). */
  lengthMm: z.number().positive(),
  /** Replaceable assembly this member belongs to, e.g. 'door-front-left', 'roof-frame'. */
  assembly: z.string().optional(),
});
export type Zone = z.infer<typeof zoneSchema>;

export const zoneShapeSchema = z.object({
  zone: z.string(),
  points: z.array(point).min(3),
});
export type ZoneShape = z.infer<typeof zoneShapeSchema>;

/** Decorative outline strokes (body silhouette, wheels, glass), not tappable. */
export const outlineSchema = z.object({
  points: z.array(point).min(2),
  closed: z.boolean(),
});
export type Outline = z.infer<typeof outlineSchema>;

export const viewSchema = z.object({
  key: z.enum(VIEW_KEYS),
  title: z.string(),
  width: z.number().positive(),
  height: z.number().positive(),
  outline: z.array(outlineSchema),
  shapes: z.array(zoneShapeSchema).min(1),
});
export type BodyPlanView = z.infer<typeof viewSchema>;

export const bodyPlanSchema = z
  .object({
    key: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/),
    name: z.string(),
    description: z.string(),
    views: z.array(viewSchema).min(4),
    zones: z.array(zoneSchema).min(30),
  })
  .superRefine((plan, ctx) => {
    const keys = new Set<string>();
    for (const z of plan.zones) {
      if (keys.has(z.key)) ctx.addIssue({ code: 'custom', message: `duplicate zone key ${z.key}` });
      keys.add(z.key);
    }
    const drawn = new Set<string>();
    const viewKeys = new Set<string>();
    for (const v of plan.views) {
      if (viewKeys.has(v.key)) ctx.addIssue({ code: 'custom', message: `duplicate view ${v.key}` });
      viewKeys.add(v.key);
      const inside = ([x, y]: [number, number]) =>
        x >= 0 && y >= 0 && x <= v.width && y <= v.height;
      for (const s of v.shapes) {
        if (!keys.has(s.zone))
          ctx.addIssue({ code: 'custom', message: `view ${v.key} draws unknown zone ${s.zone}` });
        drawn.add(s.zone);
        if (!s.points.every(inside))
          ctx.addIssue({ code: 'custom', message: `zone ${s.zone} leaves the ${v.key} view box` });
      }
      for (const o of v.outline)
        if (!o.points.every(inside))
          ctx.addIssue({ code: 'custom', message: `an outline leaves the ${v.key} view box` });
    }
    for (const k of keys)
      if (!drawn.has(k))
        ctx.addIssue({ code: 'custom', message: `zone ${k} is not drawn in any view` });
  });
export type BodyPlan = z.infer<typeof bodyPlanSchema>;
