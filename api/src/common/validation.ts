import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import type { FieldErrorDto } from './error-response.dto';

/** Flattens class-validator's nested errors into one entry per field path. */
export function toFieldErrors(errors: ValidationError[], parentPath = ''): FieldErrorDto[] {
  const fields: FieldErrorDto[] = [];
  for (const error of errors) {
    const field = parentPath ? `${parentPath}.${error.property}` : error.property;
    const messages = Object.values(error.constraints ?? {});
    if (messages.length) fields.push({ field, messages });
    if (error.children?.length) fields.push(...toFieldErrors(error.children, field));
  }
  return fields;
}

/**
 * The global pipe: unknown fields are refused (400 naming them), known ones are validated and
 * converted to their DTO class.
 */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors: ValidationError[]) => {
      const details = toFieldErrors(errors);
      const summary = details.flatMap((detail) => detail.messages).join('; ');
      return new BadRequestException({ message: `Validation failed: ${summary}`, details });
    },
  });
}
