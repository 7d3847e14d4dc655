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
import { uploadPhotoFieldsSchema, type PhotoView } from '@pondwright/shared';
import type { Response } from 'express';
import {
  ApiFileResponse,
  ApiJsonResponse,
  ApiUploadBody,
} from '../common/decorators/api-docs.decorators';
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
  @ApiJsonResponse(200, 'PhotoView[]', 'The job’s photos')
  list(@Param('jobId') jobId: string): Promise<PhotoView[]> {
    return this.photos.list(jobId);
  }

  /** 201 new, 200 when already stored (the phone makes the id, so a resend is harmless). */
  @Put(':photoId')
  @ApiConsumes('multipart/form-data')
  @ApiUploadBody('photo', uploadPhotoFieldsSchema)
  @ApiJsonResponse(200, 'PhotoView', 'Already stored under this id')
  @ApiJsonResponse(201, 'PhotoView', 'Stored, with a thumbnail')
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
  @ApiFileResponse('image/jpeg', 'The photo, upright, at most 2048 px')
  async image(
    @Param('jobId') jobId: string,
    @Param('photoId') photoId: string,
    @Res() response: Response,
  ): Promise<void> {
    send(response, await this.photos.image(jobId, photoId, 'image'));
  }

  @Get(':photoId/thumbnail')
  @ApiFileResponse('image/webp', 'A 320 px thumbnail')
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
