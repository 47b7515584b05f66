import {
  DeleteObjectsCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { Config } from '../config';

export interface StoredObject {
  body: Buffer;
  contentType: string | undefined;
}

/**
 * Where photo bytes live. The app talks S3 through the AWS SDK; locally the endpoint is the s3rver fake
 * (scripts/fakes.ts), in production a real bucket, so switching is configuration only.
 */
export interface ObjectStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The object, or null when there is none under that key. */
  get(key: string): Promise<StoredObject | null>;
  delete(keys: readonly string[]): Promise<void>;
  /** Deletes every object whose key starts with `prefix`; answers how many went. */
  deletePrefix(prefix: string): Promise<number>;
  /** Keys under a prefix (tests and clean-up). */
  list(prefix: string): Promise<string[]>;
}

export class S3ObjectStore implements ObjectStore {
  constructor(
    private readonly client: S3Client,
    private readonly bucket: string,
  ) {}

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
  }

  async get(key: string): Promise<StoredObject | null> {
    try {
      const answer = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      if (!answer.Body) return null;
      return { body: Buffer.from(await answer.Body.transformToByteArray()), contentType: answer.ContentType };
    } catch (error) {
      if (error instanceof NoSuchKey || (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404)) return null;
      throw error;
    }
  }

  async delete(keys: readonly string[]): Promise<void> {
    // DeleteObjects takes at most 1,000 keys per call.
    for (let i = 0; i < keys.length; i += 1000) {
      const part = keys.slice(i, i + 1000);
      const answer = await this.client.send(
        new DeleteObjectsCommand({ Bucket: this.bucket, Delete: { Objects: part.map((Key) => ({ Key })), Quiet: true } }),
      );
      if (answer.Errors?.length) throw new Error(`object store refused to delete ${answer.Errors.length} objects: ${answer.Errors[0]?.Code}`);
    }
  }

  async list(prefix: string): Promise<string[]> {
    const keys: string[] = [];
    let token: string | undefined;
    do {
      const page = await this.client.send(new ListObjectsV2Command({ Bucket: this.bucket, Prefix: prefix, ContinuationToken: token }));
      for (const item of page.Contents ?? []) if (item.Key) keys.push(item.Key);
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
    return keys;
  }

  async deletePrefix(prefix: string): Promise<number> {
    if (!prefix.endsWith('/')) throw new Error('deletePrefix needs a folder-like prefix ending in /');
    const keys = await this.list(prefix);
    await this.delete(keys);
    return keys.length;
  }
}

export type S3Settings = Pick<Config, 'S3_ENDPOINT' | 'S3_REGION' | 'S3_BUCKET' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE'>;

/** The SDK client as the app configures it (also used by the backup scripts for bucket-level calls). */
export function createS3Client(settings: S3Settings): S3Client {
  // The SDK is pinned to a release that supports Node 20 (see STACK.md); its notice that later releases
  // will not would otherwise open every server log.
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
  return new S3Client({
    endpoint: settings.S3_ENDPOINT,
    region: settings.S3_REGION,
    forcePathStyle: settings.S3_FORCE_PATH_STYLE === 'true',
    credentials: { accessKeyId: settings.S3_ACCESS_KEY_ID, secretAccessKey: settings.S3_SECRET_ACCESS_KEY },
    // Checksums only where S3 requires them: the SDK's default CRC32 trailers are not understood by the
    // local fake, and real S3 accepts either.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 3,
  });
}

export function createObjectStore(settings: S3Settings): ObjectStore {
  return new S3ObjectStore(createS3Client(settings), settings.S3_BUCKET);
}
