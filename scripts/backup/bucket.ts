import { CreateBucketCommand, DeleteBucketCommand, HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../../server/config';
import { createObjectStore, type ObjectStore } from '../../server/lib/object-store';

type S3Settings = Pick<Config, 'S3_ENDPOINT' | 'S3_REGION' | 'S3_BUCKET' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE'>;

/** The photo bucket, through the same SDK and settings as the app, plus the bucket-level calls a restore needs. */
export function bucketOf(settings: S3Settings): { store: ObjectStore; ensure(): Promise<void>; drop(): Promise<void> } {
  const store = createObjectStore(settings);
  const client = new S3Client({
    endpoint: settings.S3_ENDPOINT,
    region: settings.S3_REGION,
    forcePathStyle: settings.S3_FORCE_PATH_STYLE === 'true',
    credentials: { accessKeyId: settings.S3_ACCESS_KEY_ID, secretAccessKey: settings.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = settings.S3_BUCKET;
  return {
    store,
    async ensure() {
      try {
        await client.send(new HeadBucketCommand({ Bucket }));
      } catch {
        await client.send(new CreateBucketCommand({ Bucket }));
      }
    },
    async drop() {
      await store.delete(await store.list(''));
      await client.send(new DeleteBucketCommand({ Bucket }));
    },
  };
}

/** A key as a path under the backup's objects/ folder; keys that would leave it are refused. */
export function safeKey(key: string): string {
  if (!key || key.startsWith('/') || key.split('/').some((part) => part === '..' || part === '') || key.includes('\\')) {
    throw new Error(`object key ${JSON.stringify(key)} cannot be stored as a file safely`);
  }
  return key;
}
