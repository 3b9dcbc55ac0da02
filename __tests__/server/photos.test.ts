import fs from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import { createApp, type AppDeps } from '@/server/app';
import { AuditEntry, Photo } from '@/server/models';
import type { StorageAdapter } from '@/server/storage';
import {
  createFinding,
  createSurvey,
  createVehicle,
  createWorkshopWithTeam,
  grantAccess,
} from '../factories';
import { appStorage, createPhoto, jpeg, jpegWithGps } from '../factories/photos';
import { buildTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let storage: StorageAdapter;
beforeAll(() => {
  t = buildTestApp();
  storage = appStorage(t.app);
});
afterAll(() => t.close());

const api = () => request(t.app);

/** Every object stored for a workshop, read straight from the local storage folder. */
function storedFiles(workshopId: string): string[] {
  if (t.config.storage.driver !== 'local') throw new Error('these tests use local storage');
  const dir = path.join(t.config.storage.dir, 'photos', workshopId);
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => e.name);
}

async function findingScenario() {
  const team = await createWorkshopWithTeam(t.config);
  const vehicle = await createVehicle(team.workshop);
  const finding = await createFinding(await createSurvey(vehicle));
  const w = `/api/workshops/${team.workshop.id}`;
  return { ...team, vehicle, finding, w, upload: `${w}/findings/${finding.id}/photos` };
}

describe('POST /api/workshops/:wid/findings/:fid/photos', () => {
  it('re-encodes each photo into two stored renditions and answers 201 with their rows', async () => {
    const s = await findingScenario();
    const res = await api()
      .post(s.upload)
      .set(s.inspector.auth)
      .field('caption', 'Sill underside')
      .attach('photos', await jpeg(2400, 1800, 1), 'one.jpg')
      .attach(
        'photos',
        await sharp(await jpeg(300, 200, 2))
          .png()
          .toBuffer(),
        'two.png',
      )
      .expect(201);
    expect(res.body.items).toHaveLength(2);
    const rows = await Photo.findAll({ where: { findingId: s.finding.id } });
    expect(rows).toHaveLength(2);
    const big = rows.find((r) => r.width === 2400)!;
    expect(big).toMatchObject({
      height: 1800,
      caption: 'Sill underside',
      uploadedById: s.inspector.user.id,
    });
    expect(big.thumbKey).toBe(`photos/${s.workshop.id}/${big.id}/thumb.jpg`);
    expect(big.displayKey).toBe(`photos/${s.workshop.id}/${big.id}/display.jpg`);
    const thumb = await sharp((await storage.get(big.thumbKey))!).metadata();
    const display = await sharp((await storage.get(big.displayKey))!).metadata();
    expect([thumb.format, thumb.width, thumb.height]).toEqual(['jpeg', 320, 240]);
    expect([display.format, display.width, display.height]).toEqual(['jpeg', 1600, 1200]);
    expect(storedFiles(s.workshop.id).sort()).toEqual([
      'display.jpg',
      'display.jpg',
      'thumb.jpg',
      'thumb.jpg',
    ]);
    expect(res.body.items.map((i: { thumbUrl: string }) => i.thumbUrl).sort()).toEqual(
      rows.map((r) => `${s.w}/photos/${r.id}/thumb`).sort(),
    );
    expect(
      await AuditEntry.count({ where: { entityId: s.finding.id, action: 'photo.create' } }),
    ).toBe(1);
  });

  it('stores renditions without the GPS EXIF the phone wrote', async () => {
    const s = await findingScenario();
    const input = await jpegWithGps();
    expect((await sharp(input).metadata()).exif).toBeDefined();
    await api().post(s.upload).set(s.owner.auth).attach('photos', input, 'phone.jpg').expect(201);
    const [row] = await Photo.findAll({ where: { findingId: s.finding.id } });
    for (const key of [row.thumbKey, row.displayKey]) {
      const bytes = (await storage.get(key))!;
      const meta = await sharp(bytes).metadata();
      expect(meta.exif).toBeUndefined();
      expect(bytes.includes(Buffer.from('TestCam'))).toBe(false);
    }
  });

  it('answers 415 for a file that is not an image, and stores nothing', async () => {
    const s = await findingScenario();
    const res = await api()
      .post(s.upload)
      .set(s.owner.auth)
      .attach('photos', Buffer.from('%PDF-1.7\nnot a photo'), {
        filename: 'sill.jpg',
        contentType: 'image/jpeg',
      })
      .expect(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
    expect(await Photo.count({ where: { findingId: s.finding.id } })).toBe(0);
    expect(storedFiles(s.workshop.id)).toEqual([]);
  });

  it('answers 413 for a file over 15 MB, and stores nothing', async () => {
    const s = await findingScenario();
    const big = Buffer.concat([await jpeg(), Buffer.alloc(15 * 1024 * 1024 + 1)]);
    const res = await api()
      .post(s.upload)
      .set(s.owner.auth)
      .attach('photos', big, 'huge.jpg')
      .expect(413);
    expect(res.body.error.code).toBe('too_large');
    expect(await Photo.count({ where: { findingId: s.finding.id } })).toBe(0);
    expect(storedFiles(s.workshop.id)).toEqual([]);
  });

  it('stores nothing when one file of several is bad', async () => {
    const s = await findingScenario();
    await api()
      .post(s.upload)
      .set(s.owner.auth)
      .attach('photos', await jpeg(), 'good.jpg')
      .attach('photos', Buffer.from('GIF89a nope'), 'bad.gif')
      .expect(415);
    expect(await Photo.count({ where: { findingId: s.finding.id } })).toBe(0);
    expect(storedFiles(s.workshop.id)).toEqual([]);
  });

  it('deletes the renditions already stored when storage fails part-way', async () => {
    const s = await findingScenario();
    let puts = 0;
    const flaky: StorageAdapter = {
      put: async (key, body, type) => {
        if (++puts === 3) throw new Error('disk full');
        await storage.put(key, body, type);
      },
      get: (key) => storage.get(key),
      delete: (key) => storage.delete(key),
    };
    const quiet = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    const deps = t.app.locals.deps as AppDeps;
    const app = createApp({ ...deps, storage: flaky });
    await request(app)
      .post(s.upload)
      .set(s.owner.auth)
      .attach('photos', await jpeg(), 'a.jpg')
      .attach('photos', await jpeg(), 'b.jpg')
      .expect(500);
    quiet.mockRestore();
    expect(puts).toBe(3);
    expect(await Photo.count({ where: { findingId: s.finding.id } })).toBe(0);
    expect(storedFiles(s.workshop.id)).toEqual([]);
  });

  it.each<[string, (r: request.Test) => PromiseLike<request.Response>, string]>([
    ['no file', (r) => r.field('caption', 'x'), 'photos'],
    [
      'a caption over 500 characters',
      async (r) => r.field('caption', 'c'.repeat(501)).attach('photos', await jpeg(), 'a.jpg'),
      'caption',
    ],
    ['a file in another field', async (r) => r.attach('picture', await jpeg(), 'a.jpg'), 'photos'],
    [
      'seven files',
      async (r) => {
        for (let i = 0; i < 7; i++) r.attach('photos', await jpeg(), `${i}.jpg`);
        return r;
      },
      'photos',
    ],
  ])('answers 400 naming the field for %s, and stores nothing', async (_label, build, field) => {
    const s = await findingScenario();
    const res = await build(api().post(s.upload).set(s.owner.auth));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual([field]);
    expect(await Photo.count({ where: { findingId: s.finding.id } })).toBe(0);
  });

  it('answers 403 to an applicator and 404 for a finding of another workshop', async () => {
    const s = await findingScenario();
    const other = await findingScenario();
    await api()
      .post(s.upload)
      .set(s.applicator.auth)
      .attach('photos', await jpeg(), 'a.jpg')
      .expect(403);
    await api()
      .post(`${s.w}/findings/${other.finding.id}/photos`)
      .set(s.owner.auth)
      .attach('photos', await jpeg(), 'a.jpg')
      .expect(404);
    expect(await Photo.count({ where: { findingId: [s.finding.id, other.finding.id] } })).toBe(0);
  });
});

describe('GET /api/workshops/:wid/photos/:pid/thumb and …/display', () => {
  it('streams the stored JPEG privately to any reader of the vehicle, including a client it is shared with', async () => {
    const s = await findingScenario();
    const photo = await createPhoto(s.finding, storage);
    await grantAccess(s.vehicle, s.client.user.id);
    for (const who of [s.owner, s.applicator, s.client]) {
      for (const rendition of ['thumb', 'display'] as const) {
        const res = await api()
          .get(`${s.w}/photos/${photo.id}/${rendition}`)
          .set(who.auth)
          .buffer(true)
          .parse((r, cb) => {
            const chunks: Buffer[] = [];
            r.on('data', (c: Buffer) => chunks.push(c));
            r.on('end', () => cb(null, Buffer.concat(chunks)));
          })
          .expect(200);
        expect(res.headers['content-type']).toBe('image/jpeg');
        expect(res.headers['cache-control']).toMatch(/^private/);
        expect(res.headers['x-content-type-options']).toBe('nosniff');
        const stored = await storage.get(rendition === 'thumb' ? photo.thumbKey : photo.displayKey);
        expect(Buffer.compare(res.body as Buffer, stored!)).toBe(0);
      }
    }
  });

  it('answers 404 to a client the vehicle is not shared with, and for unknown photos', async () => {
    const s = await findingScenario();
    const photo = await createPhoto(s.finding, storage);
    await api().get(`${s.w}/photos/${photo.id}/thumb`).set(s.client.auth).expect(404);
    await api().get(`${s.w}/photos/${s.finding.id}/thumb`).set(s.owner.auth).expect(404);
    await api().get(`${s.w}/photos/nope/display`).set(s.owner.auth).expect(404);
  });
});

describe('DELETE /api/workshops/:wid/photos/:pid', () => {
  it('removes the row and both stored renditions (204), with an audit entry', async () => {
    const s = await findingScenario();
    const photo = await createPhoto(s.finding, storage);
    const keep = await createPhoto(s.finding, storage);
    await api().delete(`${s.w}/photos/${photo.id}`).set(s.inspector.auth).expect(204);
    expect(await Photo.findByPk(photo.id)).toBeNull();
    expect(await storage.get(photo.thumbKey)).toBeNull();
    expect(await storage.get(photo.displayKey)).toBeNull();
    expect(await storage.get(keep.thumbKey)).not.toBeNull();
    expect(
      await AuditEntry.count({ where: { entityId: s.finding.id, action: 'photo.delete' } }),
    ).toBe(1);
    await api().get(`${s.w}/photos/${photo.id}/thumb`).set(s.owner.auth).expect(404);
  });

  it('answers 403 to a client and an applicator and keeps the photo', async () => {
    const s = await findingScenario();
    const photo = await createPhoto(s.finding, storage);
    await grantAccess(s.vehicle, s.client.user.id);
    for (const who of [s.client, s.applicator])
      await api().delete(`${s.w}/photos/${photo.id}`).set(who.auth).expect(403);
    expect(await Photo.findByPk(photo.id)).not.toBeNull();
    expect(await storage.get(photo.thumbKey)).not.toBeNull();
  });
});
