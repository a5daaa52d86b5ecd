import { registerDecorator, type ValidationOptions } from 'class-validator';
import { passwordPolicyProblem } from '@siteband/shared';

/** Validates a new password against the one password policy. */
export function IsPassword(options?: ValidationOptions): PropertyDecorator {
  return (target: object, propertyName: string | symbol) => {
    registerDecorator({
      name: 'isPassword',
      target: target.constructor,
      propertyName: propertyName as string,
      options,
      validator: {
        validate: (value: unknown) => typeof value === 'string' && passwordPolicyProblem(value) === null,
        defaultMessage: (args) =>
          typeof args?.value === 'string' ? (passwordPolicyProblem(args.value) ?? 'password is invalid') : 'password must be a string',
      },
    });
  };
}
