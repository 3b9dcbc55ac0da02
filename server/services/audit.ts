import type { Transaction } from 'sequelize';
import { AuditEntry } from '../models';

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
  await AuditEntry.create({ ...input, summary: input.summary.slice(0, 500), changes: input.changes ?? null }, { transaction });
}

/** The changed fields between a record before and after an update, for the audit entry. */
export function diff(before: Record<string, unknown>, after: Record<string, unknown>, keys: string[]) {
  const changes: Record<string, { from: unknown; to: unknown }> = {};
  for (const k of keys) {
    if (JSON.stringify(before[k]) !== JSON.stringify(after[k])) changes[k] = { from: before[k], to: after[k] };
  }
  return changes;
}
