import { Workshop, type Vehicle } from '@/server/models';
import type { MemberContext } from '@/server/middleware/workshop';
import { DEMO_ACCOUNTS } from '@/server/seeders/demo';
import { collectReportSnapshot } from '@/server/services/report-snapshot';
import { getBodyPlan, getZone, type BodyPlan } from '@/shared/body-plans';
import { buildRepairScope, type RepairScope, type ReportKind } from '@/shared/reports';
import type { TestDatabase } from '../e2e/support/test-db';
import { contextOf, createMember, createWorkshop } from '../factories';
import {
  flat,
  headingLine,
  moneyValue,
  pdfFonts,
  pdfImages,
  pdfInfo,
  pdfText,
  section,
  textLines,
} from './support/poppler';
import {
  photosOf,
  renderDemoReports,
  type DemoReports,
  type Rendered,
  VERIFY_URL,
} from './support/report-demo';

// Seeding draws the demo photos; a loaded CI machine needs minutes.
const SETUP_TIMEOUT = 240_000;
const FOOTER = /Page \d+ of \d+$/;
const SCOPE_HEADINGS = [
  'Structural, must fix',
  'Cosmetic',
  'Monitor',
  'Totals',
  'Timber cut list',
  'Order of work',
  'Treatment history',
  'Not inspected',
  'Limits of this survey',
  'Cautions',
  'Photographs',
];
const IDS: Record<ReportKind, string> = {
  'repair-scope': 'SF-7K3M-Q9TD',
  condition: 'SF-C0ND-4R2P',
};

let demo: DemoReports;
let db: TestDatabase;
let inspector: MemberContext;
let vehicle: Vehicle;
let plan: BodyPlan;
let scope: RepairScope;
let out: Record<ReportKind, Rendered>;
const render: DemoReports['render'] = (snapshot, kind) => demo.render(snapshot, kind);

beforeAll(async () => {
  demo = await renderDemoReports(IDS);
  ({ db, inspector, vehicle, out } = demo);
  plan = getBodyPlan(vehicle.bodyPlanKey)!;
  scope = buildRepairScope(out['repair-scope'].snapshot, plan);
}, SETUP_TIMEOUT);
afterAll(async () => {
  await db.drop();
});

describe('collectReportSnapshot', () => {
  it('freezes the demo vehicle’s records in report order', () => {
    const s = out['repair-scope'].snapshot;
    expect(s.vehicle.id).toBe(vehicle.id);
    expect(s.generatedByName).toBe(DEMO_ACCOUNTS.find((a) => a.role === 'inspector')!.name);
    const dates = s.surveys.map((x) => x.date);
    expect(dates).toEqual([...dates].sort().reverse());
    const applied = s.treatments.map((t) => t.appliedAt);
    expect(applied).toEqual([...applied].sort());
    expect(s.findings.every((f) => f.deletedAt === null && f.vehicleId === vehicle.id)).toBe(true);
    expect(s.zoneStates.map((z) => z.zoneKey).sort()).toEqual(plan.zones.map((z) => z.key).sort());
  });

  it('answers 404 for a client the vehicle is not shared with and for another workshop', async () => {
    const workshop = (await Workshop.findByPk(inspector.workshopId))!;
    const client = await createMember(db.config, workshop, 'client');
    const stranger = await createMember(db.config, await createWorkshop(), 'owner');
    for (const m of [client.membership, stranger.membership])
      await expect(
        collectReportSnapshot(contextOf(m), vehicle.id, 'repair-scope'),
      ).rejects.toMatchObject({ status: 404 });
  });
});

describe('repair scope PDF of the demo vehicle', () => {
  const r = () => out['repair-scope'];

  it('has every section heading, in order', () => {
    const at = SCOPE_HEADINGS.map((h) => headingLine(r().lines, h));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect(at).toEqual([...at].sort((a, b) => a - b));
  });

  it('lists every structural item under its heading and none under cosmetic', () => {
    expect(scope.structural.length).toBeGreaterThan(0);
    const zoneLine = (label: string) => `Zone: ${label}`;
    const structural = section(r().lines, 'Structural, must fix', 'Cosmetic', FOOTER);
    const cosmetic = section(r().lines, 'Cosmetic', 'Monitor', FOOTER);
    for (const item of scope.structural) {
      expect(structural).toContain(zoneLine(item.zoneLabel));
      // Not even mentioned there: no line, no wrapped phrase.
      expect(flat(cosmetic)).not.toContain(item.zoneLabel);
    }
    for (const item of scope.cosmetic) expect(cosmetic).toContain(zoneLine(item.zoneLabel));
    // The snapshot's own decisions, not the model: every structural decision is printed.
    const decided = r().snapshot.decisions.filter((d) => d.decisionClass === 'structural-must-fix');
    for (const d of decided)
      expect(structural).toContain(zoneLine(getZone(plan, d.zoneKey)!.label));
  });

  it('prints totals equal to the sum of the printed items', () => {
    const items = section(r().lines, 'Structural, must fix', 'Totals', FOOTER);
    const totals = section(r().lines, 'Totals', 'Timber cut list', FOOTER);
    const grab = (lines: string[], re: RegExp) =>
      lines.flatMap((l) => (re.exec(l) ? [re.exec(l)![1]] : []));
    const hours = grab(items, /^Hours: ([\d.]+) h$/).map(Number);
    const costs = grab(items, /^Cost: (\S+)/).map(moneyValue);
    const timber = grab(items, /^Timber: ([\d.]+) bd ft/).map(Number);
    expect(hours.length).toBeGreaterThan(0);
    expect(costs).toHaveLength(hours.length);
    const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
    // Each printed figure is rounded to its last place: the sum may drift by half of it per item.
    const [totalHours] = grab(totals, /^Total hours: ([\d.]+) h$/).map(Number);
    const [totalCost] = grab(totals, /^Total cost: (\S+)$/).map(moneyValue);
    expect(Math.abs(sum(hours) - totalHours)).toBeLessThanOrEqual(0.05 * hours.length + 1e-9);
    expect(Math.abs(sum(costs) - totalCost)).toBeLessThanOrEqual(0.005 * costs.length + 1e-9);
    const bySpecies = grab(totals, /^.+?\s{2,}([\d.]+) bd ft\s{2,}\S+$/).map(Number);
    expect(Math.abs(sum(timber) - sum(bySpecies))).toBeLessThanOrEqual(
      0.005 * (timber.length + bySpecies.length) + 1e-9,
    );
  });

  it('prints the treatment label details, the areas not inspected and the cautions', () => {
    const s = r().snapshot;
    expect(s.treatments.length).toBeGreaterThan(0);
    const history = flat(section(r().lines, 'Treatment history', 'Not inspected', FOOTER));
    for (const t of s.treatments) {
      for (const v of [t.productName, t.registrationNumber, t.activeIngredient, t.concentration])
        expect(history).toContain(v);
      expect(history).toContain(`Re-entry interval: ${t.reentryHours} h`);
    }
    const missed = flat(section(r().lines, 'Not inspected', 'Limits of this survey', FOOTER));
    const expected = s.surveys.flatMap((v) => [
      ...v.notAccessibleZones.map((k) => getZone(plan, k)!.label),
      ...(v.notAccessibleNotes.trim() ? [v.notAccessibleNotes.trim().replace(/\s+/g, ' ')] : []),
    ]);
    expect(expected.length).toBeGreaterThan(0);
    for (const what of expected) expect(missed).toContain(what);
    const cautions = flat(section(r().lines, 'Cautions', 'Photographs', FOOTER));
    expect(scope.cautions.length).toBeGreaterThanOrEqual(5);
    for (const c of scope.cautions) expect(cautions).toContain(c.title);
  });

  it('embeds each photo once, as a JPEG of at most 1000 px', () => {
    const s = r().snapshot;
    // Every decided zone, and the damaged zones still waiting for a decision.
    const expected = photosOf(s, [
      ...s.decisions.map((d) => d.zoneKey),
      ...scope.undecided.map((u) => u.zoneKey),
    ]);
    expect(expected.size).toBeGreaterThan(0);
    const images = pdfImages(r().report.pdf);
    expect(new Set(images.map((i) => i.object)).size).toBe(expected.size);
    expect(images).toHaveLength(expected.size);
    expect(r().report.photoCount).toBe(expected.size);
    for (const i of images) {
      expect(i.encoding).toBe('jpeg');
      expect(Math.max(i.width, i.height)).toBeLessThanOrEqual(1000);
    }
  });

  it('reports its progress in order, photo by photo', () => {
    const p = r().progress;
    const values = p.map(([v]) => v);
    expect(values).toEqual([...values].sort((a, b) => a - b));
    expect(values.at(-1)).toBe(100);
    const stages = p.map(([, s]) => s);
    expect(stages).toContain('Drawing the body diagram');
    expect(stages).toContain(`Embedding photos ${r().report.photoCount}/${r().report.photoCount}`);
  });
});

describe.each(['repair-scope', 'condition'] as const)('%s PDF file', (kind) => {
  const r = () => out[kind];

  it('prints the identifier, version and "Page N of M" on every page', () => {
    const { pdf, pageCount } = r().report;
    expect(pdfInfo(pdf).pages).toBe(pageCount);
    for (let n = 1; n <= pageCount; n++) {
      const page = pdfText(pdf, n);
      expect(page).toContain(IDS[kind]);
      expect(page).toContain('version 3');
      expect(page).toContain(`Page ${n} of ${pageCount}`);
    }
  });

  it('tells the reader on page 1 where to check it, with its identifier', () => {
    // A line may break after a slash of the address.
    const cover = flat(textLines(pdfText(r().report.pdf, 1))).replace(/\/ /g, '/');
    expect(cover).toContain(
      `To check that this copy is genuine and unchanged, enter ${IDS[kind]} or drop this PDF on ${VERIFY_URL}.`,
    );
  });

  it('carries the identifier in the document info for the verifier', () => {
    const { fields } = pdfInfo(r().report.pdf);
    expect(fields.SoundframeReportId).toBe(IDS[kind]);
    expect(fields.Keywords).toContain(IDS[kind]);
    expect(fields.Author).toBe(r().snapshot.workshop.name);
  });

  it('uses only the shipped Atkinson Hyperlegible fonts, embedded and subset', () => {
    const fonts = pdfFonts(r().report.pdf);
    expect(new Set(fonts.map((f) => f.name.replace(/^[A-Z]{6}\+/, '')))).toEqual(
      new Set(['AtkinsonHyperlegible-Regular', 'AtkinsonHyperlegible-Bold']),
    );
    expect(fonts.every((f) => f.embedded && f.subset)).toBe(true);
  });

  it('follows the workshop’s paper size', async () => {
    // ISO 216 A4 is 210 × 297 mm; ANSI Letter is 8.5 × 11 in; 72 pt to the inch.
    const size = (paper: 'A4' | 'Letter') => {
      const settings = { ...r().snapshot.workshop.settings, paperSize: paper };
      return render({ ...r().snapshot, workshop: { ...r().snapshot.workshop, settings } }, kind);
    };
    const [a4, letter] = [await size('A4'), await size('Letter')];
    const [aw, ah] = pdfInfo(a4.report.pdf).pageSize;
    expect(aw).toBeCloseTo((210 / 25.4) * 72, 0);
    expect(ah).toBeCloseTo((297 / 25.4) * 72, 0);
    expect(pdfInfo(letter.report.pdf).pageSize).toEqual([8.5 * 72, 11 * 72]);
  });
});

describe('buyer’s condition report of the demo vehicle', () => {
  const r = () => out.condition;

  it('names every structural item of the scope before the photographs', () => {
    const appendix = headingLine(r().lines, 'Photographs');
    expect(appendix).toBeGreaterThan(0);
    const body = flat(r().lines.slice(0, appendix));
    expect(scope.structural.length).toBeGreaterThan(0);
    for (const item of scope.structural) expect(body).toContain(item.zoneLabel);
    // Damage still without a decision is named too, so a buyer is never told less than the scope.
    for (const u of scope.undecided) expect(body).toContain(u.zoneLabel);
    expect(r().report.summary.mustFix.map((m) => m.zoneLabel)).toEqual(
      scope.structural.map((i) => i.zoneLabel),
    );
  });

  it('takes one or two pages before the appendix', () => {
    const { pdf, pageCount } = r().report;
    const first = [...Array(pageCount).keys()]
      .map((i) => i + 1)
      .find((n) => textLines(pdfText(pdf, n)).includes('Photographs'));
    expect(first).toBeDefined();
    expect(first! - 1).toBeGreaterThanOrEqual(1);
    expect(first! - 1).toBeLessThanOrEqual(2);
  });

  it('shows the must-fix zones’ photos, each once, and the limits and cautions', () => {
    // The must-fix zones, then the damaged zones still without a decision.
    const zones = [...scope.structural, ...scope.undecided].map((i) => i.zoneKey);
    const expected = photosOf(r().snapshot, zones);
    expect(expected.size).toBeGreaterThan(0);
    const images = pdfImages(r().report.pdf);
    expect(new Set(images.map((i) => i.object)).size).toBe(expected.size);
    expect(r().report.photoCount).toBe(expected.size);
    const text = flat(r().lines);
    for (const l of scope.limitations.slice(0, 2)) expect(text).toContain(l);
    for (const c of scope.cautions) expect(text).toContain(c.title);
    for (const n of scope.notInspected) expect(text).toContain(n.what.replace(/\s+/g, ' '));
    const inspectorName = r().snapshot.surveys[0]?.inspectorName;
    expect(inspectorName).toBeTruthy();
    expect(text).toContain(inspectorName!);
  });
});
