/**
 * Applies migrations to the database named by the DB_* environment. Run through tsx by the jest
 * global setup, because jest's globalSetup cannot resolve the `@/` imports of server code.
 */
import { loadConfig } from '@/server/config';
import { createSequelize } from '@/server/db';
import { runMigrations } from '@/server/migrate';

async function main(): Promise<number> {
  const config = loadConfig(process.env);
  const sequelize = createSequelize(config);
  try {
    await sequelize.authenticate();
  } catch (error) {
    console.error(
      `Cannot reach MariaDB at ${config.db.host}:${config.db.port} as ${config.db.user} ` +
        `(${(error as Error).message}). Run the tests with npm test, which starts MariaDB.`,
    );
    await sequelize.close();
    return 2;
  }
  try {
    await runMigrations(sequelize);
    return 0;
  } finally {
    await sequelize.close();
  }
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
