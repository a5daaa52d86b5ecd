import { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';
import type { S3Config } from '../config/s3-config';

/** A client for the configured bucket, with the settings the local fake needs (and real S3 accepts). */
export function createS3Client(s3: S3Config): S3Client {
  return new S3Client({
    endpoint: s3.endpoint,
    region: s3.region,
    credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey },
    // Bucket in the path, not the host name: the fake (and most S3-compatible stores) need it.
    forcePathStyle: true,
    // The SDK's default extra checksums are not understood by the fake; SHA-256 is checked by the API itself.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

/** The only place that talks to object storage: put, read, list and delete objects in the bucket. */
@Injectable()
export class ObjectStorageService implements OnModuleDestroy {
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(@InjectConfig() config: AppConfig) {
    this.client = createS3Client(config.s3);
    this.bucket = config.s3.bucket;
  }

  /** Stores bytes under a key (replacing any object there). */
  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(
      new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }),
    );
  }

  /** The object's bytes as a Node stream, with its length. */
  async stream(key: string): Promise<{ body: Readable; length: number | undefined }> {
    const answer = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
    if (!(answer.Body instanceof Readable)) throw new Error(`Object ${key} has no readable body`);
    return { body: answer.Body, length: answer.ContentLength };
  }

  /** The object's bytes in memory (for objects whose size the API has already bounded). */
  async read(key: string): Promise<Buffer> {
    const answer = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
    if (!answer.Body) throw new Error(`Object ${key} has no body`);
    return Buffer.from(await answer.Body.transformToByteArray());
  }

  /** Deletes every object whose key starts with the prefix. */
  async deletePrefix(prefix: string): Promise<void> {
    let token: string | undefined;
    do {
      const page = await this.client.send(
        new ListObjectsV2Command({ Bucket: this.bucket, Prefix: prefix, ContinuationToken: token }),
      );
      // One by one: the batch delete needs a checksum header that not every S3-compatible store accepts.
      for (const item of page.Contents ?? []) {
        if (item.Key) await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: item.Key }));
      }
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }
}
