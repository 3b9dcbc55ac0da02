import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import {
  mergeSettings,
  workshopSettings,
  type updateWorkshopRequest,
  type WorkshopResponse,
  type WorkshopSettings,
} from '@/shared/schemas/workshop';
import { DEFAULT_TREATMENT_SETTINGS } from '@/shared/treatments/settings';
import { DEFAULT_WOOD_SETTINGS } from '@/shared/wood/settings';
import { badRequest, notFound } from '../errors';
import { zodFields } from '../middleware/error-handler';
import type { MemberContext } from '../middleware/workshop';
import { Workshop } from '../models';
import { audit, diff } from './audit';

type UpdateWorkshop = z.infer<typeof updateWorkshopRequest>;

/**
 * The full settings of a workshop. Settings saved before a field existed read back with that
 * field's default, down to single keys inside `wood` and `treatments`.
 */
export function readSettings(stored: Partial<WorkshopSettings> | null | undefined) {
  const saved = stored ?? {};
  return workshopSettings.parse({
    ...saved,
    wood: mergeSettings(DEFAULT_WOOD_SETTINGS, saved.wood),
    treatments: mergeSettings(DEFAULT_TREATMENT_SETTINGS, saved.treatments),
  });
}

/** Flat keys for the audit diff, one per wood or treatment group, so an entry names what changed. */
function auditView(name: string, s: WorkshopSettings): Record<string, unknown> {
  const { wood, treatments, ...flat } = s;
  return {
    name,
    ...flat,
    ...Object.fromEntries(Object.entries(wood).map(([k, v]) => [`wood.${k}`, v])),
    ...Object.fromEntries(Object.entries(treatments).map(([k, v]) => [`treatments.${k}`, v])),
  };
}

/** A workshop's full settings by id (404 when it is gone). */
export async function settingsOf(workshopId: string, transaction?: Transaction) {
  const workshop = await Workshop.findByPk(workshopId, { transaction });
  if (!workshop) throw notFound('Workshop');
  return readSettings(workshop.settings);
}

function toResponse(w: Workshop, member: MemberContext): WorkshopResponse {
  return { id: w.id, name: w.name, settings: readSettings(w.settings), role: member.role };
}

export async function getWorkshop(member: MemberContext): Promise<WorkshopResponse> {
  const w = await Workshop.findByPk(member.workshopId);
  if (!w) throw notFound('Workshop');
  return toResponse(w, member);
}

/**
 * Renames the workshop and/or merges the given settings into the saved ones; `wood` and
 * `treatments` are merged key by key at every depth, then the whole is validated.
 */
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
    const current = readSettings(w.settings);
    const { wood: woodPatch, treatments: treatmentsPatch, ...flat } = body.settings ?? {};
    const parsed = workshopSettings.safeParse({
      ...current,
      ...flat,
      wood: mergeSettings(current.wood, woodPatch),
      treatments: mergeSettings(current.treatments, treatmentsPatch),
    });
    if (!parsed.success)
      throw badRequest(
        Object.fromEntries(
          Object.entries(zodFields(parsed.error)).map(([k, v]) => [`settings.${k}`, v]),
        ),
      );
    const settings = parsed.data;
    const before = auditView(w.name, current);
    const after = auditView(body.name ?? w.name, settings);
    const changes = diff(before, after, Object.keys(after));
    if (Object.keys(changes).length === 0) return toResponse(w, member);
    w.name = body.name ?? w.name;
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
