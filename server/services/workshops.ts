import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import {
  workshopSettings,
  type updateWorkshopRequest,
  type WorkshopResponse,
} from '@/shared/schemas/workshop';
import { notFound } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Workshop } from '../models';
import { audit, diff } from './audit';

type UpdateWorkshop = z.infer<typeof updateWorkshopRequest>;

function toResponse(w: Workshop, member: MemberContext): WorkshopResponse {
  // Settings saved before a field existed read back with that field's default.
  return {
    id: w.id,
    name: w.name,
    settings: workshopSettings.parse(w.settings ?? {}),
    role: member.role,
  };
}

export async function getWorkshop(member: MemberContext): Promise<WorkshopResponse> {
  const w = await Workshop.findByPk(member.workshopId);
  if (!w) throw notFound('Workshop');
  return toResponse(w, member);
}

/** Renames the workshop and/or merges the given settings into the saved ones. */
export async function updateWorkshop(
  member: MemberContext,
  body: UpdateWorkshop,
): Promise<WorkshopResponse> {
  const sequelize = Workshop.sequelize!;
  return sequelize.transaction(async (transaction: Transaction) => {
    const w = await Workshop.findByPk(member.workshopId, {
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!w) throw notFound('Workshop');
    const current = workshopSettings.parse(w.settings ?? {});
    const settings = workshopSettings.parse({ ...current, ...body.settings });
    const before = { name: w.name, ...current };
    const after = { name: body.name ?? w.name, ...settings };
    const changes = diff(before, after, ['name', ...Object.keys(workshopSettings.shape)]);
    if (Object.keys(changes).length === 0) return toResponse(w, member);
    w.name = after.name;
    w.settings = settings;
    await w.save({ transaction });
    await audit(transaction, {
      workshopId: w.id,
      actorId: member.userId,
      action: 'workshop.update',
      entityType: 'workshop',
      entityId: w.id,
      summary: `Updated the workshop: ${Object.keys(changes).join(', ')}`,
      changes,
    });
    return toResponse(w, member);
  });
}
