import * as initialSchema from './20261201000000-initial-schema';
import * as auditTimePrecision from './20261202000000-audit-time-precision';

/** Every migration, in order. Named by timestamp; each has `up` and `down`. */
export const MIGRATIONS = [
  { name: '20261201000000-initial-schema', ...initialSchema },
  { name: '20261202000000-audit-time-precision', ...auditTimePrecision },
];
