import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { toFieldErrors } from '../common/validation';

/** Either the validated instance or one readable sentence listing every problem. */
export type Validated<T> = { ok: true; value: T } | { ok: false; problems: string };

/**
 * Validates a plain object against a class-validator class with the same rules as the global pipe
 * (unknown fields refused), but returns the problems instead of throwing, so one bad record in a batch
 * is rejected alone.
 */
export function validateData<T extends object>(cls: new () => T, plain: unknown): Validated<T> {
  if (plain === null || typeof plain !== 'object' || Array.isArray(plain)) return { ok: false, problems: 'must be an object' };
  const value = plainToInstance(cls, plain);
  const errors = validateSync(value, { whitelist: true, forbidNonWhitelisted: true });
  if (errors.length === 0) return { ok: true, value };
  const problems = toFieldErrors(errors)
    // class-validator names the property in its messages; nested ones also need their parent path.
    .flatMap((field) => field.messages.map((message) => (field.field.includes('.') ? `${field.field}: ${message}` : message)))
    .join('; ');
  return { ok: false, problems };
}
