import type { ApiClient } from '../../../lib/api-client';
import { ApiError, apiErrorFromText } from '../../../lib/api-error';
import { uploadSchema, type Upload } from './upload-schema';

export interface UploadPhotoOptions {
  client: ApiClient;
  buildId: string;
  file: File;
  /** Fraction 0…1 of the bytes sent. */
  onProgress(fraction: number): void;
  signal?: AbortSignal;
}

interface RawResult {
  status: number;
  text: string;
}

/** XMLHttpRequest rather than fetch: only XHR reports upload progress in every browser. */
function send(path: string, file: File, headers: Record<string, string>, onProgress: (f: number) => void, signal?: AbortSignal) {
  return new Promise<RawResult>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = false;
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () =>
      reject(new ApiError({ status: 0, code: 'network_error', message: 'The upload was interrupted. Check the connection and try again.' }));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    const body = new FormData();
    body.append('file', file, file.name);
    xhr.send(body);
  });
}

/** `POST /api/builds/:buildId/uploads` with the file in the `file` field; resolves to the stored upload. */
export async function uploadPhoto({ client, buildId, file, onProgress, signal }: UploadPhotoOptions): Promise<Upload> {
  const path = `/api/builds/${encodeURIComponent(buildId)}/uploads`;
  let attempts = 0;
  const result = await client.withAuthorization((headers) => {
    // A retry after a refreshed session starts the bar again.
    if (attempts++ > 0) onProgress(0);
    return send(path, file, headers, onProgress, signal);
  });
  if (result.status < 200 || result.status >= 300) {
    throw apiErrorFromText(result.status, result.text, 'The photo could not be uploaded.');
  }
  const parsed = uploadSchema.safeParse(JSON.parse(result.text));
  if (!parsed.success) {
    throw new ApiError({ status: result.status, code: 'unexpected_response', message: 'The server sent data this version of Linesmith does not understand.' });
  }
  onProgress(1);
  return parsed.data;
}
