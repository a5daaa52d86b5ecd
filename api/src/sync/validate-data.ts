import { plainToInstance, Transform, Type } from 'class-transformer';
import { validateSync } from 'class-validator';
import { toFieldErrors } from '../common/validation';

/** Either the validated instance or one readable sentence listing every problem. */
export type Validated<T> = { ok: true; value: T } | { ok: false; problems: string };

/**
 * A property class-transformer hands over as sent, not copied member by member into the instance (by
 * `validateData` and the global pipe alike): free-form JSON validated as a whole (a scan's result), or
 * later on its own (a change's `data`, a batch's changes). Its validators still run on it. Taken as a
 * string, which costs nothing, then replaced by the value sent.
 */
export function TakenAsIs(): PropertyDecorator {
  return (target: object, property: string | symbol) => {
    Type(() => String)(target, property);
    Transform(({ obj, key }: { obj: Record<string, unknown>; key: string }) => obj[key], { toClassOnly: true })(target, property);
  };
}

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
