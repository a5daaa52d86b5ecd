import type { ApiClient } from './client';
import { ApiError } from './apiError';

/** A file the API sent: its bytes and the name the server gave it (Content-Disposition), if any. */
export interface DownloadedFile {
  blob: Blob;
  fileName: string | null;
}

/** A GET of a file (CSV, PDF, JCAMP-DX, a raw scan) through the client's token handling; errors as ApiError. */
export async function downloadFile(client: ApiClient, path: string, signal?: AbortSignal): Promise<DownloadedFile> {
  let response: Response;
  try {
    response = await client.authorizedFetch(path, { headers: { Accept: '*/*' }, signal });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw ApiError.network(path, cause);
  }
  if (!response.ok) throw await ApiError.fromResponse(response);
  return { blob: await response.blob(), fileName: fileNameOf(response.headers.get('Content-Disposition')) };
}

/** The file name of a Content-Disposition header (RFC 6266, from memory: filename* first, then filename). */
export function fileNameOf(disposition: string | null): string | null {
  if (!disposition) return null;
  const extended = /filename\*\s*=\s*[^']*'[^']*'([^;]+)/i.exec(disposition);
  if (extended) {
    try {
      return decodeURIComponent(extended[1].trim());
    } catch {
      // A malformed encoding falls back to the plain name.
    }
  }
  const plain = /filename\s*=\s*("([^"]*)"|[^;]+)/i.exec(disposition);
  return plain ? (plain[2] ?? plain[1]).trim() : null;
}
