import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startServer } from '@/server/index';
import { Report } from '@/server/models';
import { createStorage } from '@/server/storage';
import { createTestDatabase, type TestDatabase } from '../e2e/support/test-db';
import { createVehicleScenario } from '../factories/scenario';
import { insertQueuedReport } from '../factories/reports';

/**
 * Start-up recovery scans every queued and rendering report, so it runs against a database of
 * its own: in the shared test database it would take other files' rows.
 */
let db: TestDatabase;
let dir: string;

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-queue-'));
  db = await createTestDatabase('report_queue', {
    PORT: '0',
    STORAGE_DIR: path.join(dir, 'storage'),
    WEB_DIST: path.join(dir, 'no-dist'),
  });
});
afterAll(async () => {
  await db.drop();
  fs.rmSync(dir, { recursive: true, force: true });
});

async function until(check: () => Promise<boolean>, timeoutMs = 30_000) {
  const end = Date.now() + timeoutMs;
  while (!(await check())) {
    if (Date.now() > end) throw new Error('timed out');
    await new Promise((r) => setTimeout(r, 100));
  }
}

it('renders, on start-up, the reports a stopped process left queued or rendering', async () => {
  const storage = createStorage(db.config.storage);
  const s = await createVehicleScenario(db.config, storage);
  const queued = await insertQueuedReport(s.owner, s.vehicle.id);
  const cutOff = await insertQueuedReport(s.owner, s.vehicle.id, 'condition');
  await cutOff.update({ status: 'rendering', progress: 40, startedAt: new Date() });

  const server = await startServer(db.config, { sequelize: db.sequelize });
  try {
    const ids = [queued.id, cutOff.id];
    await until(async () =>
      (await Report.findAll({ where: { id: ids } })).every((r) => r.status === 'ready'),
    );
    for (const r of await Report.findAll({ where: { id: ids } })) {
      const pdf = await storage.get(r.storageKey!);
      expect(pdf?.subarray(0, 5).toString()).toBe('%PDF-');
      expect(r.byteSize).toBe(pdf!.length);
    }
  } finally {
    await server.close();
  }
});

it('leaves a render another live process is doing alone, and takes over one whose heartbeat went quiet', async () => {
  const storage = createStorage(db.config.storage);
  const s = await createVehicleScenario(db.config, storage);
  const live = await insertQueuedReport(s.owner, s.vehicle.id);
  const gone = await insertQueuedReport(s.owner, s.vehicle.id, 'condition');
  const now = Date.now();
  await live.update({
    status: 'rendering',
    progress: 30,
    startedAt: new Date(now - 5_000),
    claimedBy: 'other-process-alive',
    heartbeatAt: new Date(now - 2_000),
  });
  await gone.update({
    status: 'rendering',
    progress: 60,
    startedAt: new Date(now - 600_000),
    claimedBy: 'other-process-gone',
    // Older than REPORT_STALE_AFTER_MS (60 s).
    heartbeatAt: new Date(now - 300_000),
  });

  const server = await startServer(db.config, { sequelize: db.sequelize });
  try {
    await until(async () => (await gone.reload()).status === 'ready');
    expect(gone.claimedBy).not.toBe('other-process-gone');
    expect((await storage.get(gone.storageKey!))?.subarray(0, 5).toString()).toBe('%PDF-');
    await live.reload();
    expect(live).toMatchObject({
      status: 'rendering',
      progress: 30,
      claimedBy: 'other-process-alive',
    });
  } finally {
    await server.close();
    await live.update({ status: 'failed' });
  }
});
