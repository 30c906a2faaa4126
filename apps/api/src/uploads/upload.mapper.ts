import type { UploadDto } from './dto/upload.dto.js';
import type { UploadEntity } from './upload.entity.js';

export function toUploadDto(upload: UploadEntity): UploadDto {
  return {
    id: upload.id,
    buildId: upload.buildId,
    kind: upload.kind,
    fileName: upload.fileName,
    mimeType: upload.mimeType,
    sizeBytes: upload.sizeBytes,
    sha256: upload.sha256,
    widthPx: upload.widthPx,
    heightPx: upload.heightPx,
    uploadedById: upload.uploadedById,
    createdAt: upload.createdAt.toISOString(),
    contentUrl: `/api/uploads/${upload.id}/content`,
  };
}
