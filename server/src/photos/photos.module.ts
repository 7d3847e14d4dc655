import { Module } from '@nestjs/common';
import { PhotoStore } from './photo-store';
import { PhotosController } from './photos.controller';
import { PhotosService } from './photos.service';

@Module({ controllers: [PhotosController], providers: [PhotoStore, PhotosService] })
export class PhotosModule {}
