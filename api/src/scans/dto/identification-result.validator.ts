import { registerDecorator, type ValidationOptions } from 'class-validator';

/** Why a tablet identification result is not acceptable, or null when it is. */
export function identificationResultProblem(value: unknown): string | null {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return 'must be an object';
  const result = value as Record<string, unknown>;
  // Without these the result cannot be reproduced or compared with a server recomputation later.
  if (typeof result.codeVersion !== 'string' || result.codeVersion === '') return 'needs codeVersion (the shared code version that computed it)';
  if (typeof result.libraryVersion !== 'string' || result.libraryVersion === '') return 'needs libraryVersion (the compound library version used)';
  if (result.parameters === null || typeof result.parameters !== 'object' || Array.isArray(result.parameters)) {
    return 'needs parameters (the processing parameters, as an object)';
  }
  return null;
}

/** Checks a scan's `result`: an object carrying its code version, library version and processing parameters. */
export function IsIdentificationResult(options?: ValidationOptions): PropertyDecorator {
  return (target: object, propertyName: string | symbol) => {
    registerDecorator({
      name: 'isIdentificationResult',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: (args) => `${args.property} ${identificationResultProblem(args.value)}`, ...options },
      validator: { validate: (value: unknown) => value === undefined || value === null || identificationResultProblem(value) === null },
    });
  };
}
