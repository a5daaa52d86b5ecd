/** Longest edge of a stored photo, px: enough to read a label or a seal number, small to sync (common practice). */
export const MAX_EDGE_PX = 1600;
const JPEG_QUALITY = 0.85;

/** The size a photo is drawn at so its longer edge is at most `maxEdge`. */
export function fitWithin(width: number, height: number, maxEdge = MAX_EDGE_PX): { width: number; height: number } {
  if (!(width > 0 && height > 0)) throw new RangeError(`A photo needs a positive size, got ${width}×${height}`);
  const scale = Math.min(1, maxEdge / Math.max(width, height));
  return { width: Math.round(width * scale), height: Math.round(height * scale) };
}

/**
 * Redraws a camera photo as a JPEG no larger than MAX_EDGE_PX on its longer edge (canvas in the
 * browser; the decoder honours the EXIF orientation). Throws when the file is not a readable image.
 */
export async function compressPhoto(file: Blob): Promise<ArrayBuffer> {
  const bitmap = await createImageBitmap(file);
  try {
    const size = fitWithin(bitmap.width, bitmap.height);
    const canvas = new OffscreenCanvas(size.width, size.height);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('This browser cannot draw photos');
    context.drawImage(bitmap, 0, 0, size.width, size.height);
    const blob = await canvas.convertToBlob({ type: 'image/jpeg', quality: JPEG_QUALITY });
    return await blob.arrayBuffer();
  } finally {
    bitmap.close();
  }
}
