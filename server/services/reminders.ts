import crypto from 'node:crypto';
import { addMinutes, format, parseISO } from 'date-fns';
import { QueryTypes, Transaction, type Sequelize } from 'sequelize';
import { getBodyPlan, zoneLabel } from '@/shared/body-plans';
import { addCalendarDays, localDate } from '@/shared/treatments';
import { sqlInstant } from '../db';
import type { Mailer } from '../mail/transport';
import { ReminderDelivery } from '../models';
import { describeVehicle } from './vehicle-access';

/**
 * E-mail digests of the re-checks each assignee has due (today or tomorrow) or overdue, one per
 * person, workshop and day, safe with several server instances sharing one database:
 *
 * 1. enqueue — `INSERT IGNORE` a `reminder_deliveries` row per (user, workshop, day); the unique
 *    key turns every other instance's insert for the same digest into a no-op;
 * 2. claim — `SELECT … FOR UPDATE SKIP LOCKED` (raw SQL: Sequelize drops `skipLocked` for
 *    mariadb) and mark the rows `sending` in the same transaction, so no two instances hold one row;
 * 3. send — each claimed digest through the mailer; `sent` on success, otherwise `failed` with
 *    the error and a later `next_attempt_at`, until the attempts run out.
 *
 * People who turned reminders off get no row; a row enqueued before they turned them off is
 * deleted when claimed, unsent (so turning reminders back on the same day enqueues that day afresh).
 * A row whose re-checks were all done or reassigned before sending is deleted the same way.
 */

export type ReminderCycleOptions = {
  instanceId: string;
  mailer: Mailer;
  /** Where the app is reached; the digest links to `<publicUrl>/due`. */
  publicUrl: string;
  now?: Date;
  /** Defaults to the connection the models were initialised on. */
  sequelize?: Sequelize;
  maxAttempts?: number;
  batchSize?: number;
};

export type ReminderCycleResult = {
  enqueued: number;
  claimed: number;
  sent: number;
  failed: number;
  dropped: number;
};

/** A `sending` row older than this belongs to an instance that stopped mid-send. */
export const STALE_CLAIM_MINUTES = 10;
/** Minutes to wait after the 1st, 2nd, 3rd … failed attempt; the last step repeats. */
export const RETRY_BACKOFF_MINUTES = [1, 5, 15, 60, 240];
const DEFAULT_MAX_ATTEMPTS = 5;
const DEFAULT_BATCH = 20;
const DEADLOCK_RETRIES = 3;

export function retryDelayMinutes(attempts: number): number {
  return RETRY_BACKOFF_MINUTES[Math.min(Math.max(attempts, 1), RETRY_BACKOFF_MINUTES.length) - 1];
}

/** The digest date is the shared calendar date; re-exported so tests compute it the same way. */
export { localDate };

/** A workshop's saved time zone, or UTC when it is missing or unknown. */
function validTimeZone(timeZone: string | null | undefined): string {
  if (!timeZone) return 'UTC';
  try {
    new Intl.DateTimeFormat('en', { timeZone });
    return timeZone;
  } catch {
    return 'UTC';
  }
}

function isDeadlock(e: unknown): boolean {
  const parent = (e as { parent?: { errno?: number; code?: string } }).parent;
  return parent?.errno === 1213 || parent?.code === 'ER_LOCK_DEADLOCK';
}

/** InnoDB may pick one of two concurrent claimers as a deadlock victim; that work is simply redone. */
async function retryOnDeadlock<T>(work: () => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await work();
    } catch (e) {
      if (!isDeadlock(e) || attempt >= DEADLOCK_RETRIES) throw e;
    }
  }
}

const parseJsonArray = (raw: unknown): string[] => {
  const value = typeof raw === 'string' ? (JSON.parse(raw) as unknown) : raw;
  return Array.isArray(value) ? value.map(String) : [];
};

export async function runReminderCycle(opts: ReminderCycleOptions): Promise<ReminderCycleResult> {
  const sequelize = opts.sequelize ?? ReminderDelivery.sequelize!;
  const now = opts.now ?? new Date();
  const maxAttempts = opts.maxAttempts ?? DEFAULT_MAX_ATTEMPTS;
  const enqueued = await enqueueDigests(sequelize, now);
  await expireStaleClaims(sequelize, now);
  const claimed = await claimDigests(
    sequelize,
    opts.instanceId,
    now,
    maxAttempts,
    opts.batchSize ?? DEFAULT_BATCH,
  );
  const result: ReminderCycleResult = {
    enqueued,
    claimed: claimed.length,
    sent: 0,
    failed: 0,
    dropped: 0,
  };
  for (const row of claimed) {
    const outcome = await deliver(sequelize, row, { ...opts, now });
    result[outcome] += 1;
  }
  return result;
}

/** Step 1: one pending row per assignee and workshop with re-checks due by tomorrow (their workshop's date). */
async function enqueueDigests(sequelize: Sequelize, now: Date): Promise<number> {
  // Tomorrow anywhere on earth is at most two UTC days ahead: a cheap first cut before per-zone dates.
  const widest = addCalendarDays(localDate(now, 'UTC'), 2);
  const workshops = await sequelize.query<{ workshop_id: string; time_zone: string | null }>(
    `SELECT r.workshop_id,
            JSON_UNQUOTE(JSON_EXTRACT(w.settings, '$.treatments.timeZone')) AS time_zone
       FROM re_checks r JOIN workshops w ON w.id = r.workshop_id
      WHERE r.status = 'pending' AND r.assignee_id IS NOT NULL AND r.due_date <= :widest
      GROUP BY r.workshop_id, time_zone`,
    { type: QueryTypes.SELECT, replacements: { widest } },
  );
  let inserted = 0;
  for (const w of workshops) {
    const today = localDate(now, validTimeZone(w.time_zone));
    const due = await sequelize.query<{ assignee_id: string; id: string }>(
      `SELECT r.assignee_id, r.id
         FROM re_checks r
         JOIN users u ON u.id = r.assignee_id AND u.reminders_enabled = 1
         JOIN memberships m ON m.user_id = r.assignee_id AND m.workshop_id = r.workshop_id
         JOIN vehicles v ON v.id = r.vehicle_id AND v.deleted_at IS NULL
        WHERE r.workshop_id = :workshopId AND r.status = 'pending' AND r.due_date <= :horizon
        ORDER BY r.assignee_id, r.due_date, r.id`,
      {
        type: QueryTypes.SELECT,
        replacements: { workshopId: w.workshop_id, horizon: addCalendarDays(today, 1) },
      },
    );
    const byAssignee = new Map<string, string[]>();
    for (const r of due)
      byAssignee.set(r.assignee_id, [...(byAssignee.get(r.assignee_id) ?? []), r.id]);
    for (const [userId, ids] of byAssignee) {
      const [, affected] = await retryOnDeadlock(() =>
        sequelize.query(
          `INSERT IGNORE INTO reminder_deliveries
             (id, user_id, workshop_id, digest_date, status, attempts, next_attempt_at, recheck_ids,
              created_at, updated_at)
           VALUES (:id, :userId, :workshopId, :today, 'pending', 0, :now, :ids, :now, :now)`,
          {
            type: QueryTypes.INSERT,
            replacements: {
              id: crypto.randomUUID(),
              userId,
              workshopId: w.workshop_id,
              today,
              now: sqlInstant(now),
              ids: JSON.stringify(ids),
            },
          },
        ),
      );
      inserted += Number(affected) || 0;
    }
  }
  return inserted;
}

/**
 * A `sending` row left by an instance that stopped mid-send counts as one failed attempt and is
 * offered again at once. Whether that instance's mail went out is unknown, so this one case can
 * send twice; everything else sends once.
 */
async function expireStaleClaims(sequelize: Sequelize, now: Date): Promise<void> {
  const staleBefore = addMinutes(now, -STALE_CLAIM_MINUTES);
  // A plain read first (takes no locks), so the common case writes nothing.
  const stale = await sequelize.query<{ id: string }>(
    `SELECT id FROM reminder_deliveries WHERE status = 'sending' AND claimed_at < :staleBefore`,
    { type: QueryTypes.SELECT, replacements: { staleBefore: sqlInstant(staleBefore) } },
  );
  if (stale.length === 0) return;
  await retryOnDeadlock(() =>
    sequelize.query(
      `UPDATE reminder_deliveries
          SET status = 'failed', attempts = attempts + 1, next_attempt_at = :now, updated_at = :now,
              last_error = CONCAT('Claimed by ', claimed_by, ' but not finished within ${STALE_CLAIM_MINUTES} minutes')
        WHERE id IN (:ids) AND status = 'sending' AND claimed_at < :staleBefore`,
      {
        replacements: {
          ids: stale.map((s) => s.id),
          now: sqlInstant(now),
          staleBefore: sqlInstant(staleBefore),
        },
      },
    ),
  );
}

type ClaimedRow = {
  id: string;
  user_id: string;
  workshop_id: string;
  digest_date: string;
  attempts: number;
  recheck_ids: unknown;
};

/** Step 2: lock up to `limit` rows no one else holds and mark them ours, in one short transaction. */
async function claimDigests(
  sequelize: Sequelize,
  instanceId: string,
  now: Date,
  maxAttempts: number,
  limit: number,
): Promise<ClaimedRow[]> {
  return retryOnDeadlock(() =>
    // READ COMMITTED: record locks only, no gap locks for two claimers to deadlock on.
    sequelize.transaction(
      { isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED },
      async (transaction) => {
        const rows = await sequelize.query<{ id: string }>(
          `SELECT id FROM reminder_deliveries
            WHERE status IN ('pending', 'failed') AND attempts < :maxAttempts AND next_attempt_at <= :now
            ORDER BY id LIMIT :limit
            FOR UPDATE SKIP LOCKED`,
          {
            type: QueryTypes.SELECT,
            replacements: { maxAttempts, now: sqlInstant(now), limit },
            transaction,
          },
        );
        if (rows.length === 0) return [];
        const ids = rows.map((r) => r.id);
        await sequelize.query(
          `UPDATE reminder_deliveries
              SET status = 'sending', claimed_by = :instanceId, claimed_at = :now, updated_at = :now
            WHERE id IN (:ids)`,
          { replacements: { instanceId, now: sqlInstant(now), ids }, transaction },
        );
        return sequelize.query<ClaimedRow>(
          `SELECT id, user_id, workshop_id, DATE_FORMAT(digest_date, '%Y-%m-%d') AS digest_date,
                  attempts, recheck_ids
             FROM reminder_deliveries WHERE id IN (:ids) ORDER BY id`,
          { type: QueryTypes.SELECT, replacements: { ids }, transaction },
        );
      },
    ),
  );
}

type DigestItem = {
  id: string;
  dueDate: string;
  vehicle: string;
  zones: string[];
};

/** Step 3: send one claimed digest and record the outcome; only the claiming instance may record it. */
async function deliver(
  sequelize: Sequelize,
  row: ClaimedRow,
  opts: ReminderCycleOptions & { now: Date },
): Promise<'sent' | 'failed' | 'dropped'> {
  const { now, instanceId } = opts;
  const mine = { id: row.id, instanceId };
  const ownedRow = `id = :id AND status = 'sending' AND claimed_by = :instanceId`;
  const drop = async () => {
    await sequelize.query(`DELETE FROM reminder_deliveries WHERE ${ownedRow}`, {
      replacements: mine,
    });
    return 'dropped' as const;
  };

  const [person] = await sequelize.query<{
    email: string;
    name: string;
    reminders_enabled: number | boolean;
    workshop_name: string;
  }>(
    `SELECT u.email, u.name, u.reminders_enabled, w.name AS workshop_name
       FROM users u JOIN workshops w ON w.id = :workshopId
      WHERE u.id = :userId`,
    { type: QueryTypes.SELECT, replacements: { userId: row.user_id, workshopId: row.workshop_id } },
  );
  if (!person || !Number(person.reminders_enabled)) return drop();

  const ids = parseJsonArray(row.recheck_ids);
  const items =
    ids.length === 0
      ? []
      : (
          await sequelize.query<{
            id: string;
            due_date: string;
            zone_keys: unknown;
            year: number;
            make: string;
            model: string;
            body_plan_key: string;
          }>(
            `SELECT r.id, DATE_FORMAT(r.due_date, '%Y-%m-%d') AS due_date, r.zone_keys,
                    v.year, v.make, v.model, v.body_plan_key
               FROM re_checks r JOIN vehicles v ON v.id = r.vehicle_id AND v.deleted_at IS NULL
              WHERE r.id IN (:ids) AND r.status = 'pending' AND r.assignee_id = :userId
              ORDER BY r.due_date, v.make, v.model, r.id`,
            { type: QueryTypes.SELECT, replacements: { ids, userId: row.user_id } },
          )
        ).map((r): DigestItem => ({
          id: r.id,
          dueDate: r.due_date,
          vehicle: describeVehicle(r),
          zones: zoneLabels(r.body_plan_key, parseJsonArray(r.zone_keys)),
        }));
  if (items.length === 0) return drop();

  const message = composeDigest({
    name: person.name,
    workshopName: person.workshop_name,
    today: row.digest_date,
    items,
    dueUrl: `${opts.publicUrl.replace(/\/+$/, '')}/due`,
  });
  try {
    await opts.mailer.send({ to: person.email, ...message });
  } catch (e) {
    const attempts = Number(row.attempts) + 1;
    await sequelize.query(
      `UPDATE reminder_deliveries
          SET status = 'failed', attempts = :attempts, last_error = :error,
              next_attempt_at = :next, updated_at = :now
        WHERE ${ownedRow}`,
      {
        replacements: {
          ...mine,
          attempts,
          error: (e instanceof Error ? e.message : String(e)).slice(0, 2000),
          next: sqlInstant(addMinutes(now, retryDelayMinutes(attempts))),
          now: sqlInstant(now),
        },
      },
    );
    return 'failed';
  }
  await sequelize.query(
    `UPDATE reminder_deliveries
        SET status = 'sent', attempts = attempts + 1, sent_at = :now, updated_at = :now
      WHERE ${ownedRow}`,
    { replacements: { ...mine, now: sqlInstant(now) } },
  );
  return 'sent';
}

function zoneLabels(bodyPlanKey: string, keys: string[]): string[] {
  const plan = getBodyPlan(bodyPlanKey);
  return keys.map((k) => zoneLabel(plan, k));
}

const longDate = (day: string) => format(parseISO(day), 'EEE d MMM yyyy');

/** The digest's subject and text: overdue first, then what is due today or tomorrow. */
export function composeDigest(input: {
  name: string;
  workshopName: string;
  today: string;
  items: DigestItem[];
  dueUrl: string;
}): { subject: string; text: string } {
  const overdue = input.items.filter((i) => i.dueDate < input.today);
  const soon = input.items.filter((i) => i.dueDate >= input.today);
  const line = (i: DigestItem) =>
    `- ${i.vehicle}: ${i.zones.join(', ')} (due ${i.dueDate === input.today ? 'today' : longDate(i.dueDate)})`;
  const counts = [
    overdue.length > 0 ? `${overdue.length} overdue` : '',
    soon.length > 0 ? `${soon.length} coming due` : '',
  ].filter(Boolean);
  const sections = [
    overdue.length > 0 ? ['Overdue — look at these first:', ...overdue.map(line)].join('\n') : '',
    soon.length > 0 ? ['Due today or tomorrow:', ...soon.map(line)].join('\n') : '',
  ].filter(Boolean);
  const text = [
    `Hello ${input.name},`,
    `These re-checks at ${input.workshopName} are assigned to you.`,
    ...sections,
    `Record each result (clean, or fresh evidence with a finding) from your list: ${input.dueUrl}`,
    'You get one of these a day while re-checks are due. You can turn them off on your Account page.',
  ].join('\n\n');
  return {
    subject: `Re-checks at ${input.workshopName}: ${counts.join(', ')}`,
    text: `${text}\n`,
  };
}
