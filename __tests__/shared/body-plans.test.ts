import {
  BODY_PLANS,
  bodyPlanSchema,
  getBodyPlan,
  getZone,
  interiorPoint,
  mirrorZoneKey,
  pointInPolygon,
  polygonCentroid,
  TRADE_NAMES,
  type BodyPlan,
  type BodyPlanView,
  type ViewKey,
} from '@/shared/body-plans';

type Pt = [number, number];

const view = (plan: BodyPlan, key: ViewKey): BodyPlanView => {
  const v = plan.views.find((x) => x.key === key);
  if (!v) throw new Error(`${plan.key} has no ${key} view`);
  return v;
};

/** Overlap of every pair of shapes in a view, counted on a 1 px grid. */
function overlaps(v: BodyPlanView): { pair: string; fraction: number }[] {
  const shapes = v.shapes.map((s) => {
    const pts = s.points as Pt[];
    const xs = pts.map((p) => p[0]);
    const ys = pts.map((p) => p[1]);
    return {
      zone: s.zone,
      pts,
      box: [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)],
      area: 0,
    };
  });
  const shared = new Map<string, number>();
  for (let y = 0.5; y < v.height; y++)
    for (let x = 0.5; x < v.width; x++) {
      const hit = shapes.filter(
        (s) =>
          x >= s.box[0] &&
          x <= s.box[2] &&
          y >= s.box[1] &&
          y <= s.box[3] &&
          pointInPolygon([x, y], s.pts),
      );
      for (const h of hit) h.area++;
      for (let i = 0; i < hit.length; i++)
        for (let j = i + 1; j < hit.length; j++) {
          const k = `${hit[i].zone} & ${hit[j].zone}`;
          shared.set(k, (shared.get(k) ?? 0) + 1);
        }
    }
  const area = new Map(shapes.map((s) => [s.zone, s.area]));
  return [...shared].map(([pair, n]) => {
    const [a, b] = pair.split(' & ');
    return { pair, fraction: n / Math.min(area.get(a)!, area.get(b)!) };
  });
}

describe('body plans', () => {
  it('has at least four plans with unique keys', () => {
    expect(BODY_PLANS.length).toBeGreaterThanOrEqual(4);
    const keys = BODY_PLANS.map((p) => p.key);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('finds plans and zones by key', () => {
    const plan = getBodyPlan('closed-saloon-4d');
    expect(plan?.name).toMatch(/saloon/i);
    expect(getZone(plan!, 'sill-left')?.tradeName).toBe('sill');
    expect(getZone(plan!, 'no-such-zone')).toBeUndefined();
    expect(getBodyPlan('no-such-plan')).toBeUndefined();
  });

  describe.each(BODY_PLANS.map((p) => [p.key, p] as const))('%s', (_key, plan) => {
    it('passes the schema (unique keys, every zone drawn, shapes in the box, ≥ 4 views, ≥ 30 zones)', () => {
      const result = bodyPlanSchema.safeParse(plan);
      expect(result.success ? [] : result.error.issues.map((i) => i.message)).toEqual([]);
    });

    it('has left, right, top and underside views', () => {
      const keys = plan.views.map((v) => v.key);
      expect(keys).toEqual(expect.arrayContaining(['left', 'right', 'top', 'underside']));
    });

    it('gives every left-side member in the left view a right-side counterpart', () => {
      const zones = new Map(plan.zones.map((z) => [z.key, z]));
      const leftDrawn = view(plan, 'left')
        .shapes.map((s) => zones.get(s.zone)!)
        .filter((z) => z.side === 'left');
      expect(leftDrawn.length).toBeGreaterThan(10);
      for (const z of leftDrawn) {
        const twin = zones.get(mirrorZoneKey(z.key));
        expect(twin).toMatchObject({
          side: 'right',
          tradeName: z.tradeName,
          structuralClass: z.structuralClass,
        });
      }
    });

    it('draws only near-side and centre members in each side view', () => {
      const side = new Map(plan.zones.map((z) => [z.key, z.side]));
      for (const key of ['left', 'right'] as const) {
        const far = view(plan, key).shapes.filter(
          (s) => side.get(s.zone) === (key === 'left' ? 'right' : 'left'),
        );
        expect([key, far.map((s) => s.zone)]).toEqual([key, []]);
      }
    });

    it('puts the left side at the bottom of the top view and at the top of the underside', () => {
      const side = new Map(plan.zones.map((z) => [z.key, z.side]));
      for (const [key, leftBelow] of [
        ['top', true],
        ['underside', false],
      ] as const) {
        const v = view(plan, key);
        const sided = v.shapes.filter((s) => side.get(s.zone) !== 'centre');
        expect(sided.length).toBeGreaterThanOrEqual(2);
        for (const s of sided) {
          const below = polygonCentroid(s.points as Pt[])[1] > v.height / 2;
          expect([s.zone, below]).toEqual([
            s.zone,
            side.get(s.zone) === 'left' ? leftBelow : !leftBelow,
          ]);
        }
      }
    });

    it('draws the right side as the mirror image of the left', () => {
      const left = view(plan, 'left');
      const right = view(plan, 'right');
      expect(right.shapes).toHaveLength(left.shapes.length);
      for (const s of left.shapes) {
        const twin = right.shapes.find((r) => r.zone === mirrorZoneKey(s.zone));
        expect(twin).toBeDefined();
        const mirrored = s.points
          .map(([x, y]) => `${Math.round(left.width - x)},${Math.round(y)}`)
          .sort();
        expect(twin!.points.map(([x, y]) => `${Math.round(x)},${Math.round(y)}`).sort()).toEqual(
          mirrored,
        );
      }
    });

    it('uses only known trade names and sensible sections', () => {
      for (const z of plan.zones) {
        expect(TRADE_NAMES).toContain(z.tradeName);
        expect(z.nominalSection.depthMm).toBeGreaterThanOrEqual(9);
        expect(z.lengthMm).toBeGreaterThanOrEqual(200);
        expect(z.lengthMm).toBeLessThanOrEqual(3500);
      }
    });

    it('classes the load-bearing members as primary and the boards and panels as non-structural', () => {
      for (const z of plan.zones) {
        if (['sill', 'hinge-pillar', 'lock-pillar', 'cross-member'].includes(z.tradeName))
          expect([z.key, z.structuralClass]).toEqual([z.key, 'primary']);
        if (['floor-board', 'skin-panel', 'tonneau-rail'].includes(z.tradeName))
          expect([z.key, z.structuralClass]).toEqual([z.key, 'non-structural']);
        if (
          [
            'door-stile',
            'door-rail',
            'tailgate-frame',
            'wheel-arch',
            'seat-frame',
            'header-rail',
          ].includes(z.tradeName)
        )
          expect([z.key, z.structuralClass]).toEqual([z.key, 'secondary']);
      }
      const sills = plan.zones.filter((z) => z.tradeName === 'sill');
      expect(sills.map((z) => z.side).sort()).toEqual(['left', 'right']);
    });

    it('puts every door member in its door assembly', () => {
      const doorMembers = plan.zones.filter((z) => z.key.startsWith('door-'));
      expect(doorMembers.length).toBeGreaterThanOrEqual(8);
      for (const z of doorMembers) expect(z.key.startsWith(`${z.assembly}-`)).toBe(true);
    });

    it('keeps touching members from overlapping', () => {
      for (const v of plan.views) {
        const heavy = overlaps(v).filter((o) => o.fraction > 0.05);
        expect([v.key, heavy]).toEqual([v.key, []]);
      }
    });

    it('has a label point inside every shape', () => {
      for (const v of plan.views)
        for (const s of v.shapes)
          expect([
            s.zone,
            pointInPolygon(interiorPoint(s.points as Pt[]), s.points as Pt[]),
          ]).toEqual([s.zone, true]);
    });
  });

  it('gives closed bodies roof rails and slats, and the tourer none', () => {
    const trades = (key: string) => new Set(getBodyPlan(key)!.zones.map((z) => z.tradeName));
    for (const key of ['closed-saloon-4d', 'coupe-2d', 'estate-timber']) {
      expect(trades(key)).toContain('roof-rail');
      expect(trades(key)).toContain('roof-slat');
      const rails = getBodyPlan(key)!.zones.filter((z) => z.tradeName === 'roof-rail');
      expect(rails.every((z) => z.structuralClass === 'primary')).toBe(true);
    }
    const tourer = trades('open-tourer-4d');
    expect(tourer.has('roof-rail')).toBe(false);
    expect(tourer.has('roof-slat')).toBe(false);
    expect(tourer).toContain('tonneau-rail');
  });

  it('gives the estate a tailgate assembly drawn in its rear view', () => {
    const estate = getBodyPlan('estate-timber')!;
    const frame = estate.zones.filter((z) => z.tradeName === 'tailgate-frame');
    expect(frame.length).toBeGreaterThanOrEqual(4);
    expect(frame.every((z) => z.assembly === 'tailgate')).toBe(true);
    const rearDrawn = new Set(view(estate, 'rear').shapes.map((s) => s.zone));
    for (const z of frame) expect(rearDrawn).toContain(z.key);
  });
});

describe('bodyPlanSchema rejects broken plans', () => {
  const base = (): BodyPlan => structuredClone(getBodyPlan('closed-saloon-4d')!);
  const messages = (plan: unknown) => {
    const r = bodyPlanSchema.safeParse(plan);
    return r.success ? [] : r.error.issues.map((i) => i.message);
  };

  it('accepts the unchanged plan', () => {
    expect(messages(base())).toEqual([]);
  });

  it('rejects a duplicated zone key', () => {
    const plan = base();
    plan.zones.push({ ...plan.zones[0] });
    expect(messages(plan)).toContain(`duplicate zone key ${plan.zones[0].key}`);
  });

  it('rejects a zone that no view draws', () => {
    const plan = base();
    plan.zones.push({ ...plan.zones[0], key: 'spare-rail', label: 'Spare rail' });
    expect(messages(plan)).toContain('zone spare-rail is not drawn in any view');
  });

  it('rejects a shape that leaves its view box', () => {
    const plan = base();
    const left = plan.views.find((v) => v.key === 'left')!;
    left.shapes[0].points[0] = [left.width + 5, 10];
    expect(messages(plan)).toContain(`zone ${left.shapes[0].zone} leaves the left view box`);
  });

  it('rejects a plan with too few views', () => {
    const plan = base();
    plan.views = plan.views.slice(0, 3);
    expect(messages(plan).length).toBeGreaterThan(0);
  });
});

describe('geometry helpers', () => {
  it('mirrors side keys token by token', () => {
    expect(mirrorZoneKey('door-front-left-hinge-stile')).toBe('door-front-right-hinge-stile');
    expect(mirrorZoneKey('sill-right')).toBe('sill-left');
    expect(mirrorZoneKey('roof-slat-3')).toBe('roof-slat-3');
  });

  it('finds the area centroid, not the vertex mean', () => {
    expect(
      polygonCentroid([
        [0, 0],
        [10, 0],
        [10, 4],
        [0, 4],
      ]),
    ).toEqual([5, 2]);
    // Extra points along one edge move the vertex mean but not the area centroid.
    const [cx, cy] = polygonCentroid([
      [0, 0],
      [2, 0],
      [4, 0],
      [6, 0],
      [8, 0],
      [10, 0],
      [10, 4],
      [0, 4],
    ]);
    expect(cx).toBeCloseTo(5);
    expect(cy).toBeCloseTo(2);
  });

  it('places a label on an arch rather than in its opening', () => {
    const arch = getBodyPlan('closed-saloon-4d')!.views[0].shapes.find(
      (s) => s.zone === 'wheel-arch-left',
    )!;
    const pts = arch.points as Pt[];
    expect(pointInPolygon(polygonCentroid(pts), pts)).toBe(false);
    expect(pointInPolygon(interiorPoint(pts), pts)).toBe(true);
  });
});
