/** The photo types the server takes (api/src/attachments/attachment-limits.ts), and its size limit. */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
