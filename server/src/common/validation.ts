import { ValidationPipe, type ValidationError } from '@nestjs/common';
import type { FieldProblem } from '@yardcall/shared';
import { ApiValidationException } from './api-validation.exception';

// Flattens class-validator's tree into dotted paths, e.g. "config.axles.0.brake".
export function flattenValidationErrors(errors: ValidationError[], parent = ''): FieldProblem[] {
  const problems: FieldProblem[] = [];
  for (const error of errors) {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const constraints = error.constraints ?? {};
    if ('whitelistValidation' in constraints) {
      problems.push({ field, message: 'This field is not allowed here: remove it.' });
    } else {
      // One message per field. Decorators apply bottom-up, so the last entry is the one written first
      // in the DTO: the basic type check, which is the one to fix first.
      const messages = Object.values(constraints);
      const first = messages[messages.length - 1];
      if (first) problems.push({ field, message: first });
    }
    if (error.children?.length) problems.push(...flattenValidationErrors(error.children, field));
  }
  return problems;
}

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    validationError: { target: false, value: false },
    exceptionFactory: (errors) => new ApiValidationException(flattenValidationErrors(errors)),
  });
}
