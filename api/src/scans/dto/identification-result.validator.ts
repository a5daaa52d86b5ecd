import { registerDecorator, type ValidationOptions } from 'class-validator';

/** Why a tablet identification result is not acceptable, or null when it is. */
export function identificationResultProblem(value: unknown): string | null {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return 'must be an object';
  const result = value as Record<string, unknown>;
  // Without these the result cannot be reproduced or compared with a server recomputation later.
  if (typeof result.codeVersion !== 'string' || result.codeVersion === '') return 'needs codeVersion (the shared code version that computed it)';
  if (!isLibraryVersion(result.libraryVersion)) {
    return 'needs libraryVersion (the compound library version used: a string, or the shared result\'s { version, contentHash })';
  }
  if (result.parameters === null || typeof result.parameters !== 'object' || Array.isArray(result.parameters)) {
    return 'needs parameters (the processing parameters, as an object)';
  }
  return null;
}

/** A non-empty version string, or the shared identification's library record with a non-empty `version`. */
function isLibraryVersion(value: unknown): boolean {
  if (typeof value === 'string') return value !== '';
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return false;
  const version = (value as Record<string, unknown>).version;
  return typeof version === 'string' && version !== '';
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
