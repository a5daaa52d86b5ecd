/** The kinds of file an attachment can hold. */
export const ATTACHMENT_KINDS = ['photo', 'raw-scan'] as const;
export type AttachmentKind = (typeof ATTACHMENT_KINDS)[number];

const MB = 1024 * 1024;

/** Largest photo accepted: tablet camera JPEGs are a few MB (common practice). */
export const PHOTO_MAX_BYTES = 10 * MB;

/** Largest raw instrument file accepted: JCAMP-DX or delimited text exports of one scan stay far below this (common practice). */
export const RAW_SCAN_MAX_BYTES = 20 * MB;

/**
 * Content types accepted per kind. `chemical/x-jcamp-dx` is the customary MIME type of JCAMP-DX
 * (from memory: the chemical MIME convention); text exports come as CSV, TSV or plain text.
 */
export const ATTACHMENT_RULES: Record<AttachmentKind, { maxBytes: number; contentTypes: readonly string[] }> = {
  photo: { maxBytes: PHOTO_MAX_BYTES, contentTypes: ['image/jpeg', 'image/png', 'image/webp'] },
  'raw-scan': {
    maxBytes: RAW_SCAN_MAX_BYTES,
    contentTypes: ['chemical/x-jcamp-dx', 'text/csv', 'text/tab-separated-values', 'text/plain'],
  },
};

/** The media type without parameters, lower-case (`Text/CSV; charset=utf-8` → `text/csv`). */
export function mediaType(contentType: string | undefined): string {
  return (contentType ?? '').split(';')[0].trim().toLowerCase();
}

/** Why this content type is not accepted for the kind, or null. */
export function contentTypeProblem(kind: AttachmentKind, contentType: string): string | null {
  const allowed = ATTACHMENT_RULES[kind].contentTypes;
  return allowed.includes(mediaType(contentType)) ? null : `${kind} attachments must be one of ${allowed.join(', ')}; got "${contentType}"`;
}

/** Why this size is not accepted for the kind, or null. */
export function sizeProblem(kind: AttachmentKind, size: number): string | null {
  const max = ATTACHMENT_RULES[kind].maxBytes;
  return size > max ? `${kind} attachments may have at most ${max} bytes (${max / MB} MB); this one declares ${size}` : null;
}
