import { Transform } from 'class-transformer';

// Multipart forms carry every field as text; JSON bodies carry real numbers and booleans. These accept
// both and leave anything else untouched, so the validators that follow name the bad value.

/** `"785"` → 785 for a multipart field; other values pass through to the validators. */
export const FormNumber = (): PropertyDecorator =>
  Transform(({ value }) => (typeof value === 'string' && value.trim() !== '' && Number.isFinite(Number(value)) ? Number(value) : value));

/** `"true"` / `"false"` → a boolean for a multipart field; other values pass through to the validators. */
export const FormBoolean = (): PropertyDecorator =>
  Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value));
