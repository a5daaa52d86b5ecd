import { registerDecorator, type ValidationOptions } from 'class-validator';
import { TakenAsIs } from './validate-data';

/**
 * Refuses a JSON field whose serialised form is longer than `maxChars` (free-form JSON is bounded here).
 * The field is free-form, so it is taken as sent (`TakenAsIs`).
 */
export function MaxJsonLength(maxChars: number, options?: ValidationOptions): PropertyDecorator {
  return (target: object, propertyName: string | symbol) => {
    TakenAsIs()(target, propertyName);
    registerDecorator({
      name: 'maxJsonLength',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: `${String(propertyName)} must serialise to at most ${maxChars} characters of JSON`, ...options },
      validator: {
        validate: (value: unknown) => value === undefined || value === null || JSON.stringify(value).length <= maxChars,
      },
    });
  };
}
