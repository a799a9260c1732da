import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import type { OnModuleDestroy } from '@nestjs/common';
import { Readable } from 'node:stream';
import {
  assertObjectKey,
  assertRange,
  ObjectNotFoundError,
  readAll,
  type ByteRange,
  type ObjectStorage,
  type PutOptions,
  type StoredObjectInfo,
} from './object-storage';

export interface S3Settings {
  endpoint: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
}

function isNotFound(error: unknown): boolean {
  if (!(error instanceof S3ServiceException)) return false;
  return error.name === 'NoSuchKey' || error.name === 'NotFound' || error.$metadata.httpStatusCode === 404;
}

export function createS3Client(settings: S3Settings): S3Client {
  return new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    credentials: { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey },
    // Path-style URLs work with every S3-compatible store; virtual hosts need DNS per bucket.
    forcePathStyle: true,
    // Without these the SDK sends aws-chunked bodies with trailing checksums, which several
    // S3-compatible stores keep as part of the object.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

// Any S3-compatible store through the AWS SDK.
export class S3ObjectStorage implements ObjectStorage, OnModuleDestroy {
  constructor(
    private readonly client: S3Client,
    private readonly bucket: string,
  ) {}

  // Nest calls this on app.close(): the SDK's keep-alive sockets would hold the process open.
  onModuleDestroy(): void {
    this.client.destroy();
  }

  async put(key: string, body: Buffer | Readable, options: PutOptions): Promise<void> {
    assertObjectKey(key);
    // A PUT needs its length up front; a stream of unknown length is read into memory first.
    const payload = Buffer.isBuffer(body) || options.sizeBytes !== undefined ? body : await readAll(body);
    const length = Buffer.isBuffer(payload) ? payload.length : options.sizeBytes;
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: key,
        Body: payload,
        ContentType: options.contentType,
        ContentLength: length,
      }),
    );
  }

  async get(key: string, range?: ByteRange): Promise<Readable> {
    assertObjectKey(key);
    if (range) assertRange(range);
    try {
      const answer = await this.client.send(
        new GetObjectCommand({
          Bucket: this.bucket,
          Key: key,
          Range: range ? `bytes=${range.start}-${range.end}` : undefined,
        }),
      );
      // In Node the SDK's body is a Readable (IncomingMessage with the SDK's mixins).
      if (!(answer.Body instanceof Readable)) throw new Error(`The store answered no body for "${key}".`);
      return answer.Body;
    } catch (error) {
      if (isNotFound(error)) throw new ObjectNotFoundError(key);
      throw error;
    }
  }

  async head(key: string): Promise<StoredObjectInfo | null> {
    assertObjectKey(key);
    try {
      const answer = await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key }));
      return {
        sizeBytes: answer.ContentLength ?? 0,
        contentType: answer.ContentType ?? 'application/octet-stream',
      };
    } catch (error) {
      if (isNotFound(error)) return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    assertObjectKey(key);
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }
}
