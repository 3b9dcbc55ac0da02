import { buildRepairScope, repairPlanFromScope } from '@/shared/reports';
import { repairPlanResponse } from '@/shared/schemas/repair-plan';
import {
  buildRechecks,
  buildReportSnapshot,
  buildTreatment,
  reportPlan,
  reportSettings,
} from '../factories/report-snapshot';

const plan = reportPlan();
const settings = reportSettings();
const treatment = buildTreatment(['tonneau-rail-right'], { appliedAt: '2026-11-25T09:00:00.000Z' });

const scope = buildRepairScope(
  buildReportSnapshot({
    generatedAt: '2027-01-07T10:00:00.000Z',
    findings: [
      { zoneKey: 'sill-left', severity: 4, activity: 'active', photos: [] },
      { zoneKey: 'cross-member-rear', severity: 3 },
      { zoneKey: 'sill-right', severity: 2 },
      {
        zoneKey: 'tonneau-rail-right',
        severity: 2,
        decayType: 'none',
        insectEvidence: ['frass-powder'],
        activity: 'active',
      },
      { zoneKey: 'door-front-left-bottom-rail', severity: 1 },
    ],
    decisions: [
      { zoneKey: 'sill-left', decayShare: 0.7, affectedShare: 0.4, atJointOrFitting: true },
      { zoneKey: 'cross-member-rear', decayShare: 0.5, affectedShare: 0.15 },
      { zoneKey: 'door-front-left-bottom-rail', decayShare: 0.02 },
      { zoneKey: 'tonneau-rail-right', decayShare: 0.05 },
    ],
    treatments: [treatment],
    rechecks: buildRechecks(treatment, settings, 1),
  }),
  plan,
);

describe('repairPlanFromScope', () => {
  const out = repairPlanFromScope(scope);

  it('answers the response contract exactly (no extra fields leak from the report model)', () => {
    expect(repairPlanResponse.strict().parse(out)).toEqual(out);
  });

  it('keeps the scope’s lists, order and totals as they are', () => {
    const keys = (xs: { zoneKey: string }[]) => xs.map((x) => x.zoneKey);
    expect(keys(out.structural)).toEqual(keys(scope.structural));
    expect(keys(out.cosmetic)).toEqual(keys(scope.cosmetic));
    expect(keys(out.monitor)).toEqual(keys(scope.monitor));
    expect(keys(out.undecided)).toEqual(keys(scope.undecided));
    expect(out.totals.totalCost).toBe(scope.totals.totalCost);
    expect(out.totals.structural).toEqual(scope.totals.structural);
    expect(out.cutList.map((c) => c.boardFeetWithWaste)).toEqual(
      scope.cutList.map((c) => c.boardFeetWithWaste),
    );
    expect(out.workOrder).toEqual(scope.workOrder);
    expect(out.structural.length).toBeGreaterThan(0);
  });

  it('gives a watched zone its next re-check', () => {
    const watched = out.monitor.find((m) => m.zoneKey === 'tonneau-rail-right');
    const source = scope.monitor.find((m) => m.zoneKey === 'tonneau-rail-right')!;
    expect(watched?.nextDue).toBe(source.nextRechecks[0]?.dueDate ?? null);
    expect(watched?.nextDue).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });
});
