import type { Transaction } from 'sequelize';
import type { AuditEntryResponse } from '@/shared/schemas/workshop';
import { AuditEntry, User } from '../models';

export type AuditInput = {
  workshopId: string | null;
  actorId: string | null;
  action: string; // '<entity>.<verb>', e.g. 'finding.update'
  entityType: string;
  entityId: string;
  summary: string;
  changes?: Record<string, unknown> | null;
};

/** Record who changed what; always inside the transaction of the change itself. */
export async function audit(transaction: Transaction, input: AuditInput) {
  await AuditEntry.create(
    { ...input, summary: input.summary.slice(0, 500), changes: input.changes ?? null },
    { transaction },
  );
}

/** The changed fields between a record before and after an update, for the audit entry. */
export function diff(
  before: Record<string, unknown>,
  after: Record<string, unknown>,
  keys: string[],
) {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const k of keys) {
    if (JSON.stringify(before[k]) !== JSON.stringify(after[k]))
      changes[k] = { from: before[k], to: after[k] };
  }
  return changes;
}

/** The workshop's audit trail, newest first, with the actor's current name. */
export async function listAuditEntries(
  workshopId: string,
  page: { limit: number; offset: number },
): Promise<AuditEntryResponse[]> {
  const rows = await AuditEntry.findAll({
    where: { workshopId },
    include: [{ model: User, as: 'actor', attributes: ['name'] }],
    order: [['createdAt', 'DESC']],
    limit: page.limit,
    offset: page.offset,
  });
  return rows.map((r) => ({
    id: r.id,
    at: r.createdAt.toISOString(),
    actorName: r.actor?.name ?? null,
    action: r.action,
    entityType: r.entityType,
    entityId: r.entityId,
    summary: r.summary,
  }));
}

/** A copy of a record's fields as read through its getters, taken before an update for `diff`. */
export function snapshot(
  record: { get(key: string): unknown },
  keys: readonly string[],
): Record<string, unknown> {
  return Object.fromEntries(keys.map((k) => [k, structuredClone(record.get(k))]));
}
