import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildsModule } from '../builds/builds.module.js';
import { StorageModule } from '../storage/storage.module.js';
import { UploadEntity } from './upload.entity.js';
import { BuildUploadsController, UploadsController } from './uploads.controller.js';
import { UploadsService } from './uploads.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([UploadEntity]), BuildsModule, StorageModule],
  controllers: [BuildUploadsController, UploadsController],
  providers: [UploadsService],
  exports: [UploadsService],
})
export class UploadsModule {}
