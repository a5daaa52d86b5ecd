/** The longest caption a photo takes, in characters (the API's column and check, the tablet's field). */
export const PHOTO_CAPTION_MAX_LENGTH = 500;

/** A caption as it is kept: trimmed, and null when nothing is left. */
export function photoCaptionOf(text: string | null | undefined): string | null {
  const trimmed = (text ?? '').trim();
  return trimmed === '' ? null : trimmed;
}

/** How many characters a caption keeps, counted as code points, as MariaDB counts them. */
export function photoCaptionLength(text: string | null | undefined): number {
  return [...(photoCaptionOf(text) ?? '')].length;
}

/** Why a caption cannot be kept, or null. */
export function photoCaptionProblem(caption: string | null): string | null {
  const length = photoCaptionLength(caption);
  return length > PHOTO_CAPTION_MAX_LENGTH ? `caption must be at most ${PHOTO_CAPTION_MAX_LENGTH} characters; this one has ${length}` : null;
}
