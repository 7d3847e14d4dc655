import {
  GetObjectCommand,
  PutObjectCommand,
  S3Client,
  type GetObjectCommandOutput,
} from '@aws-sdk/client-s3';
import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { AppError } from '../common/errors/app-error';
import { AppConfig } from '../config/app-config';

/**
 * Photos in an S3-compatible store through the S3 SDK: the local fake in development and tests (path
 * style, as most self-hosted stores want), any S3-compatible service by configuration.
 */
@Injectable()
export class PhotoStore implements OnModuleDestroy {
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(config: AppConfig) {
    const s3 = config.s3;
    this.bucket = s3.bucket;
    this.client = new S3Client({
      region: s3.region,
      endpoint: s3.endpoint,
      forcePathStyle: s3.endpoint !== undefined,
      credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey },
      maxAttempts: 3,
    });
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    try {
      await this.client.send(
        new PutObjectCommand({
          Bucket: this.bucket,
          Key: key,
          Body: body,
          ContentType: contentType,
        }),
      );
    } catch {
      throw new AppError(
        'PHOTO_STORE_UNAVAILABLE',
        'The photo store is not answering. The photo is kept on your phone; try again in a minute.',
      );
    }
  }

  async get(key: string): Promise<Buffer> {
    let object: GetObjectCommandOutput;
    try {
      object = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
    } catch {
      throw new AppError('PHOTO_STORE_UNAVAILABLE', 'The photo store is not answering.');
    }
    return Buffer.from(await object.Body!.transformToByteArray());
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }
}
