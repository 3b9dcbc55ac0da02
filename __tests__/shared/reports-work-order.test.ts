import * as fc from 'fast-check';
import { BODY_PLANS, type TradeName } from '@/shared/body-plans';
import { orderOfWork, WORK_PRECEDENCE, type WorkItem } from '@/shared/reports';

// Order of work for timber body framing (common practice): treat before repair, the frame
// before the skins hung on it, roof framing before the headliner, the headliner before trim.
const FRAME_TRADES: TradeName[] = [
  'sill',
  'hinge-pillar',
  'lock-pillar',
  'rear-pillar',
  'windscreen-pillar',
  'heel-board',
  'cross-member',
  'wheel-arch',
  'dash-rail',
  'waist-rail',
  'belt-rail',
  'tonneau-rail',
  'door-stile',
  'door-rail',
  'tailgate-frame',
  'boot-frame',
];
const ROOF_TRADES: TradeName[] = ['roof-rail', 'roof-slat', 'roof-bow', 'header-rail'];

const planAndItems = fc.constantFrom(...BODY_PLANS).chain((plan) =>
  fc.tuple(
    fc.constant(plan),
    fc.uniqueArray(
      fc.record<WorkItem>({
        zoneKey: fc.constantFrom(...plan.zones.map((z) => z.key)),
        needsTreatment: fc.boolean(),
      }),
      { selector: (i) => i.zoneKey, maxLength: 20 },
    ),
  ),
);

describe('orderOfWork', () => {
  it('keeps every precedence pair for any set of zones (fast-check)', () => {
    fc.assert(
      fc.property(planAndItems, ([plan, items]) => {
        const steps = orderOfWork(items, plan).map((s) => s.key);
        expect(new Set(steps).size).toBe(steps.length);
        for (const [before, after] of WORK_PRECEDENCE) {
          if (steps.includes(before) && steps.includes(after))
            expect(steps.indexOf(before)).toBeLessThan(steps.indexOf(after));
        }
      }),
      { numRuns: 300 },
    );
  });

  it('frame before skins, roof framing before headliner before upholstery, treatment first', () => {
    fc.assert(
      fc.property(planAndItems, ([plan, items]) => {
        const steps = orderOfWork(items, plan);
        const at = (label: string, key: string) =>
          steps.findIndex((s) => s.key === key && s.zoneLabels.includes(label));
        const index = (key: string) => steps.findIndex((s) => s.key === key);
        for (const item of items) {
          const zone = plan.zones.find((z) => z.key === item.zoneKey)!;
          const stepOf = steps.findIndex(
            (s) =>
              s.zoneLabels.includes(zone.label) && !s.key.startsWith('refit') && s.key !== 'treat',
          );
          if (FRAME_TRADES.includes(zone.tradeName)) {
            expect(stepOf).toBeGreaterThanOrEqual(0);
            expect(at(zone.label, 'refit-skins')).toBeGreaterThan(stepOf);
          }
          if (ROOF_TRADES.includes(zone.tradeName)) {
            expect(at(zone.label, 'refit-headliner')).toBeGreaterThan(stepOf);
            expect(
              index('refit-upholstery') === -1 ||
                index('refit-upholstery') > index('refit-headliner'),
            ).toBe(true);
          }
          if (item.needsTreatment) {
            expect(at(zone.label, 'treat')).toBe(0);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('lists follow-on steps only when the zones involved need them', () => {
    fc.assert(
      fc.property(planAndItems, ([plan, items]) => {
        const trades = items.map((i) => plan.zones.find((z) => z.key === i.zoneKey)!.tradeName);
        const keys = orderOfWork(items, plan).map((s) => s.key);
        expect(keys.includes('refit-headliner')).toBe(trades.some((t) => ROOF_TRADES.includes(t)));
        expect(keys.includes('treat')).toBe(items.some((i) => i.needsTreatment));
        const skins = [...FRAME_TRADES, ...ROOF_TRADES, 'skin-panel'];
        expect(keys.includes('refit-skins')).toBe(trades.some((t) => skins.includes(t)));
      }),
      { numRuns: 300 },
    );
  });

  it('a floor board alone needs no skins or headliner off; a treatment-only zone adds no repair', () => {
    const plan = BODY_PLANS.find((p) => p.zones.some((z) => z.tradeName === 'floor-board'))!;
    const board = plan.zones.find((z) => z.tradeName === 'floor-board')!;
    expect(orderOfWork([{ zoneKey: board.key }], plan).map((s) => s.key)).toEqual([
      'floor',
      'refit-upholstery',
    ]);
    const sill = plan.zones.find((z) => z.tradeName === 'sill')!;
    expect(
      orderOfWork([{ zoneKey: sill.key, needsTreatment: true, repair: false }], plan).map(
        (s) => s.key,
      ),
    ).toEqual(['treat']);
  });
});
