import { Sequelize } from 'sequelize';
import type { Config } from './config';
import { initModels } from './models';

/** One Sequelize instance per process (tests make one per database). Models are initialised on it. */
export function createSequelize(
  config: Pick<Config, 'db'>,
  opts: { logging?: boolean } = {},
): Sequelize {
  const sequelize = new Sequelize(config.db.name, config.db.user, config.db.password, {
    host: config.db.host,
    port: config.db.port,
    dialect: 'mariadb',
    logging: opts.logging ? console.log : false,
    pool: { max: config.db.poolMax, min: 0, idle: 10_000 },
    dialectOptions: { timezone: 'Z', connectTimeout: 5000 },
    timezone: '+00:00',
    define: { underscored: true },
  });
  initModels(sequelize);
  return sequelize;
}

/**
 * An instant as MariaDB DATETIME text in UTC, for raw `replacements`. Sequelize 6 escapes a Date
 * in replacements in the process's own time zone and ignores the `timezone` option above, so a
 * server whose TZ is not UTC would store shifted times. Model queries are not affected.
 */
export function sqlInstant(at: Date): string {
  return at.toISOString().replace('T', ' ').replace('Z', '');
}
