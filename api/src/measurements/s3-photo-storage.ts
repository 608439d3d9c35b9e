import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { PhotoStorage, assertGeneratedKey } from './photo-storage';

export interface S3PhotoStorageOptions {
  bucket: string;
  region: string;
  /** An S3-compatible endpoint (MinIO, Ceph, a local fake); absent for AWS itself. */
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  /** Key prefix inside the bucket. */
  prefix?: string;
}

/**
 * Photos in an S3-compatible object store (STORAGE_DRIVER=s3), so every API instance sees every photo. Keys are the
 * generated ones of the local driver, under `measurement-photos/`.
 */
export class S3PhotoStorage extends PhotoStorage {
  private readonly client: S3Client;
  private readonly prefix: string;

  constructor(private readonly options: S3PhotoStorageOptions) {
    super();
    this.prefix = options.prefix ?? 'measurement-photos/';
    this.client = new S3Client({
      region: options.region,
      endpoint: options.endpoint,
      // Path-style URLs work with every S3-compatible store; checksums only where the API requires them, so bodies
      // are sent as they are (some stores keep chunk framing otherwise).
      forcePathStyle: Boolean(options.endpoint),
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      credentials:
        options.accessKeyId && options.secretAccessKey
          ? { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey }
          : undefined,
    });
  }

  private key(key: string): string {
    assertGeneratedKey(key);
    return this.prefix + key;
  }

  async put(key: string, data: Buffer): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.options.bucket, Key: this.key(key), Body: data, ContentLength: data.length }));
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      const answer = await this.client.send(new GetObjectCommand({ Bucket: this.options.bucket, Key: this.key(key) }));
      return answer.Body ? Buffer.from(await answer.Body.transformToByteArray()) : null;
    } catch (error) {
      if (error instanceof NoSuchKey || (error as { name?: string }).name === 'NoSuchKey') return null;
      throw error;
    }
  }

  async remove(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.options.bucket, Key: this.key(key) }));
  }

  destroy(): void {
    this.client.destroy();
  }
}
