import { Controller, Delete, Get, Header, HttpCode, Param, Post, StreamableFile, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import type { UploadDto } from './dto/upload.dto.js';
import { inlineContentDisposition } from './file-name.js';
import { PhotoFileInterceptor } from './photo-file.interceptor.js';
import { UploadsService, type ReceivedFile } from './uploads.service.js';

@ApiTags('uploads')
@ApiBearerAuth()
@Controller('builds/:buildId/uploads')
export class BuildUploadsController {
  constructor(private readonly uploads: UploadsService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Param('buildId', ParseIdPipe) buildId: string): Promise<UploadDto[]> {
    return this.uploads.listForBuild(caller.shopId, buildId);
  }

  /** multipart/form-data with the photo in the `file` field (JPEG, PNG or WebP, at most 15 MB). */
  @Post()
  @Roles('fabricator', 'admin')
  @ApiConsumes('multipart/form-data')
  @UseInterceptors(PhotoFileInterceptor)
  create(
    @CurrentUser() caller: AuthUser,
    @Param('buildId', ParseIdPipe) buildId: string,
    @UploadedFile() file: ReceivedFile | undefined,
  ): Promise<UploadDto> {
    return this.uploads.addPhoto(caller.shopId, caller.userId, buildId, file);
  }
}

@ApiTags('uploads')
@ApiBearerAuth()
@Controller('uploads/:id')
export class UploadsController {
  constructor(private readonly uploads: UploadsService) {}

  /** The stored bytes, only to users of the owning shop; private caches only. */
  @Get('content')
  @Header('Cache-Control', 'private, max-age=86400')
  async content(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<StreamableFile> {
    const { upload, stream } = await this.uploads.openContent(caller.shopId, id);
    return new StreamableFile(stream, {
      type: upload.mimeType,
      length: upload.sizeBytes,
      disposition: inlineContentDisposition(upload.fileName),
    });
  }

  @Delete()
  @HttpCode(204)
  @Roles('fabricator', 'admin')
  remove(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    return this.uploads.remove(caller.shopId, id);
  }
}
