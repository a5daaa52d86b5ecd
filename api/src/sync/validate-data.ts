import { Exclude, plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { toFieldErrors } from '../common/validation';

/** Either the validated instance or one readable sentence listing every problem. */
export type Validated<T> = { ok: true; value: T } | { ok: false; problems: string };

/** The `TakenAsIs` properties of each class. */
const TAKEN_AS_IS = new WeakMap<object, string[]>();

/**
 * A property `validateData` hands over as sent, not copied member by member into the instance: free-form
 * JSON validated as a whole (a scan's result) or later on its own (a change's `data`). Its validators
 * still run on it.
 */
export function TakenAsIs(): PropertyDecorator {
  return (target: object, property: string | symbol) => {
    Exclude({ toClassOnly: true })(target, property);
    TAKEN_AS_IS.set(target.constructor, [...(TAKEN_AS_IS.get(target.constructor) ?? []), String(property)]);
  };
}

/** The `TakenAsIs` properties of a class and of the classes it extends. */
function takenAsIs(cls: object): string[] {
  const names: string[] = [];
  for (let c: object | null = cls; c && c !== Function.prototype; c = Object.getPrototypeOf(c)) names.push(...(TAKEN_AS_IS.get(c) ?? []));
  return names;
}

/**
 * Validates a plain object against a class-validator class with the same rules as the global pipe
 * (unknown fields refused), but returns the problems instead of throwing, so one bad record in a batch
 * is rejected alone.
 */
export function validateData<T extends object>(cls: new () => T, plain: unknown): Validated<T> {
  if (plain === null || typeof plain !== 'object' || Array.isArray(plain)) return { ok: false, problems: 'must be an object' };
  const value = plainToInstance(cls, plain);
  const record = plain as Record<string, unknown>;
  for (const name of takenAsIs(cls)) if (Object.hasOwn(record, name)) (value as Record<string, unknown>)[name] = record[name];
  const errors = validateSync(value, { whitelist: true, forbidNonWhitelisted: true });
  if (errors.length === 0) return { ok: true, value };
  const problems = toFieldErrors(errors)
    // class-validator names the property in its messages; nested ones also need their parent path.
    .flatMap((field) => field.messages.map((message) => (field.field.includes('.') ? `${field.field}: ${message}` : message)))
    .join('; ');
  return { ok: false, problems };
}
