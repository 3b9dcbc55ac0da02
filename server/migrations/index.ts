import * as initialSchema from './20261201000000-initial-schema';

/** Every migration, in order. Named by timestamp; each has `up` and `down`. */
export const MIGRATIONS = [{ name: '20261201000000-initial-schema', ...initialSchema }];
