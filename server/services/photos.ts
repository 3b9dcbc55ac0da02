import crypto from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { PhotoResponse } from '@/shared/schemas/finding';
import { notFound } from '../errors';
import type { MemberContext } from '../middleware/workshop';
import { Photo } from '../models';
import type { StorageAdapter } from '../storage';
import { audit } from './audit';
import { findFindingFor, toPhotoResponse } from './findings';
import { processPhoto } from './photo-processing';
import { describeVehicle, findInWorkshop, renameNotFound } from './vehicle-access';

export const RENDITIONS = ['thumb', 'display'] as const;
export type RenditionName = (typeof RENDITIONS)[number];

export const photoKey = (workshopId: string, photoId: string, rendition: RenditionName) =>
  `photos/${workshopId}/${photoId}/${rendition}.jpg`;

/** 404 before the upload is read, when the finding is not the caller's to add to. */
export async function assertCanAttach(member: MemberContext, findingId: string) {
  await findFindingFor(member, findingId);
}

/**
 * Re-encodes every file first (a bad one fails the whole upload before anything is stored), then
 * stores both renditions and writes the rows in one transaction. On any failure the objects
 * already put are deleted again, so an upload is stored whole or not at all.
 */
export async function addPhotos(
  member: MemberContext,
  storage: StorageAdapter,
  findingId: string,
  files: { buffer: Buffer }[],
  caption: string,
): Promise<PhotoResponse[]> {
  const processed = [];
  for (const file of files) processed.push(await processPhoto(file.buffer));

  const put: string[] = [];
  try {
    const planned = processed.map((p) => ({ id: crypto.randomUUID(), p }));
    for (const { id, p } of planned) {
      for (const name of RENDITIONS) {
        const key = photoKey(member.workshopId, id, name);
        put.push(key);
        await storage.put(key, p[name].buffer, 'image/jpeg');
      }
    }
    return await Photo.sequelize!.transaction(async (transaction) => {
      const { finding, vehicle } = await findFindingFor(member, findingId, {
        transaction,
        lock: true,
      });
      const rows = await Photo.bulkCreate(
        planned.map(({ id, p }) => ({
          id,
          workshopId: member.workshopId,
          findingId: finding.id,
          uploadedById: member.userId,
          width: p.width,
          height: p.height,
          thumbKey: photoKey(member.workshopId, id, 'thumb'),
          displayKey: photoKey(member.workshopId, id, 'display'),
          bytes: p.thumb.buffer.length + p.display.buffer.length,
          caption,
        })),
        { transaction },
      );
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'photo.create',
        entityType: 'finding',
        entityId: finding.id,
        summary: `Added ${rows.length} photo${rows.length === 1 ? '' : 's'} to the ${finding.zoneKey} finding on ${describeVehicle(vehicle)}`,
        changes: { photoIds: rows.map((r) => r.id) },
      });
      return rows.map(toPhotoResponse);
    });
  } catch (err) {
    await Promise.allSettled(put.map((key) => storage.delete(key)));
    throw err;
  }
}

/** A photo through its finding and vehicle: readable by anyone who may read that vehicle. */
async function findPhotoFor(
  member: MemberContext,
  photoId: string,
  opts: { transaction?: Transaction } = {},
) {
  const photo = await findInWorkshop(Photo, 'Photo', member, photoId, opts);
  const { finding, vehicle } = await findFindingFor(member, photo.findingId, {
    includeDeleted: true,
    transaction: opts.transaction,
  }).catch(renameNotFound('Photo'));
  return { photo, finding, vehicle };
}

export async function readRendition(
  member: MemberContext,
  storage: StorageAdapter,
  photoId: string,
  rendition: RenditionName,
) {
  const { photo } = await findPhotoFor(member, photoId);
  const bytes = await storage.get(rendition === 'thumb' ? photo.thumbKey : photo.displayKey);
  if (!bytes) throw notFound('Photo');
  return bytes;
}

/** Removes the row (audited) first, then the stored renditions. */
export async function deletePhoto(member: MemberContext, storage: StorageAdapter, photoId: string) {
  const keys = await Photo.sequelize!.transaction(async (transaction) => {
    const { photo, finding, vehicle } = await findPhotoFor(member, photoId, { transaction });
    await photo.destroy({ transaction });
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'photo.delete',
      entityType: 'finding',
      entityId: finding.id,
      summary: `Removed a photo from the ${finding.zoneKey} finding on ${describeVehicle(vehicle)}`,
      changes: { photoId: photo.id },
    });
    return [photo.thumbKey, photo.displayKey];
  });
  await Promise.allSettled(keys.map((key) => storage.delete(key)));
}
