import crypto from 'node:crypto';
import mariadb from 'mariadb';
import type { Sequelize } from 'sequelize';
import { loadConfig, type Config } from '@/server/config';
import { createSequelize } from '@/server/db';
import { runMigrations } from '@/server/migrate';

export interface TestDatabase {
  name: string;
  config: Config;
  sequelize: Sequelize;
  /** Closes the connections and drops the database. */
  drop(): Promise<void>;
}

const DB_ENV = ['DB_HOST', 'DB_PORT', 'DB_USER', 'DB_PASSWORD'] as const;

function adminConnection() {
  const missing = DB_ENV.filter((name) => !process.env[name]);
  if (missing.length > 0) {
    throw new Error(
      `No test database (${missing.join(', ')} not set): run the tests with npm test, which starts MariaDB.`,
    );
  }
  return mariadb.createConnection({
    host: process.env.DB_HOST,
    port: Number(process.env.DB_PORT),
    user: process.env.DB_USER,
    password: process.env.DB_PASSWORD,
  });
}

/**
 * A fresh, migrated database of its own for one test file, named soundframe_t_<prefix>_<random>
 * (npm test grants the test user every database matching soundframe\_t%). `env` adds to the
 * configuration, e.g. mail or storage settings.
 */
export async function createTestDatabase(
  prefix: string,
  env: Record<string, string> = {},
): Promise<TestDatabase> {
  const clean =
    prefix
      .toLowerCase()
      .replace(/[^a-z0-9_]/g, '_')
      .slice(0, 36) || 'db';
  const name = `soundframe_t_${clean}_${crypto.randomBytes(4).toString('hex')}`;
  const conn = await adminConnection();
  try {
    await conn.query(
      `CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
  } finally {
    await conn.end();
  }
  const config = loadConfig({ ...process.env, NODE_ENV: 'test', ...env, DB_NAME: name });
  const sequelize = createSequelize(config);
  await runMigrations(sequelize);
  return {
    name,
    config,
    sequelize,
    async drop() {
      await sequelize.close();
      const admin = await adminConnection();
      try {
        await admin.query(`DROP DATABASE IF EXISTS \`${name}\``);
      } finally {
        await admin.end();
      }
    },
  };
}
