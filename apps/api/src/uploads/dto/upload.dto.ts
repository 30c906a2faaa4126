import type { UploadKind } from '../upload-kind.js';

export interface UploadDto {
  id: string;
  buildId: string | null;
  kind: UploadKind;
  fileName: string;
  mimeType: string;
  sizeBytes: number;
  sha256: string;
  widthPx: number | null;
  heightPx: number | null;
  uploadedById: string | null;
  createdAt: string;
  /** Where the bytes are served (signed-in users of the owning shop only). */
  contentUrl: string;
}
