import type { ApiClient } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { apiErrorFrom, bearerToken, renewToken } from '../../builds/api/authorized-request';

async function fetchWithToken(path: string, token: string | null): Promise<Response> {
  try {
    return await globalThis.fetch(path, { headers: token ? { Authorization: `Bearer ${token}` } : {}, credentials: 'same-origin' });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'Linesmith could not reach the server. Check the connection and try again.' });
  }
}

/** The name the server gave the file (`Content-Disposition: attachment; filename="…"`), else the fallback. */
export function fileNameOf(response: Response, fallback: string): string {
  const header = response.headers.get('Content-Disposition') ?? '';
  const encoded = /filename\*=UTF-8''([^;]+)/i.exec(header);
  if (encoded) return decodeURIComponent(encoded[1]);
  const plain = /filename="?([^";]+)"?/i.exec(header);
  return plain ? plain[1] : fallback;
}

/**
 * Downloads a file that needs the bearer token (so no plain link): fetched as a blob, then
 * saved through an object URL and a temporary `<a download>`.
 */
export async function downloadFile(client: ApiClient, path: string, fallbackName: string): Promise<string> {
  let response = await fetchWithToken(path, bearerToken(client));
  if (response.status === 401 && (await renewToken(client))) response = await fetchWithToken(path, bearerToken(client));
  if (!response.ok) throw apiErrorFrom(response.status, await response.text(), 'The file could not be downloaded.');
  const name = fileNameOf(response, fallbackName);
  const url = URL.createObjectURL(await response.blob());
  try {
    const link = document.createElement('a');
    link.href = url;
    link.download = name;
    link.style.display = 'none';
    document.body.append(link);
    link.click();
    link.remove();
  } finally {
    // Revoked on the next tick: the click has handed the blob to the browser's download by then.
    setTimeout(() => URL.revokeObjectURL(url), 0);
  }
  return name;
}
