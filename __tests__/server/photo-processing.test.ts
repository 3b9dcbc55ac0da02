import sharp from 'sharp';
import { crc32 } from 'node:zlib';
import { AppError } from '@/server/errors';
import { drawDemoPhoto } from '@/server/seeders/demo-photos';
import { PHOTO_LIMITS, processPhoto, sniffImageType } from '@/server/services/photo-processing';

/** The tags of IFD0 and of the GPS IFD in a sharp `metadata().exif` block ("Exif\0\0" + TIFF). */
function readExif(exif: Buffer) {
  const tiff = exif.subarray(exif.toString('latin1', 0, 4) === 'Exif' ? 6 : 0);
  const le = tiff.toString('latin1', 0, 2) === 'II';
  const u16 = (o: number) => (le ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (le ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  const readIfd = (offset: number) => {
    const tags = new Map<number, { type: number; count: number; valueAt: number }>();
    const n = u16(offset);
    for (let i = 0; i < n; i++) {
      const entry = offset + 2 + i * 12;
      const type = u16(entry + 2);
      const count = u32(entry + 4);
      const size = ({ 1: 1, 2: 1, 3: 2, 4: 4, 5: 8, 7: 1 } as Record<number, number>)[type] ?? 1;
      tags.set(u16(entry), {
        type,
        count,
        valueAt: size * count <= 4 ? entry + 8 : u32(entry + 8),
      });
    }
    return tags;
  };
  const ifd0 = readIfd(u32(4));
  const gpsPointer = ifd0.get(0x8825);
  const gps = gpsPointer ? readIfd(u32(gpsPointer.valueAt)) : null;
  const rational = (valueAt: number, i: number) => [u32(valueAt + i * 8), u32(valueAt + i * 8 + 4)];
  return {
    ifd0,
    gps,
    rational,
    ascii: (valueAt: number, n: number) => tiff.toString('latin1', valueAt, valueAt + n),
  };
}

const noise = (width: number, height: number) =>
  sharp(Buffer.from(Array.from({ length: width * height * 3 }, (_, i) => (i * 7919) % 251)), {
    raw: { width, height, channels: 3 },
  });
const solid = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: '#8a6a45' } });

async function expectAppError(promise: Promise<unknown>, status: number, message?: RegExp) {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  expect((err as AppError).status).toBe(status);
  if (message) expect((err as AppError).message).toMatch(message);
}

describe('sniffImageType', () => {
  it('recognises the image types by their leading bytes', async () => {
    expect(sniffImageType(await solid(8, 8).jpeg().toBuffer())).toBe('jpeg');
    expect(sniffImageType(await solid(8, 8).png().toBuffer())).toBe('png');
    expect(sniffImageType(await solid(8, 8).webp().toBuffer())).toBe('webp');
    const heicHeader = Buffer.concat([
      Buffer.from([0, 0, 0, 24]),
      Buffer.from('ftypheic'),
      Buffer.alloc(12),
    ]);
    expect(sniffImageType(heicHeader)).toBe('heic');
  });

  it('rejects everything else, whatever it claims to be', async () => {
    expect(sniffImageType(Buffer.from('%PDF-1.7\n1 0 obj\n'))).toBeNull();
    expect(sniffImageType(Buffer.from('just some notes about the sill'))).toBeNull();
    expect(sniffImageType(await solid(8, 8).gif().toBuffer())).toBeNull();
    expect(sniffImageType(await solid(8, 8).avif().toBuffer())).toBeNull();
    expect(sniffImageType(Buffer.alloc(0))).toBeNull();
    expect(sniffImageType(Buffer.from([0xff, 0xd8]))).toBeNull();
  });
});

describe('processPhoto', () => {
  it('strips GPS EXIF and the ICC profile from both renditions', async () => {
    const input = await noise(640, 480)
      .withIccProfile('p3')
      .withExif({
        IFD0: { Make: 'TestCam', Model: 'Unit' },
        IFD3: {
          GPSLatitudeRef: 'N',
          GPSLatitude: '51/1 30/1 0/1',
          GPSLongitudeRef: 'W',
          GPSLongitude: '0/1 7/1 0/1',
        },
      })
      .jpeg()
      .toBuffer();

    // The input really carries a GPS position and a colour profile.
    const inMeta = await sharp(input).metadata();
    expect(inMeta.icc).toBeDefined();
    const inExif = readExif(inMeta.exif!);
    expect(inExif.gps).not.toBeNull();
    const lat = inExif.gps!.get(0x0002)!;
    expect(inExif.rational(lat.valueAt, 0)).toEqual([51, 1]);
    expect(inExif.rational(lat.valueAt, 1)).toEqual([30, 1]);
    expect(inExif.ascii(inExif.gps!.get(0x0001)!.valueAt, 1)).toBe('N');

    const out = await processPhoto(input);
    for (const rendition of [out.thumb, out.display]) {
      const meta = await sharp(rendition.buffer).metadata();
      expect(meta.format).toBe('jpeg');
      expect(meta.exif).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(rendition.buffer.includes(Buffer.from('GPS'))).toBe(false);
      expect(rendition.buffer.includes(Buffer.from('TestCam'))).toBe(false);
    }
  });

  it('fits a large photo inside 320 px and 1600 px and reports its own size', async () => {
    const out = await processPhoto(await solid(4000, 3000).jpeg().toBuffer());
    expect([out.width, out.height]).toEqual([4000, 3000]);
    expect([out.display.width, out.display.height]).toEqual([1600, 1200]);
    expect([out.thumb.width, out.thumb.height]).toEqual([320, 240]);
    const displayMeta = await sharp(out.display.buffer).metadata();
    expect([displayMeta.width, displayMeta.height]).toEqual([1600, 1200]);
  });

  it('fits a portrait photo by its height', async () => {
    const out = await processPhoto(await solid(1000, 2000).jpeg().toBuffer());
    expect([out.display.width, out.display.height]).toEqual([800, 1600]);
    expect([out.thumb.width, out.thumb.height]).toEqual([160, 320]);
  });

  it('never enlarges a small photo', async () => {
    const out = await processPhoto(await solid(200, 100).jpeg().toBuffer());
    expect([out.thumb.width, out.thumb.height]).toEqual([200, 100]);
    expect([out.display.width, out.display.height]).toEqual([200, 100]);
  });

  it('applies EXIF orientation 6 so the renditions come out upright', async () => {
    // Stored 400×200 with a red top-left block; orientation 6 means "rotate 90° clockwise to view".
    const width = 400;
    const height = 200;
    const raw = Buffer.alloc(width * height * 3);
    for (let y = 0; y < height; y++) {
      for (let x = 0; x < width; x++) {
        const red = x < 100 && y < 100;
        raw.set(red ? [220, 30, 30] : [30, 30, 220], (y * width + x) * 3);
      }
    }
    const input = await sharp(raw, { raw: { width, height, channels: 3 } })
      .withMetadata({ orientation: 6 })
      .jpeg({ quality: 95 })
      .toBuffer();
    expect((await sharp(input).metadata()).orientation).toBe(6);

    const out = await processPhoto(input);
    expect([out.width, out.height]).toEqual([200, 400]);
    expect([out.display.width, out.display.height]).toEqual([200, 400]);
    expect([out.thumb.width, out.thumb.height]).toEqual([160, 320]);

    const { data, info } = await sharp(out.display.buffer)
      .raw()
      .toBuffer({ resolveWithObject: true });
    const pixel = (x: number, y: number) =>
      Array.from(data.subarray((y * info.width + x) * 3, (y * info.width + x) * 3 + 3));
    const [r1, , b1] = pixel(180, 20); // top-right after a clockwise turn
    expect(r1).toBeGreaterThan(150);
    expect(b1).toBeLessThan(100);
    const [r2, , b2] = pixel(20, 20);
    expect(r2).toBeLessThan(100);
    expect(b2).toBeGreaterThan(150);
    expect((await sharp(out.display.buffer).metadata()).orientation).toBeUndefined();
  });

  it('accepts PNG (transparency on white) and WebP', async () => {
    const png = await sharp({
      create: { width: 300, height: 200, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0 } },
    })
      .png()
      .toBuffer();
    const fromPng = await processPhoto(png);
    expect((await sharp(fromPng.display.buffer).metadata()).format).toBe('jpeg');
    const { data } = await sharp(fromPng.display.buffer)
      .raw()
      .toBuffer({ resolveWithObject: true });
    expect(Math.min(...data.subarray(0, 30))).toBeGreaterThan(240);

    const fromWebp = await processPhoto(await solid(500, 400).webp().toBuffer());
    expect([fromWebp.display.width, fromWebp.display.height]).toEqual([500, 400]);
  });

  it('answers 415 for a text file, PDF bytes and a GIF', async () => {
    await expectAppError(
      processPhoto(Buffer.from('moisture 18 %, sill sound')),
      415,
      /JPEG, PNG or WebP/,
    );
    await expectAppError(
      processPhoto(Buffer.from('%PDF-1.7\n1 0 obj << /Type /Catalog >>\nendobj\n')),
      415,
    );
    await expectAppError(processPhoto(await solid(20, 20).gif().toBuffer()), 415);
  });

  it('answers 415 for a truncated JPEG and for junk behind JPEG magic bytes', async () => {
    const jpeg = await noise(800, 600).jpeg().toBuffer();
    await expectAppError(
      processPhoto(jpeg.subarray(0, Math.floor(jpeg.length / 2))),
      415,
      /damaged or incomplete/,
    );
    await expectAppError(
      processPhoto(Buffer.concat([Buffer.from([0xff, 0xd8, 0xff]), Buffer.from('not really')])),
      415,
    );
  });

  it('answers 415 for HEIC when this sharp build cannot decode it', async () => {
    const heic = Buffer.concat([
      Buffer.from([0, 0, 0, 24]),
      Buffer.from('ftypheic'),
      Buffer.alloc(40),
    ]);
    const decodable = sharp.format.heif.input.fileSuffix?.includes('.heic');
    if (decodable) await expectAppError(processPhoto(heic), 415, /damaged or incomplete/);
    else await expectAppError(processPhoto(heic), 415, /HEIC/);
  });

  it('answers 413 for more pixels than the limit, before decoding them', async () => {
    // A 1×1 PNG whose header claims 8000×6000 (48 MP): the check must come from the header alone.
    const png = Buffer.from(await solid(1, 1).png().toBuffer());
    png.writeUInt32BE(8000, 16);
    png.writeUInt32BE(6000, 20);
    png.writeUInt32BE(crc32(png.subarray(12, 29)), 29);
    expect((await sharp(png).metadata()).width).toBe(8000);
    expect(8000 * 6000).toBeGreaterThan(PHOTO_LIMITS.maxPixels);
    await expectAppError(processPhoto(png), 413, /40 megapixels/);
  });

  it('answers 413 for more bytes than the limit', async () => {
    const big = Buffer.concat([
      await solid(10, 10).jpeg().toBuffer(),
      Buffer.alloc(PHOTO_LIMITS.maxBytes),
    ]);
    await expectAppError(processPhoto(big), 413, /15 MB/);
  });
});

describe('drawDemoPhoto', () => {
  const kinds = ['sill-rot', 'frass', 'exit-holes', 'sound-ash', 'roof-rail'] as const;

  it.each(kinds)('draws %s as a JPEG that photo processing accepts', async (kind) => {
    const jpeg = await drawDemoPhoto(kind, 7);
    expect(sniffImageType(jpeg)).toBe('jpeg');
    const meta = await sharp(jpeg).metadata();
    expect([meta.width, meta.height]).toEqual([1200, 900]);
    const out = await processPhoto(jpeg);
    expect([out.display.width, out.display.height]).toEqual([1200, 900]);
  });

  it('is repeatable for a seed and varies between seeds', async () => {
    const a = await drawDemoPhoto('frass', 3);
    expect((await drawDemoPhoto('frass', 3)).equals(a)).toBe(true);
    expect((await drawDemoPhoto('frass', 4)).equals(a)).toBe(false);
  });
});
