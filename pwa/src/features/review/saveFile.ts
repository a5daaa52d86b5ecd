import type { DownloadedFile } from '../api/download';

/** Hands a downloaded file to the browser's own download, under the server's name or the fallback. */
export function saveFile(file: DownloadedFile, fallbackName: string): void {
  const url = URL.createObjectURL(file.blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = file.fileName ?? fallbackName;
  document.body.append(link);
  link.click();
  link.remove();
  // The click has started the download; the object URL is not needed once it has been read.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
