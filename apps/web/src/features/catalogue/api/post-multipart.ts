import type { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { ApiError, apiErrorFromText } from '../../../lib/api-error';

export interface PostMultipartOptions<T> {
  client: ApiClient;
  path: string;
  fields: Record<string, string | Blob>;
  schema: z.ZodType<T>;
  /** Fraction 0…1 of the bytes sent. */
  onProgress?(fraction: number): void;
  fallbackMessage: string;
}

interface RawResult {
  status: number;
  text: string;
}

/** XMLHttpRequest rather than fetch: only XHR reports upload progress in every browser. */
function send(
  path: string,
  fields: Record<string, string | Blob>,
  headers: Record<string, string>,
  onProgress?: (f: number) => void,
) {
  return new Promise<RawResult>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    for (const [name, value] of Object.entries(headers)) xhr.setRequestHeader(name, value);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () =>
      reject(new ApiError({ status: 0, code: 'network_error', message: 'The upload was interrupted. Check the connection and try again.' }));
    const body = new FormData();
    for (const [name, value] of Object.entries(fields)) {
      if (typeof value === 'string') body.append(name, value);
      else body.append(name, value, value instanceof File ? value.name : name);
    }
    xhr.send(body);
  });
}

/** A multipart POST with the session's authorization (the client refreshes it once on a 401), parsed with `schema`. */
export async function postMultipart<T>({ client, path, fields, schema, onProgress, fallbackMessage }: PostMultipartOptions<T>): Promise<T> {
  let attempts = 0;
  const result = await client.withAuthorization((headers) => {
    // A retry after a refreshed session starts the bar again.
    if (attempts++ > 0) onProgress?.(0);
    return send(path, fields, headers, onProgress);
  });
  if (result.status < 200 || result.status >= 300) throw apiErrorFromText(result.status, result.text, fallbackMessage);
  let raw: unknown;
  try {
    raw = result.text ? JSON.parse(result.text) : undefined;
  } catch {
    raw = undefined;
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    throw new ApiError({ status: result.status, code: 'unexpected_response', message: 'The server sent data this version of Linesmith does not understand.' });
  }
  onProgress?.(1);
  return parsed.data;
}
