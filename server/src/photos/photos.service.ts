import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { uploadPhotoFieldsSchema, type PhotoView } from '@pondwright/shared';
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { DataSource } from 'typeorm';
import { AppError } from '../common/errors/app-error';
import { TenantContext } from '../common/tenancy/tenant-context';
import { isUuid } from '../common/tenancy/tenant-repository';
import { parseBody } from '../common/validation/parse-body';
import { AppConfig } from '../config/app-config';
import { Job } from '../jobs/entities/job.entity';
import { findCompanyJob } from '../jobs/find-job';
import { JobLog } from '../jobs/entities/job-log.entity';
import { JobPhoto } from './entities/job-photo.entity';
import { imageTypeOf } from './image-type';
import { PhotoStore } from './photo-store';

/** The longest side kept, px: sharp on a phone screen and in a report, a fraction of a camera's size. */
const IMAGE_MAX_PX = 2048;
const THUMBNAIL_PX = 320;
/** Decoding bombs: refuse images whose pixel count would take gigabytes to open. */
const MAX_INPUT_PIXELS = 80_000_000;

export type UploadedPhotoFile = { buffer: Buffer; size: number };

@Injectable()
export class PhotosService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly tenant: TenantContext,
    private readonly store: PhotoStore,
    private readonly config: AppConfig,
  ) {}

  /**
   * Checks the file by its bytes, turns it upright, strips its metadata (phone photos carry the GPS
   * position of the customer's garden), stores a ≤ 2048 px JPEG and a 320 px WebP thumbnail, then the
   * row. The same photo id again: the same bytes answer the stored photo, other bytes a conflict.
   */
  async upload(
    jobId: string,
    photoId: string,
    file: UploadedPhotoFile | undefined,
    fields: unknown,
    userId: string,
  ): Promise<{ photo: PhotoView; created: boolean }> {
    const job = await this.findJob(jobId);
    if (!isUuid(photoId)) throw new AppError('NOT_FOUND', 'Photo not found');
    const request = parseBody(uploadPhotoFieldsSchema, fields);
    if (!file || file.size === 0) {
      throw new AppError('PHOTO_NOT_AN_IMAGE', 'Choose a photo to upload', [
        { field: 'photo', message: 'Choose a photo' },
      ]);
    }
    if (file.size > this.config.photoMaxBytes) throw this.tooLarge();
    const contentType = imageTypeOf(file.buffer);
    if (!contentType) {
      throw new AppError('PHOTO_NOT_AN_IMAGE', 'This file is not a JPEG, PNG or WebP photo.', [
        { field: 'photo', message: 'Use a JPEG, PNG or WebP photo' },
      ]);
    }
    const uploadSha256 = createHash('sha256').update(file.buffer).digest('hex');
    const existing = await this.dataSource.manager.findOne(JobPhoto, {
      where: { id: photoId },
      relations: { uploadedBy: true },
    });
    if (existing) {
      if (existing.companyId !== job.companyId || existing.jobId !== job.id) {
        throw new AppError('NOT_FOUND', 'Photo not found');
      }
      if (existing.uploadSha256 !== uploadSha256) {
        throw new AppError('PHOTO_ID_TAKEN', 'Another photo was already saved under this id.');
      }
      return { photo: photoView(existing), created: false };
    }
    if (request.logId) {
      const log = await this.dataSource.manager.findOneBy(JobLog, {
        id: request.logId,
        jobId: job.id,
      });
      if (!log) throw new AppError('NOT_FOUND', 'Daily log not found for this job');
    }

    const { image, thumbnail, widthPx, heightPx } = await this.render(file.buffer);
    const base = `companies/${job.companyId}/jobs/${job.id}/photos/${photoId}`;
    await this.store.put(`${base}.jpg`, image, 'image/jpeg');
    await this.store.put(`${base}-thumb.webp`, thumbnail, 'image/webp');
    await this.dataSource
      .createQueryBuilder()
      .insert()
      .into(JobPhoto)
      .values({
        id: photoId,
        companyId: job.companyId,
        jobId: job.id,
        logId: request.logId ?? null,
        kind: request.kind,
        caption: request.caption,
        contentType,
        byteSize: file.size,
        widthPx,
        heightPx,
        uploadSha256,
        imageKey: `${base}.jpg`,
        thumbnailKey: `${base}-thumb.webp`,
        uploadedById: userId,
      })
      // Two tries of the same upload at once: the second finds the first's row.
      .orIgnore()
      .execute();
    const saved = await this.dataSource.manager.findOneOrFail(JobPhoto, {
      where: { id: photoId },
      relations: { uploadedBy: true },
    });
    return { photo: photoView(saved), created: true };
  }

  async list(jobId: string): Promise<PhotoView[]> {
    const job = await this.findJob(jobId);
    const photos = await this.dataSource.manager.find(JobPhoto, {
      where: { jobId: job.id, companyId: job.companyId },
      relations: { uploadedBy: true },
      order: { createdAt: 'ASC' },
    });
    return photos.map(photoView);
  }

  async image(
    jobId: string,
    photoId: string,
    variant: 'image' | 'thumbnail',
  ): Promise<{ bytes: Buffer; contentType: string }> {
    const job = await this.findJob(jobId);
    const photo = isUuid(photoId)
      ? await this.dataSource.manager.findOneBy(JobPhoto, { id: photoId, jobId: job.id })
      : null;
    if (!photo) throw new AppError('NOT_FOUND', 'Photo not found');
    const key = variant === 'image' ? photo.imageKey : photo.thumbnailKey;
    return {
      bytes: await this.store.get(key),
      contentType: variant === 'image' ? 'image/jpeg' : 'image/webp',
    };
  }

  private async render(input: Buffer) {
    try {
      const upright = sharp(input, { limitInputPixels: MAX_INPUT_PIXELS }).rotate();
      const image = await upright
        .clone()
        .resize(IMAGE_MAX_PX, IMAGE_MAX_PX, { fit: 'inside', withoutEnlargement: true })
        .jpeg({ quality: 82, mozjpeg: true })
        .toBuffer({ resolveWithObject: true });
      const thumbnail = await upright
        .clone()
        .resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: 'cover' })
        .webp({ quality: 70 })
        .toBuffer();
      return {
        image: image.data,
        thumbnail,
        widthPx: image.info.width,
        heightPx: image.info.height,
      };
    } catch {
      throw new AppError(
        'PHOTO_NOT_AN_IMAGE',
        'This photo could not be opened; it may be damaged.',
        [{ field: 'photo', message: 'The image could not be read' }],
      );
    }
  }

  private tooLarge(): AppError {
    const mb = Math.floor(this.config.photoMaxBytes / (1024 * 1024));
    return new AppError('PHOTO_TOO_LARGE', `Photos can be at most ${mb} MB.`, [
      { field: 'photo', message: `Use a photo of at most ${mb} MB` },
    ]);
  }

  private findJob(id: string): Promise<Job> {
    return findCompanyJob(this.dataSource.manager, id, this.tenant.companyId);
  }
}

function photoView(photo: JobPhoto): PhotoView {
  const path = `/api/jobs/${photo.jobId}/photos/${photo.id}`;
  return {
    id: photo.id,
    jobId: photo.jobId,
    logId: photo.logId,
    kind: photo.kind,
    caption: photo.caption,
    widthPx: photo.widthPx,
    heightPx: photo.heightPx,
    uploadedByName: photo.uploadedBy?.name ?? '',
    createdAt: photo.createdAt.toISOString(),
    imagePath: `${path}/image`,
    thumbnailPath: `${path}/thumbnail`,
  };
}
