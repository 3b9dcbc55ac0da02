import { CreateBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { randomBytes } from 'node:crypto';
import { promises as fs } from 'node:fs';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { createStorage, type StorageAdapter } from '@/server/storage';

// s3rver ships no type declarations; this is the part of its API the test uses.
type S3rverInstance = { run(): Promise<AddressInfo>; close(): Promise<void> };
type S3rverConstructor = new (options: Record<string, unknown>) => S3rverInstance;
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver: S3rverConstructor = require('s3rver');

const jpegLike = () =>
  Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), randomBytes(64 * 1024)]);

/** The behaviour every driver must share, so routes can swap drivers by configuration alone. */
function contractSuite(name: string, make: () => StorageAdapter) {
  describe(`${name} driver`, () => {
    let storage: StorageAdapter;
    beforeAll(() => {
      storage = make();
    });

    it('returns exactly the bytes that were put', async () => {
      const body = jpegLike();
      await storage.put('photos/w1/p1/display.jpg', body, 'image/jpeg');
      const got = await storage.get('photos/w1/p1/display.jpg');
      expect(got).not.toBeNull();
      expect(got!.equals(body)).toBe(true);
    });

    it('answers null for a key that was never put', async () => {
      expect(await storage.get('photos/w1/never/thumb.jpg')).toBeNull();
    });

    it('overwrites an existing key', async () => {
      await storage.put('photos/w2/p1/thumb.jpg', Buffer.from('first'), 'image/jpeg');
      await storage.put('photos/w2/p1/thumb.jpg', Buffer.from('second'), 'image/jpeg');
      expect((await storage.get('photos/w2/p1/thumb.jpg'))?.toString()).toBe('second');
    });

    it('deletes, and deleting a missing key is not an error', async () => {
      await storage.put('photos/w3/p1/thumb.jpg', Buffer.from('x'), 'image/jpeg');
      await storage.delete('photos/w3/p1/thumb.jpg');
      expect(await storage.get('photos/w3/p1/thumb.jpg')).toBeNull();
      await expect(storage.delete('photos/w3/p1/thumb.jpg')).resolves.toBeUndefined();
    });

    it('keeps keys apart', async () => {
      await storage.put('photos/w4/a/thumb.jpg', Buffer.from('a'), 'image/jpeg');
      await storage.put('photos/w4/b/thumb.jpg', Buffer.from('b'), 'image/jpeg');
      expect((await storage.get('photos/w4/a/thumb.jpg'))?.toString()).toBe('a');
      expect((await storage.get('photos/w4/b/thumb.jpg'))?.toString()).toBe('b');
    });

    it.each([
      '../escape.jpg',
      'photos/../../escape.jpg',
      '/etc/passwd',
      'photos//x.jpg',
      'photos\\x.jpg',
      '',
    ])('refuses the key %j', async (key) => {
      await expect(storage.put(key, Buffer.from('x'), 'image/jpeg')).rejects.toThrow(
        /storage key/i,
      );
      await expect(storage.get(key)).rejects.toThrow(/storage key/i);
      await expect(storage.delete(key)).rejects.toThrow(/storage key/i);
    });
  });
}

describe('storage', () => {
  const tempDirs: string[] = [];
  const tempDir = async (prefix: string) => {
    const dir = await fs.mkdtemp(path.join(os.tmpdir(), prefix));
    tempDirs.push(dir);
    return dir;
  };
  afterAll(async () => {
    await Promise.all(tempDirs.map((d) => fs.rm(d, { recursive: true, force: true })));
  });

  describe('local', () => {
    let dir: string;
    beforeAll(async () => {
      dir = path.join(await tempDir('sf-storage-local-'), 'nested', 'storage');
    });
    contractSuite('local', () => createStorage({ driver: 'local', dir }));

    it('stores plain files under the folder and leaves no temp files behind', async () => {
      const storage = createStorage({ driver: 'local', dir });
      const body = jpegLike();
      await storage.put('photos/wf/pf/thumb.jpg', body, 'image/jpeg');
      const onDisk = await fs.readFile(path.join(dir, 'photos', 'wf', 'pf', 'thumb.jpg'));
      expect(onDisk.equals(body)).toBe(true);
      expect(await fs.readdir(path.join(dir, 'photos', 'wf', 'pf'))).toEqual(['thumb.jpg']);
    });

    it('never writes outside its folder for a hostile key', async () => {
      const storage = createStorage({ driver: 'local', dir });
      await expect(storage.put('../outside.jpg', Buffer.from('x'), 'image/jpeg')).rejects.toThrow();
      await expect(fs.stat(path.join(dir, '..', 'outside.jpg'))).rejects.toMatchObject({
        code: 'ENOENT',
      });
    });
  });

  describe('s3 (s3rver on loopback)', () => {
    let server: S3rverInstance;
    let dataDir: string;
    let endpoint: string;
    const bucket = 'soundframe-test';
    const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };

    beforeAll(async () => {
      dataDir = await tempDir('sf-storage-s3-');
      server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: dataDir });
      const { port } = await server.run();
      endpoint = `http://127.0.0.1:${port}`;
      const admin = new S3Client({
        endpoint,
        region: 'us-east-1',
        credentials,
        forcePathStyle: true,
      });
      await admin.send(new CreateBucketCommand({ Bucket: bucket }));
      admin.destroy();
    });
    afterAll(async () => {
      await server?.close();
    });

    const make = () =>
      createStorage({
        driver: 's3',
        endpoint,
        bucket,
        region: 'us-east-1',
        ...credentials,
        forcePathStyle: true,
      });
    contractSuite('s3', make);

    it('stores the object without chunk framing (the bytes on the server equal the bytes put)', async () => {
      const body = jpegLike();
      await make().put('photos/wf/pf/display.jpg', body, 'image/jpeg');
      // s3rver keeps each object as <dir>/<bucket>/<key>._S3rver_object.
      const stored = await fs.readFile(
        path.join(dataDir, bucket, 'photos', 'wf', 'pf', 'display.jpg._S3rver_object'),
      );
      expect(stored.length).toBe(body.length);
      expect(stored.equals(body)).toBe(true);
    });

    it('reports a missing bucket as an error rather than as a missing object', async () => {
      const storage = createStorage({
        driver: 's3',
        endpoint,
        bucket: 'no-such-bucket',
        region: 'us-east-1',
        ...credentials,
        forcePathStyle: true,
      });
      await expect(
        storage.put('photos/w/p/thumb.jpg', Buffer.from('x'), 'image/jpeg'),
      ).rejects.toThrow();
    });
  });
});
