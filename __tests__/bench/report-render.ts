/**
 * Benchmark of report rendering (`npm run bench:reports`): prints time, size, pages and memory for
 * a large invented vehicle — every member of the open tourer with a finding, a decision on each,
 * and 30 photos — rendered as both kinds, one at a time and then four at once (what
 * REPORT_CONCURRENCY bounds). Figures only; nothing here passes or fails.
 */
import { performance } from 'node:perf_hooks';
import type { ReportKind } from '@/shared/schemas/report';
import { renderReport } from '@/server/reports/render';
import { drawDemoPhoto, type DemoPhotoKind } from '@/server/seeders/demo-photos';
import { processPhoto } from '@/server/services/photo-processing';
import { buildReportSnapshot, reportPlan } from '../factories/report-snapshot';

const PHOTOS = 30;
const KINDS: DemoPhotoKind[] = ['sill-rot', 'frass', 'exit-holes', 'sound-ash', 'roof-rail'];
const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

async function main() {
  const plan = reportPlan();
  const photos = new Map<string, Buffer>();
  const zones = plan.zones;
  for (let i = 0; i < PHOTOS; i++) {
    const { display } = await processPhoto(await drawDemoPhoto(KINDS[i % KINDS.length], i + 1));
    photos.set(`00000000-0000-4000-8000-${String(i + 1).padStart(12, '0')}`, display.buffer);
  }
  const photoIds = [...photos.keys()];
  const snapshot = (kind: ReportKind) => ({
    ...buildReportSnapshot({
      findings: zones.map((z, i) => ({
        zoneKey: z.key,
        severity: 1 + (i % 4),
        activity: i % 7 === 0 ? ('active' as const) : ('inactive' as const),
        notes: `Finding on ${z.label}.`,
        photos: photoIds
          .filter((_, p) => p % zones.length === i)
          .map((id) => ({
            id,
            findingId: id,
            width: 1600,
            height: 1200,
            thumbUrl: '',
            displayUrl: '',
            caption: `Photo ${id.slice(-3)}`,
            createdAt: '2026-11-02T09:00:00.000Z',
          })),
      })),
      decisions: zones.map((z, i) => ({
        zoneKey: z.key,
        decayShare: (i % 5) * 0.15,
        affectedShare: 0.05 + (i % 4) * 0.1,
      })),
    }),
    kind,
  });
  const deps = { loadPhoto: async (id: string) => photos.get(id) ?? null };
  const identity = { shortId: 'SF-BNCH-0001', version: 1 };
  console.log(
    `Report rendering — ${zones.length} members, ${zones.length} decisions, ${PHOTOS} photos (Node ${process.version})`,
  );

  for (const kind of ['repair-scope', 'condition'] as const) {
    const rss = process.memoryUsage().rss;
    const t0 = performance.now();
    const r = await renderReport(snapshot(kind), identity, deps, () => {});
    const ms = performance.now() - t0;
    console.log(
      `  ${kind.padEnd(13)} ${ms.toFixed(0).padStart(6)} ms  ${mb(r.pdf.length).padStart(8)}  ` +
        `${String(r.pageCount).padStart(3)} pages  ${String(r.photoCount).padStart(2)} photos  ` +
        `RSS +${mb(Math.max(0, process.memoryUsage().rss - rss))}`,
    );
  }

  const rss = process.memoryUsage().rss;
  const t0 = performance.now();
  const all = await Promise.all(
    Array.from({ length: 4 }, (_, i) =>
      renderReport(snapshot(i % 2 ? 'condition' : 'repair-scope'), identity, deps, () => {}),
    ),
  );
  const ms = performance.now() - t0;
  console.log(
    `  4 at once     ${ms.toFixed(0).padStart(6)} ms  ${mb(all.reduce((n, r) => n + r.pdf.length, 0)).padStart(8)} in all  ` +
      `RSS +${mb(Math.max(0, process.memoryUsage().rss - rss))}, peak RSS ${mb(process.memoryUsage().rss)}`,
  );
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
