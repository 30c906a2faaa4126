import type { ApiClient } from '../../../lib/api-client';

/**
 * Downloads a file that needs the bearer token (so no plain link) through the shared client,
 * which refreshes the session once on a 401; saved through an object URL and a temporary
 * `<a download>`. Resolves to the name it was saved under: the server's, else the fallback.
 */
export async function downloadFile(client: ApiClient, path: string, fallbackName: string): Promise<string> {
  const { blob, fileName } = await client.requestFile(path);
  const name = fileName ?? fallbackName;
  const url = URL.createObjectURL(blob);
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
