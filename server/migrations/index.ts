import * as initialSchema from './20261201000000-initial-schema';
import * as auditTimePrecision from './20261202000000-audit-time-precision';
import * as memberDecisions from './20261203000000-member-decisions';
import * as treatments from './20261204000000-treatments';
import * as reminders from './20261205000000-reminders';
import * as reports from './20261206000000-reports';
import * as revokedSessions from './20261207000000-revoked-sessions';
import * as reportClaims from './20261208000000-report-claims';
import * as shareDownloads from './20261209000000-share-downloads';

/** Every migration, in order. Named by timestamp; each has `up` and `down`. */
export const MIGRATIONS = [
  { name: '20261201000000-initial-schema', ...initialSchema },
  { name: '20261202000000-audit-time-precision', ...auditTimePrecision },
  { name: '20261203000000-member-decisions', ...memberDecisions },
  { name: '20261204000000-treatments', ...treatments },
  { name: '20261205000000-reminders', ...reminders },
  { name: '20261206000000-reports', ...reports },
  { name: '20261207000000-revoked-sessions', ...revokedSessions },
  { name: '20261208000000-report-claims', ...reportClaims },
  { name: '20261209000000-share-downloads', ...shareDownloads },
];
