import sharp, { type Metadata } from 'sharp';
import { AppError } from '@/server/errors';
import { ERROR_CODES } from '@/shared/schemas/common';

export const PHOTO_LIMITS = { maxBytes: 15 * 1024 * 1024, maxFiles: 6, maxPixels: 40_000_000 };

export type Rendition = { buffer: Buffer; width: number; height: number };

const THUMB_EDGE = 320;
const DISPLAY_EDGE = 1600;
const JPEG_QUALITY = 80;

// ISO-BMFF brands of HEIC/HEIF stills (ISO/IEC 23008-12). AVIF shares the container but not these brands.
const HEIF_BRANDS = new Set(['heic', 'heix', 'hevc', 'hevx', 'heim', 'heis', 'mif1', 'msf1']);

/** The image type by its leading bytes; the file name and the declared content type are not trusted. */
export function sniffImageType(buf: Buffer): 'jpeg' | 'png' | 'webp' | 'heic' | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  if (
    buf.length >= 8 &&
    buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))
  ) {
    return 'png';
  }
  if (
    buf.length >= 12 &&
    buf.toString('latin1', 0, 4) === 'RIFF' &&
    buf.toString('latin1', 8, 12) === 'WEBP'
  ) {
    return 'webp';
  }
  if (
    buf.length >= 12 &&
    buf.toString('latin1', 4, 8) === 'ftyp' &&
    HEIF_BRANDS.has(buf.toString('latin1', 8, 12))
  ) {
    return 'heic';
  }
  return null;
}

/** Sharp's prebuilt libheif decodes AVIF only; HEVC-coded HEIC needs a libvips built with it. */
function canDecodeHeic(): boolean {
  const heif = sharp.format.heif;
  return Boolean(heif?.input.buffer && heif.input.fileSuffix?.includes('.heic'));
}

const unsupported = (message: string) => new AppError(415, ERROR_CODES.unsupportedMedia, message);

/**
 * Re-encodes an uploaded photo into a thumbnail and a display JPEG. The original is never kept: the
 * renditions are upright (EXIF orientation applied) and carry no EXIF, GPS or ICC data, because sharp
 * drops metadata unless asked to keep it.
 */
export async function processPhoto(
  input: Buffer,
): Promise<{ thumb: Rendition; display: Rendition; width: number; height: number }> {
  const type = sniffImageType(input);
  if (type === null) throw unsupported('Only JPEG, PNG or WebP photos can be uploaded.');
  if (type === 'heic' && !canDecodeHeic()) {
    throw unsupported(
      'HEIC photos cannot be read here. Export the photo as JPEG and upload it again.',
    );
  }
  if (input.length > PHOTO_LIMITS.maxBytes) {
    throw new AppError(
      413,
      ERROR_CODES.tooLarge,
      `Each photo may be at most ${PHOTO_LIMITS.maxBytes / 1024 / 1024} MB.`,
    );
  }

  let meta: Metadata;
  try {
    // Reads the header only, so the pixel count can be refused with a clear 413 before anything is decoded.
    meta = await sharp(input, { limitInputPixels: false }).metadata();
  } catch {
    throw unsupported('This file could not be read as a photo. It may be damaged or incomplete.');
  }
  if (meta.width * meta.height > PHOTO_LIMITS.maxPixels) {
    throw new AppError(
      413,
      ERROR_CODES.tooLarge,
      `Photos may have at most ${PHOTO_LIMITS.maxPixels / 1_000_000} megapixels; this one has ${((meta.width * meta.height) / 1_000_000).toFixed(1)}.`,
    );
  }

  // 'error' rejects truncated and corrupt files but tolerates the harmless warnings some cameras trigger;
  // limitInputPixels stays on as a second guard in case the header lied.
  const source = sharp(input, { limitInputPixels: PHOTO_LIMITS.maxPixels, failOn: 'error' });
  const render = async (edge: number): Promise<Rendition> => {
    const { data, info } = await source
      .clone()
      .rotate()
      .resize({ width: edge, height: edge, fit: 'inside', withoutEnlargement: true })
      // Transparent PNG/WebP areas would otherwise turn black in a JPEG.
      .flatten({ background: '#ffffff' })
      .jpeg({ quality: JPEG_QUALITY, mozjpeg: false })
      .toBuffer({ resolveWithObject: true });
    return { buffer: data, width: info.width, height: info.height };
  };

  try {
    const [thumb, display] = await Promise.all([render(THUMB_EDGE), render(DISPLAY_EDGE)]);
    return { thumb, display, width: meta.autoOrient.width, height: meta.autoOrient.height };
  } catch {
    throw unsupported('This file could not be read as a photo. It may be damaged or incomplete.');
  }
}
