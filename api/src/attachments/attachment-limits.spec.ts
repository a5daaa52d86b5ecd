import { contentTypeProblem, mediaType, PHOTO_MAX_BYTES, RAW_SCAN_MAX_BYTES, sizeProblem } from './attachment-limits';

describe('attachment limits', () => {
  it('compares media types without parameters or case', () => {
    expect(mediaType('Text/CSV; charset=utf-8')).toBe('text/csv');
    expect(mediaType(undefined)).toBe('');
    expect(contentTypeProblem('raw-scan', 'text/csv; charset=utf-8')).toBeNull();
    expect(contentTypeProblem('photo', 'IMAGE/WEBP')).toBeNull();
  });

  it('keeps photos and raw scans to their own types', () => {
    expect(contentTypeProblem('photo', 'text/csv')).toBe('photo attachments must be one of image/jpeg, image/png, image/webp; got "text/csv"');
    expect(contentTypeProblem('raw-scan', 'image/jpeg')).toMatch(/^raw-scan attachments must be one of chemical\/x-jcamp-dx, text\/csv/);
  });

  it('accepts files up to the limit of their kind and names the limit beyond it', () => {
    expect(sizeProblem('photo', PHOTO_MAX_BYTES)).toBeNull();
    expect(sizeProblem('photo', PHOTO_MAX_BYTES + 1)).toBe(`photo attachments may have at most ${PHOTO_MAX_BYTES} bytes (10 MB); this one declares ${PHOTO_MAX_BYTES + 1}`);
    expect(sizeProblem('raw-scan', PHOTO_MAX_BYTES + 1)).toBeNull();
    expect(sizeProblem('raw-scan', RAW_SCAN_MAX_BYTES + 1)).toMatch(/at most 20971520 bytes \(20 MB\)/);
  });
});
