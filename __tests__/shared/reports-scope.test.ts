import { buildRepairScope, type RepairScope } from '@/shared/reports';
import {
  buildRechecks,
  buildReportSnapshot,
  buildSurvey,
  buildTreatment,
  reportPlan,
  reportSettings,
} from '../factories/report-snapshot';

const plan = reportPlan();
const settings = reportSettings();
// Applied after the survey's findings were recorded, so the zone is treated, not freshly active.
const treatment = buildTreatment(['tonneau-rail-right'], { appliedAt: '2026-11-25T09:00:00.000Z' });
const rechecks = buildRechecks(treatment, settings, 1);

function richSnapshot(generatedAt = '2027-01-07T10:00:00.000Z') {
  return buildReportSnapshot({
    generatedAt,
    findings: [
      { zoneKey: 'sill-left', severity: 4, activity: 'active', photos: [] },
      { zoneKey: 'hinge-pillar-front-left', severity: 3, decayType: 'white-rot' },
      { zoneKey: 'cross-member-rear', severity: 3 },
      { zoneKey: 'sill-right', severity: 2 },
      { zoneKey: 'wheel-arch-left', severity: 3, activity: 'inactive' },
      { zoneKey: 'floor-board-2', severity: 2, decayType: 'none' },
      {
        zoneKey: 'tonneau-rail-right',
        severity: 2,
        decayType: 'none',
        insectEvidence: ['frass-powder', 'exit-holes-round'],
        activity: 'active',
      },
      { zoneKey: 'tonneau-rail-left', severity: 1, decayType: 'unknown' },
      { zoneKey: 'door-front-left-bottom-rail', severity: 1 },
    ],
    decisions: [
      { zoneKey: 'sill-left', decayShare: 0.7, affectedShare: 0.4, atJointOrFitting: true },
      { zoneKey: 'hinge-pillar-front-left', decayShare: 0.5, affectedShare: 0.2 },
      { zoneKey: 'cross-member-rear', decayShare: 0.5, affectedShare: 0.15 },
      { zoneKey: 'wheel-arch-left', decayShare: 0.4, affectedShare: 0.1 },
      {
        zoneKey: 'floor-board-2',
        decayShare: 0.4,
        chosenOption: 'replace-member',
        overrideReason: 'The board is also split along its length',
      },
      { zoneKey: 'tonneau-rail-left', decayShare: 0.05 },
      { zoneKey: 'door-front-left-bottom-rail', decayShare: 0.02 },
      { zoneKey: 'tonneau-rail-right', decayShare: 0.05 },
    ],
    treatments: [treatment],
    rechecks,
    surveys: [
      buildSurvey({
        date: '2026-11-02',
        notAccessibleZones: ['heel-board', 'floor-board-3'],
        notAccessibleNotes: 'Rear body behind the fuel tank',
      }),
      buildSurvey({ date: '2026-12-01', inspectorName: 'Latest Inspector' }),
    ],
  });
}

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
const keys = (items: { zoneKey: string }[]) => items.map((i) => i.zoneKey).sort();

describe('buildRepairScope', () => {
  const snapshot = richSnapshot();
  const scope: RepairScope = buildRepairScope(snapshot, plan);

  it('lists every structural-must-fix decision under structural and none under cosmetic', () => {
    const byClass = (c: string) => snapshot.decisions.filter((d) => d.decisionClass === c);
    expect(byClass('structural-must-fix').length).toBeGreaterThanOrEqual(3);
    expect(keys(scope.structural)).toEqual(keys(byClass('structural-must-fix')));
    expect(keys(scope.cosmetic)).toEqual(keys(byClass('cosmetic')));
    const structural = new Set(scope.structural.map((i) => i.zoneKey));
    expect(scope.cosmetic.some((i) => structural.has(i.zoneKey))).toBe(false);
    expect(scope.structural.every((i) => i.decisionClass === 'structural-must-fix')).toBe(true);
  });

  it('sorts structural items primary first, then worst severity, then label', () => {
    const rank = { primary: 0, secondary: 1, 'non-structural': 2 };
    for (let i = 1; i < scope.structural.length; i++) {
      const [a, b] = [scope.structural[i - 1], scope.structural[i]];
      const order =
        rank[a.structuralClass] - rank[b.structuralClass] ||
        b.worstSeverity - a.worstSeverity ||
        a.zoneLabel.localeCompare(b.zoneLabel);
      expect(order).toBeLessThanOrEqual(0);
    }
    expect(scope.structural[0].structuralClass).toBe('primary');
  });

  it('totals are the exact sums of the decided items', () => {
    const items = [
      ...scope.structural,
      ...scope.cosmetic,
      ...scope.monitor.flatMap((m) => (m.decision ? [m.decision] : [])),
    ];
    expect(items).toHaveLength(snapshot.decisions.length);
    expect(scope.totals.totalCost).toBe(sum(items.map((i) => i.totalCost)));
    expect(scope.totals.hours).toBe(sum(items.map((i) => i.hours)));
    expect(scope.totals.labourCost + scope.totals.materialCost).toBeCloseTo(
      scope.totals.totalCost,
      9,
    );
    expect(scope.totals.structural.totalCost).toBe(sum(scope.structural.map((i) => i.totalCost)));
    expect(scope.totals.cosmetic.count).toBe(scope.cosmetic.length);
    expect(scope.totals.totalCost).toBeGreaterThan(0);
    expect(scope.totals.currency).toBe('GBP');
  });

  it('board feet by species sum the cut list, and every species is labelled', () => {
    for (const row of scope.totals.boardFeetBySpecies) {
      const lines = scope.cutList.filter((c) => c.species === row.species);
      expect(row.boardFeet).toBeCloseTo(sum(lines.map((c) => c.boardFeetWithWaste)), 9);
      expect(row.cost).toBeCloseTo(sum(lines.map((c) => c.cost)), 9);
      expect(row.label).toMatch(/^[A-Z]/);
    }
    expect(sum(scope.totals.boardFeetBySpecies.map((r) => r.boardFeet))).toBeCloseTo(
      sum(snapshot.decisions.flatMap((d) => d.materials.map((m) => m.boardFeetWithWaste))),
      9,
    );
    expect(scope.cutList.length).toBeGreaterThan(0);
  });

  it('lists damaged zones without a decision as undecided', () => {
    expect(scope.undecided.map((u) => u.zoneKey)).toEqual(['sill-right']);
    expect(scope.undecided[0].findings[0]).toMatch(/^Severity 2 \(shallow\), brown rot/);
    expect(scope.condition.undecidedZones).toBe(1);
  });

  it('puts active and watched zones and monitor decisions on the monitor list with the re-check plan', () => {
    const rail = scope.monitor.find((m) => m.zoneKey === 'tonneau-rail-right')!;
    expect(rail.state).toBe('treated-watching');
    expect(rail.decision?.decisionClass).toBe('monitor');
    expect(rail.cleanRechecks).toBe(1);
    expect(rail.cleanRechecksNeeded).toBe(settings.treatments.clearance.cleanChecksRequired);
    const pending = rechecks.filter((r) => r.status === 'pending').map((r) => r.dueDate);
    expect(rail.nextRechecks.map((r) => r.dueDate)).toEqual(pending);
    // Generated 2027-01-07: the 42-day check (2027-01-06) is overdue, the later ones are not.
    expect(rail.nextRechecks.map((r) => r.overdue)).toEqual(pending.map((d) => d < '2027-01-07'));
    expect(rail.nextRechecks[0]).toEqual({ dueDate: '2027-01-06', overdue: true });
    expect(scope.monitor.find((m) => m.zoneKey === 'sill-left')?.state).toBe('active');
  });

  it('decides overdue in the workshop time zone', () => {
    const at = '2027-01-06T12:00:00.000Z'; // already 7 January in Auckland
    const utc = buildRepairScope(richSnapshot(at), plan);
    const nz = richSnapshot(at);
    nz.workshop.settings.treatments.timeZone = 'Pacific/Auckland';
    const first = (s: RepairScope) =>
      s.monitor.find((m) => m.zoneKey === 'tonneau-rail-right')!.nextRechecks[0];
    expect(first(utc).overdue).toBe(false);
    expect(first(buildRepairScope(nz, plan)).overdue).toBe(true);
  });

  it('adds the override reason when the chosen option differs from the recommendation', () => {
    const board = snapshot.decisions.find((d) => d.zoneKey === 'floor-board-2')!;
    expect(board.recommendedOption).not.toBe(board.chosenOption);
    const item = scope.cosmetic.find((i) => i.zoneKey === 'floor-board-2')!;
    expect(item.reasons.slice(0, -1)).toEqual(board.recommendationReasons);
    expect(item.reasons.at(-1)).toContain('The board is also split along its length');
    expect(item.verdict).toBe('replace-member');
    const sill = snapshot.decisions.find((d) => d.zoneKey === 'sill-left')!;
    expect(sill.chosenOption).toBe(sill.recommendedOption);
    expect(scope.structural.find((i) => i.zoneKey === 'sill-left')!.reasons).toEqual(
      sill.recommendationReasons,
    );
  });

  it('words findings plainly', () => {
    const rail = buildRepairScope(snapshot, plan).monitor.find(
      (m) => m.zoneKey === 'tonneau-rail-right',
    )!.decision!;
    expect(rail.findings).toEqual([
      'Severity 2 (shallow), frass, fine powder, exit holes, round, active',
    ]);
  });

  it('lists every area not inspected with its survey date, and the survey limits', () => {
    expect(scope.notInspected).toEqual([
      { date: '2026-11-02', what: 'Heel board' },
      { date: '2026-11-02', what: plan.zones.find((z) => z.key === 'floor-board-3')!.label },
      { date: '2026-11-02', what: 'Rear body behind the fuel tank' },
    ]);
    expect(scope.limitations.join(' ')).toMatch(/not opened/);
    expect(scope.limitations.join(' ')).toMatch(/dormant/);
  });

  it('prints the cautions with a source each', () => {
    const keysOf = scope.cautions.map((c) => c.key);
    expect(keysOf).toEqual(
      expect.arrayContaining(['label-is-law', 'fumigation', 'dust', 'structure']),
    );
    expect(scope.cautions.every((c) => c.source.length > 0)).toBe(true);
  });

  it('shades every zone of the plan by its worst open severity', () => {
    expect(Object.keys(scope.zoneSeverity).sort()).toEqual(plan.zones.map((z) => z.key).sort());
    expect(scope.zoneSeverity['sill-left']).toBe(4);
    expect(scope.zoneSeverity['seat-frame-front']).toBe(0);
  });

  it('fills the cover from the vehicle and the latest survey, paper and units from the settings', () => {
    expect(scope.cover.vehicleTitle).toBe('1927 Testmoor Tourer');
    expect(scope.cover.inspectorName).toBe('Latest Inspector');
    expect(scope.cover.latestSurveyDate).toBe('2026-12-01');
    expect(scope.paperSize).toBe('A4');
    const letter = richSnapshot();
    letter.workshop.settings.paperSize = 'Letter';
    letter.workshop.settings.units = 'imperial';
    const s = buildRepairScope(letter, plan);
    expect([s.paperSize, s.units]).toEqual(['Letter', 'imperial']);
  });

  it('lists the treatment history with its label details', () => {
    expect(scope.treatments).toHaveLength(1);
    expect(scope.treatments[0]).toMatchObject({
      productName: treatment.productName,
      registrationNumber: treatment.registrationNumber,
      method: 'Brushed on',
      zoneLabels: [plan.zones.find((z) => z.key === 'tonneau-rail-right')!.label],
      quantity: '1.5 L',
    });
  });
});
