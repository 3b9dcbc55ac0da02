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
