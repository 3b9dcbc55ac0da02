import * as fc from 'fast-check';
import { buildConditionReport, buildRepairScope, reportSummary } from '@/shared/reports';
import { REPORT_KINDS, reportSummarySchema } from '@/shared/schemas/report';
import {
  buildRechecks,
  buildReportSnapshot,
  buildTreatment,
  reportPlan,
  reportSettings,
  type DecisionSpec,
  type FindingSpec,
} from '../factories/report-snapshot';

const plan = reportPlan();
const zoneKeys = plan.zones.map((z) => z.key);

/** Random damage on random zones, each damaged zone decided or not. */
const snapshotDraw = fc
  .uniqueArray(
    fc.record({
      zoneKey: fc.constantFrom(...zoneKeys),
      severity: fc.integer({ min: 1, max: 4 }),
      active: fc.boolean(),
      decayShare: fc.double({ min: 0, max: 0.9, noNaN: true }),
      affectedShare: fc.double({ min: 0.01, max: 0.9, noNaN: true }),
      decided: fc.boolean(),
    }),
    { selector: (d) => d.zoneKey, maxLength: 15 },
  )
  .map((draws) => {
    const findings: FindingSpec[] = draws.map((d) => ({
      zoneKey: d.zoneKey,
      severity: d.severity,
      activity: d.active ? 'active' : 'inactive',
    }));
    const decisions: DecisionSpec[] = draws
      .filter((d) => d.decided)
      .map(({ zoneKey, decayShare, affectedShare }) => ({ zoneKey, decayShare, affectedShare }));
    return buildReportSnapshot({ findings, decisions });
  });

describe('buildConditionReport', () => {
  it('lists every structural item of the repair scope, in the same order (fast-check)', () => {
    fc.assert(
      fc.property(snapshotDraw, (snapshot) => {
        const scope = buildRepairScope(snapshot, plan);
        const buyer = buildConditionReport(snapshot, plan);
        expect(buyer.mustFix.map((m) => m.zoneLabel)).toEqual(
          scope.structural.map((i) => i.zoneLabel),
        );
        expect(buyer.mustFix.map((m) => m.verdictLabel)).toEqual(
          scope.structural.map((i) => i.verdictLabel),
        );
        expect(buyer.condition).toEqual(scope.condition);
        expect(buyer.notInspected).toEqual(scope.notInspected);
      }),
      { numRuns: 150 },
    );
  });

  it('words active and treated zones plainly, with the re-check status', () => {
    const settings = reportSettings();
    const treatment = buildTreatment(['tonneau-rail-left'], {
      appliedAt: '2026-11-25T09:00:00.000Z',
    });
    const snapshot = buildReportSnapshot({
      generatedAt: '2026-12-20T09:00:00.000Z',
      findings: [
        { zoneKey: 'tonneau-rail-left', severity: 2, activity: 'active' },
        { zoneKey: 'sill-right', severity: 3, activity: 'active' },
      ],
      treatments: [treatment],
      rechecks: buildRechecks(treatment, settings, 1),
    });
    const buyer = buildConditionReport(snapshot, plan);
    const byZone = Object.fromEntries(buyer.infestations.map((i) => [i.zoneLabel, i]));
    expect(byZone['Right sill'].plain).toMatch(/live attack; not yet treated/);
    const rail = plan.zones.find((z) => z.key === 'tonneau-rail-left')!.label;
    expect(byZone[rail].stateLabel).toBe('Treated, watching');
    expect(byZone[rail].plain).toContain(
      `1 of ${settings.treatments.clearance.cleanChecksRequired}`,
    );
    expect(buyer.headline.join(' ')).toMatch(/1 area shows live insect or decay attack/);
  });
});

describe('reportSummary', () => {
  it('parses with reportSummarySchema for both kinds; totals only on the repair scope', () => {
    fc.assert(
      fc.property(snapshotDraw, fc.constantFrom(...REPORT_KINDS), (snapshot, kind) => {
        const scope = buildRepairScope(snapshot, plan);
        const summary = reportSummary(kind, scope);
        expect(reportSummarySchema.parse(summary)).toEqual(summary);
        if (kind === 'repair-scope') {
          expect(summary.totals).toEqual({
            hours: scope.totals.hours,
            totalCost: scope.totals.totalCost,
            currency: scope.totals.currency,
          });
        } else {
          expect(summary.totals).toBeNull();
        }
        expect(summary.mustFix).toHaveLength(scope.structural.length);
        // The drawing on the share page: every zone with open findings, its count and worst severity.
        const expected: Record<string, { worstSeverity: number; count: number }> = {};
        for (const f of snapshot.findings) {
          const z = expected[f.zoneKey] ?? { worstSeverity: 0, count: 0 };
          expected[f.zoneKey] = {
            worstSeverity: Math.max(z.worstSeverity, f.severity),
            count: z.count + 1,
          };
        }
        expect(summary.diagram).toEqual({ bodyPlanKey: plan.key, zones: expected });
      }),
      { numRuns: 100 },
    );
  });
});
