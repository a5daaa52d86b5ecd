import { describe, expect, it } from 'vitest';
import { PHOTO_CAPTION_MAX_LENGTH, photoCaptionLength, photoCaptionOf, photoCaptionProblem } from './photo-caption.js';

describe('photo captions', () => {
  it('keeps a caption trimmed and turns an empty one into none', () => {
    expect(photoCaptionOf('  Drum label, north wall \n')).toBe('Drum label, north wall');
    expect(photoCaptionOf('   ')).toBeNull();
    expect(photoCaptionOf(undefined)).toBeNull();
  });

  it('refuses a caption over the limit, counting characters rather than UTF-16 units', () => {
    expect(photoCaptionProblem('x'.repeat(PHOTO_CAPTION_MAX_LENGTH))).toBeNull();
    expect(photoCaptionProblem('🧪'.repeat(PHOTO_CAPTION_MAX_LENGTH))).toBeNull();
    expect(photoCaptionProblem('x'.repeat(PHOTO_CAPTION_MAX_LENGTH + 1))).toBe(`caption must be at most ${PHOTO_CAPTION_MAX_LENGTH} characters; this one has ${PHOTO_CAPTION_MAX_LENGTH + 1}`);
    expect(photoCaptionProblem(null)).toBeNull();
    expect(photoCaptionLength('  🧪 drum ')).toBe(6);
  });
});
