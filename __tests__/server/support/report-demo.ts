/**
 * The demo workshop in a database of its own, the demo vehicle's snapshot collected as the demo
 * inspector, and both reports rendered from it; PDFs, page-1 PNGs and timings go to the
 * artifacts folder (.artifacts/reports/).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { MemberContext } from '@/server/middleware/workshop';
import { Membership, User, Vehicle } from '@/server/models';
import { renderReport } from '@/server/reports/render';
import type { RenderedReport } from '@/server/reports/types';
import { DEMO_ACCOUNTS, seedDemoIfEmpty } from '@/server/seeders/demo';
import { readRendition } from '@/server/services/photos';
import { collectReportSnapshot } from '@/server/services/report-snapshot';
import { createStorage, type StorageAdapter } from '@/server/storage';
import type { ReportKind, ReportSnapshot } from '@/shared/reports';
import { createTestDatabase, type TestDatabase } from '../../e2e/support/test-db';
import { contextOf } from '../../factories';
import { pageToPng, pdfText, textLines } from './poppler';

/** What the job passes the renderer as the verification page (PUBLIC_URL + /verify). */
export const VERIFY_URL = 'http://soundframe.example.test/verify';

export const ARTIFACTS = path.join(
  process.env.ARTIFACTS_DIR ?? path.resolve(__dirname, '..', '..', '..', '.artifacts'),
  'reports',
);

export interface Rendered {
  snapshot: ReportSnapshot;
  report: RenderedReport;
  lines: string[];
  progress: [number, string][];
}

export interface DemoReports {
  db: TestDatabase;
  inspector: MemberContext;
  vehicle: Vehicle;
  out: Record<ReportKind, Rendered>;
  render(snapshot: ReportSnapshot, kind: ReportKind): Promise<Rendered>;
}

export async function renderDemoReports(ids: Record<ReportKind, string>): Promise<DemoReports> {
  const db = await createTestDatabase('report_pdf');
  const storage: StorageAdapter = createStorage({
    driver: 'local',
    dir: fs.mkdtempSync(path.join(os.tmpdir(), 'sf-report-')),
  });
  await seedDemoIfEmpty(db.sequelize, db.config, { storage });
  const account = DEMO_ACCOUNTS.find((a) => a.role === 'inspector')!;
  const user = await User.findOne({ where: { email: account.email } });
  const m = await Membership.findOne({ where: { userId: user!.id } });
  const inspector = contextOf(m!);
  const vehicle = (await Vehicle.findOne({
    where: { make: 'Aldermoor', model: 'Fourteen Tourer' },
  }))!;

  const render = async (snapshot: ReportSnapshot, kind: ReportKind): Promise<Rendered> => {
    const progress: [number, string][] = [];
    const report = await renderReport(
      snapshot,
      { shortId: ids[kind], version: 3, verifyUrl: VERIFY_URL },
      { loadPhoto: (id) => readRendition(inspector, storage, id, 'display').catch(() => null) },
      (p, stage) => void progress.push([p, stage]),
    );
    return { snapshot, report, lines: textLines(pdfText(report.pdf)), progress };
  };

  fs.mkdirSync(ARTIFACTS, { recursive: true });
  const out = {} as Record<ReportKind, Rendered>;
  const metrics: Record<string, unknown> = {};
  for (const kind of ['repair-scope', 'condition'] as const) {
    const snapshot = await collectReportSnapshot(inspector, vehicle.id, kind);
    const started = performance.now();
    out[kind] = await render(snapshot, kind);
    const { report } = out[kind];
    metrics[kind] = {
      ms: Math.round(performance.now() - started),
      bytes: report.pdf.length,
      pages: report.pageCount,
      photos: report.photoCount,
    };
    fs.writeFileSync(path.join(ARTIFACTS, `${kind}.pdf`), report.pdf);
    pageToPng(report.pdf, 1, path.join(ARTIFACTS, `${kind}-page-1`));
  }
  fs.writeFileSync(path.join(ARTIFACTS, 'metrics.json'), JSON.stringify(metrics, null, 2));
  return { db, inspector, vehicle, out, render };
}

/** Photo ids of the open findings in the given zones, straight from the snapshot. */
export function photosOf(snapshot: ReportSnapshot, zoneKeys: string[]): Set<string> {
  const zones = new Set(zoneKeys);
  return new Set(
    snapshot.findings.filter((f) => zones.has(f.zoneKey)).flatMap((f) => f.photos.map((p) => p.id)),
  );
}
