import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { StorageAdapter, StorageConfig } from './index';
import { assertStorageKey } from './key';

export type S3StorageConfig = Extract<StorageConfig, { driver: 's3' }>;

export function createS3Storage(config: S3StorageConfig): StorageAdapter {
  const client = new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    forcePathStyle: config.forcePathStyle,
    // With the SDK's default checksums, S3-compatible stores that lack the feature keep the aws-chunked
    // framing as part of the object (PLATFORM.md).
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = config.bucket;

  return {
    async put(key, body, contentType) {
      assertStorageKey(key);
      await client.send(
        new PutObjectCommand({
          Bucket,
          Key: key,
          Body: body,
          ContentType: contentType,
          ContentLength: body.length,
        }),
      );
    },

    async get(key) {
      assertStorageKey(key);
      try {
        const res = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        if (!res.Body) return null;
        return Buffer.from(await res.Body.transformToByteArray());
      } catch (err) {
        if (err instanceof NoSuchKey) return null;
        if (err instanceof S3ServiceException && err.$metadata.httpStatusCode === 404) return null;
        throw err;
      }
    },

    async delete(key) {
      assertStorageKey(key);
      // S3 answers 204 for a key that does not exist, so delete is idempotent as in the local driver.
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
  };
}
