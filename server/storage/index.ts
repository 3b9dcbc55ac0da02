import { createLocalStorage } from './local';
import { createS3Storage } from './s3';

/** Where photo renditions live. Keys look like `photos/<workshopId>/<photoId>/thumb.jpg`. */
export interface StorageAdapter {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The stored bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Buffer | null>;
  /** Removes the object; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
}

export type StorageConfig =
  | { driver: 'local'; dir: string }
  | {
      driver: 's3';
      endpoint?: string;
      bucket: string;
      region: string;
      accessKeyId: string;
      secretAccessKey: string;
      forcePathStyle?: boolean;
    };

export function createStorage(config: StorageConfig): StorageAdapter {
  return config.driver === 'local' ? createLocalStorage(config.dir) : createS3Storage(config);
}
