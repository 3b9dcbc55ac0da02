import crypto from 'node:crypto';
import sharp from 'sharp';
import type { Finding } from '@/server/models';
import { Photo } from '@/server/models';
import { processPhoto } from '@/server/services/photo-processing';
import { photoKey } from '@/server/services/photos';
import type { StorageAdapter } from '@/server/storage';

/** A small real JPEG (a wood-brown gradient), different for every seed. */
export async function jpeg(width = 64, height = 48, seed = 1): Promise<Buffer> {
  const pixels = Buffer.alloc(width * height * 3);
  for (let i = 0; i < width * height; i++) {
    pixels[i * 3] = (120 + seed * 13 + (i % width)) % 256;
    pixels[i * 3 + 1] = (80 + Math.floor(i / width)) % 256;
    pixels[i * 3 + 2] = 40;
  }
  return sharp(pixels, { raw: { width, height, channels: 3 } })
    .jpeg()
    .toBuffer();
}

/** A JPEG as a phone writes it: camera make and a GPS position in its EXIF. */
export async function jpegWithGps(width = 400, height = 300): Promise<Buffer> {
  return sharp(await jpeg(width, height, 7))
    .withExif({
      IFD0: { Make: 'TestCam', Model: 'Pocket 2' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '51/1 30/1 0/1',
        GPSLongitudeRef: 'W',
        GPSLongitude: '2/1 7/1 0/1',
      },
    })
    .jpeg()
    .toBuffer();
}

/** A photo row with both renditions really stored, as an upload would leave it. */
export async function createPhoto(
  finding: Finding,
  storage: StorageAdapter,
  partial: Partial<{ caption: string }> = {},
) {
  const processed = await processPhoto(await jpeg(80, 60, crypto.randomInt(1000)));
  const id = crypto.randomUUID();
  const thumbKey = photoKey(finding.workshopId, id, 'thumb');
  const displayKey = photoKey(finding.workshopId, id, 'display');
  await storage.put(thumbKey, processed.thumb.buffer, 'image/jpeg');
  await storage.put(displayKey, processed.display.buffer, 'image/jpeg');
  return Photo.create({
    id,
    workshopId: finding.workshopId,
    findingId: finding.id,
    uploadedById: null,
    width: processed.width,
    height: processed.height,
    thumbKey,
    displayKey,
    bytes: processed.thumb.buffer.length + processed.display.buffer.length,
    caption: partial.caption ?? '',
  });
}

/** The storage adapter a test app was built with (the one its routes read and write). */
export function appStorage(app: { locals: Record<string, unknown> }): StorageAdapter {
  return (app.locals.deps as { storage: StorageAdapter }).storage;
}
