import { ValidationPipe, type ArgumentMetadata, type ValidationError } from '@nestjs/common';
import type { FieldProblem } from '@yardcall/shared';
import type { ValidatorOptions } from 'class-validator';
import { ApiValidationException } from './api-validation.exception';
import { findForbiddenNulls, findUnsafeText } from './input-checks';

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

// The class-validator pipe with two checks of its own: text PostgreSQL cannot store (NUL, unpaired
// surrogates) in any body, query or path value, and null where the contract has none.
export class ApiValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type !== 'custom') {
      const problems = findUnsafeText(value, metadata.data ?? '');
      if (problems.length > 0) throw new ApiValidationException(problems);
    }
    return super.transform(value, metadata);
  }

  protected override async validate(object: object, validatorOptions?: ValidatorOptions): Promise<ValidationError[]> {
    const nulls = findForbiddenNulls(object);
    if (nulls.length > 0) throw new ApiValidationException(nulls);
    return super.validate(object, validatorOptions);
  }
}

export function createValidationPipe(): ValidationPipe {
  return new ApiValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    validationError: { target: false, value: false },
    exceptionFactory: (errors) => new ApiValidationException(flattenValidationErrors(errors)),
  });
}
