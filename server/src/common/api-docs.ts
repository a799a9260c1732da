import { applyDecorators, Controller, HttpStatus } from '@nestjs/common';
import { ApiBearerAuth, ApiResponse, ApiTags } from '@nestjs/swagger';
import { ApiErrorBodyDto } from './dto/api-error-body.dto';

// A controller of signed-in routes: its route prefix, the tag it is listed under in the API document
// (the prefix unless said otherwise) and the bearer token every route takes.
export function SignedInController(prefix: string, tag = prefix): ClassDecorator {
  return applyDecorators(ApiTags(tag), ApiBearerAuth(), Controller(prefix));
}

const ERROR_STATUS = {
  badRequest: HttpStatus.BAD_REQUEST,
  unauthorized: HttpStatus.UNAUTHORIZED,
  forbidden: HttpStatus.FORBIDDEN,
  notFound: HttpStatus.NOT_FOUND,
  conflict: HttpStatus.CONFLICT,
  gone: HttpStatus.GONE,
  payloadTooLarge: HttpStatus.PAYLOAD_TOO_LARGE,
  rangeNotSatisfiable: HttpStatus.REQUESTED_RANGE_NOT_SATISFIABLE,
  tooManyRequests: HttpStatus.TOO_MANY_REQUESTS,
} as const;

// The error answers a route can give: true documents the answer alone, a text says when it comes.
export type ErrorAnswers = Partial<Record<keyof typeof ERROR_STATUS, true | string>>;

// Every error answer of a route in one line, each with the API's error body.
export function ApiErrors(answers: ErrorAnswers): MethodDecorator {
  return applyDecorators(
    ...Object.entries(answers).map(([answer, description]) =>
      ApiResponse({
        status: ERROR_STATUS[answer as keyof ErrorAnswers],
        type: ApiErrorBodyDto,
        ...(typeof description === 'string' ? { description } : {}),
      }),
    ),
  );
}
