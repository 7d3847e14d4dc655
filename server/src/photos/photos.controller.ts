import {
  Body,
  Controller,
  Get,
  Param,
  Put,
  Res,
  UploadedFile,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { PhotoView } from '@pondwright/shared';
import type { Response } from 'express';
import { AnyRole, CurrentUser, type Principal } from '../common/decorators/auth.decorators';
import { PhotosService, type UploadedPhotoFile } from './photos.service';
import { PHOTO_UPLOAD_LIMITS } from './upload-limits';

@ApiTags('jobs')
@ApiBearerAuth()
@AnyRole()
@Controller('jobs/:jobId/photos')
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  @Get()
  list(@Param('jobId') jobId: string): Promise<PhotoView[]> {
    return this.photos.list(jobId);
  }

  /** Multipart: file `photo`, fields `uploadPhotoFieldsSchema`. 201 new, 200 when already stored. */
  @Put(':photoId')
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(FileInterceptor('photo', { limits: PHOTO_UPLOAD_LIMITS }))
  async upload(
    @Param('jobId') jobId: string,
    @Param('photoId') photoId: string,
    @UploadedFile() file: UploadedPhotoFile | undefined,
    @Body() fields: unknown,
    @CurrentUser() user: Principal,
    @Res({ passthrough: true }) response: Response,
  ): Promise<PhotoView> {
    const saved = await this.photos.upload(jobId, photoId, file, fields, user.userId);
    response.status(saved.created ? 201 : 200);
    return saved.photo;
  }

  @Get(':photoId/image')
  async image(
    @Param('jobId') jobId: string,
    @Param('photoId') photoId: string,
    @Res() response: Response,
  ): Promise<void> {
    send(response, await this.photos.image(jobId, photoId, 'image'));
  }

  @Get(':photoId/thumbnail')
  async thumbnail(
    @Param('jobId') jobId: string,
    @Param('photoId') photoId: string,
    @Res() response: Response,
  ): Promise<void> {
    send(response, await this.photos.image(jobId, photoId, 'thumbnail'));
  }
}

/** Photos never change under their id, so the browser may keep them (privately) for a day. */
function send(response: Response, image: { bytes: Buffer; contentType: string }): void {
  response
    .status(200)
    .type(image.contentType)
    .setHeader('Cache-Control', 'private, max-age=86400, immutable')
    .send(image.bytes);
}
