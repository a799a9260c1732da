import { Catch, HttpException, Logger, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { ApiErrorBody } from '@yardcall/shared';
import type { Response } from 'express';
import { ApiValidationException } from './api-validation.exception';
import { isForeignKeyViolation, isInvalidTextRepresentation, isUniqueViolation } from './database-errors';
import { toParserHttpError } from './request-limits';

const REASONS: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  405: 'Method Not Allowed',
  409: 'Conflict',
  410: 'Gone',
  413: 'Payload Too Large',
  415: 'Unsupported Media Type',
  416: 'Range Not Satisfiable',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
  502: 'Bad Gateway',
  503: 'Service Unavailable',
};

function reason(status: number): string {
  return REASONS[status] ?? (status >= 500 ? 'Server Error' : 'Error');
}

function asSentence(text: string): string {
  const trimmed = text.trim();
  if (!trimmed) return trimmed;
  const capital = trimmed[0]?.toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

// Nest's own exceptions carry a string, an array of strings or an object with `message`.
function messageOf(exception: HttpException): string {
  const response = exception.getResponse();
  if (typeof response === 'string') return asSentence(response);
  const message = (response as { message?: unknown }).message;
  if (typeof message === 'string') return asSentence(message);
  if (Array.isArray(message)) return message.map((m) => asSentence(String(m))).join(' ');
  return asSentence(exception.message);
}

export function toApiErrorBody(thrown: unknown, logger: Logger): ApiErrorBody {
  // Nest wraps body-parser's errors (too large, bad JSON) with their status; say them in our words.
  const exception =
    (thrown instanceof HttpException && thrown.cause instanceof Error && toParserHttpError(thrown.cause)) || thrown;
  if (exception instanceof ApiValidationException) {
    return { statusCode: 400, error: reason(400), message: asSentence(exception.message), fields: exception.fields };
  }
  if (exception instanceof HttpException) {
    const statusCode = exception.getStatus();
    // Errors thrown by Express middleware (e.g. a malformed JSON body) arrive wrapped with a status too.
    return { statusCode, error: reason(statusCode), message: messageOf(exception) };
  }
  if (isUniqueViolation(exception)) {
    return {
      statusCode: 409,
      error: reason(409),
      message: 'This record already exists: change the value that must be unique.',
    };
  }
  if (isForeignKeyViolation(exception)) {
    return {
      statusCode: 409,
      error: reason(409),
      message: 'This record refers to something that does not exist, or is still in use.',
    };
  }
  if (isInvalidTextRepresentation(exception)) {
    return { statusCode: 400, error: reason(400), message: 'A value in the request has the wrong format.' };
  }
  logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
  return {
    statusCode: 500,
    error: reason(500),
    message: 'Something went wrong on our side. Try again; if it keeps happening, tell your administrator.',
  };
}

// Every error leaves the API as ApiErrorBody; unexpected ones are logged and answered with a generic sentence.
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('ApiExceptionFilter');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = toApiErrorBody(exception, this.logger);
    if (exception instanceof HttpException) {
      const retryAfter = (exception.getResponse() as { retryAfterSeconds?: unknown }).retryAfterSeconds;
      if (typeof retryAfter === 'number') response.setHeader('Retry-After', String(retryAfter));
    }
    response.status(body.statusCode).json(body);
  }
}
