// Storage in an S3-compatible object store (the S3 API through the official AWS SDK v3), so every
// server of a group sees the same photos. The SDK (hundreds of modules) is loaded at the first
// call, so a server on disk storage, and start-up on any, never pays for it.
import type { S3Client, S3ClientConfig } from '@aws-sdk/client-s3';
import { checkKey, type Storage } from './storage';

// The pinned SDK runs on Node 20 (tested against the S3 fake); its notice that later versions will
// need Node 22 would otherwise print in every server's log. Set the variable to 'false' to see it.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

/** Where the objects go: bucket, optional key prefix, and the client's settings. */
export interface S3StorageOptions {
  bucket: string;
  prefix?: string;
  client: S3ClientConfig;
}

/** Keeps each key as an object `prefix + key` in one bucket. */
export class S3Storage implements Storage {
  private s3: Promise<{ client: S3Client; sdk: typeof import('@aws-sdk/client-s3') }> | null = null;
  private readonly config: S3ClientConfig;
  private readonly bucket: string;
  private readonly prefix: string;

  constructor(options: S3StorageOptions) {
    this.config = options.client;
    this.bucket = options.bucket;
    this.prefix = options.prefix ?? '';
  }

  /** The SDK and its client, loaded and made at the first call. */
  private sdk() {
    this.s3 ??= import('@aws-sdk/client-s3').then((sdk) => ({ sdk, client: new sdk.S3Client(this.config) }));
    return this.s3;
  }

  private keyOf(key: string): string {
    return this.prefix + checkKey(key);
  }

  async put(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
    const { sdk, client } = await this.sdk();
    await client.send(new sdk.PutObjectCommand({ Bucket: this.bucket, Key: this.keyOf(key), Body: bytes, ContentType: contentType }));
  }

  async get(key: string): Promise<Uint8Array | null> {
    const { sdk, client } = await this.sdk();
    try {
      const out = await client.send(new sdk.GetObjectCommand({ Bucket: this.bucket, Key: this.keyOf(key) }));
      return out.Body ? await out.Body.transformToByteArray() : new Uint8Array();
    } catch (e) {
      if (e instanceof sdk.NoSuchKey || (e as { name?: string }).name === 'NoSuchKey') return null;
      throw e;
    }
  }

  async delete(key: string): Promise<void> {
    // S3 answers a delete of a missing key with success, as the interface asks.
    const { sdk, client } = await this.sdk();
    await client.send(new sdk.DeleteObjectCommand({ Bucket: this.bucket, Key: this.keyOf(key) }));
  }
}

/** Storage settings as read from the environment (astro:env in the app, process.env in scripts). */
export interface StorageSettings {
  STORAGE?: 'disk' | 's3';
  S3_BUCKET?: string;
  S3_PREFIX?: string;
  S3_REGION?: string;
  S3_ENDPOINT?: string;
  S3_ACCESS_KEY_ID?: string;
  S3_SECRET_ACCESS_KEY?: string;
  S3_FORCE_PATH_STYLE?: boolean;
}

/** The S3 storage the settings describe, or a one-line reason they are incomplete. */
export function s3FromSettings(s: StorageSettings): S3Storage | string {
  if (!s.S3_BUCKET) return 'STORAGE=s3 needs S3_BUCKET (the bucket photos are kept in).';
  const credentials = s.S3_ACCESS_KEY_ID && s.S3_SECRET_ACCESS_KEY ? { accessKeyId: s.S3_ACCESS_KEY_ID, secretAccessKey: s.S3_SECRET_ACCESS_KEY } : undefined;
  if (Boolean(s.S3_ACCESS_KEY_ID) !== Boolean(s.S3_SECRET_ACCESS_KEY)) {
    return 'Set both S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY, or neither (then the SDK finds credentials itself).';
  }
  return new S3Storage({
    bucket: s.S3_BUCKET,
    prefix: s.S3_PREFIX,
    client: {
      region: s.S3_REGION || 'us-east-1',
      endpoint: s.S3_ENDPOINT || undefined,
      forcePathStyle: s.S3_FORCE_PATH_STYLE ?? Boolean(s.S3_ENDPOINT),
      credentials,
    },
  });
}
