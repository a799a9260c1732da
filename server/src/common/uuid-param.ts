import { Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiValidationException } from './api-validation.exception';

// A path id that must be a UUID: anything else is a 400 naming the parameter, never a 500.
export function UuidParam(name = 'id'): ParameterDecorator {
  return Param(
    name,
    new ParseUUIDPipe({
      exceptionFactory: () =>
        new ApiValidationException([
          {
            field: name,
            message: `The ${name} in the address must be a UUID, e.g. 0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c.`,
          },
        ]),
    }),
  );
}
