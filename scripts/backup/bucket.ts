import { CreateBucketCommand, DeleteBucketCommand, HeadBucketCommand } from '@aws-sdk/client-s3';
import { createObjectStore, createS3Client, type ObjectStore, type S3Settings } from '../../server/lib/object-store';

/** The photo bucket, through the same SDK and settings as the app, plus the bucket-level calls a restore needs. */
export function bucketOf(settings: S3Settings): { store: ObjectStore; ensure(): Promise<void>; drop(): Promise<void> } {
  const store = createObjectStore(settings);
  const client = createS3Client(settings);
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
