import { BadRequestException, HttpException, PayloadTooLargeException } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { json, urlencoded } from 'express';
import type { IncomingMessage } from 'node:http';
import { jsonNestingDepth } from './input-checks';

// The deepest JSON any route takes is a vehicle (body, config, axles, an axle, its chamber: 4 levels);
// 32 leaves room and stops bodies that are nothing but nesting before they are parsed.
export const JSON_DEPTH_MAX = 32;

// Sized to the API's own largest request: a batch of 500 answers (RESULTS_BATCH_MAX) with every text
// at its longest (item key 160, client id 64, detail 2,000, heard 2,000 and unit 16 characters; up to
// 3 bytes each in UTF-8: 12,720 bytes) plus the field names, times and numbers (under 500 bytes):
// 500 × 13,220 = 6.6 MB. A signed report with a 200,000-character drawing is far below that.
export const BODY_LIMIT_BYTES = 7 * 1024 * 1024;

export function bodyLimitText(): string {
  return `${BODY_LIMIT_BYTES / (1024 * 1024)} MB (${BODY_LIMIT_BYTES} bytes)`;
}

export function tooLargeMessage(): string {
  return `The request body is larger than ${bodyLimitText()}, the most this API accepts: send fewer results at a time.`;
}

interface ParserError extends Error {
  type?: string;
  status?: number;
}

// body-parser's own errors carry a `type`; these name the limit or the problem in words.
export function toParserHttpError(error: ParserError): HttpException | undefined {
  switch (error.type) {
    case 'entity.too.large':
      return new PayloadTooLargeException(tooLargeMessage());
    case 'entity.parse.failed':
      return new BadRequestException(
        `The body is not valid JSON (${error.message}): check the quotes, commas and brackets.`,
      );
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new BadRequestException('Send the body as UTF-8 JSON.');
    case 'request.aborted':
    case 'request.size.invalid':
      return new BadRequestException('The body ended before its stated length: send it again.');
    case undefined:
    default:
      return undefined;
  }
}

function refuseDeepJson(_req: IncomingMessage, _res: unknown, body: Buffer): void {
  if (jsonNestingDepth(body, JSON_DEPTH_MAX) > JSON_DEPTH_MAX) {
    throw Object.assign(
      new Error(
        `The JSON body is nested more than ${JSON_DEPTH_MAX} levels deep, the most this API accepts: send a flatter body.`,
      ),
      { status: 400, type: 'entity.too.deep' },
    );
  }
}

// Replaces Nest's default parsers (100 KB, no depth limit): Nest adds its own only when no parser of
// the same name (jsonParser, urlencodedParser) is there. Express's own factories, because Nest's
// useBodyParser reserves `verify`. body-parser 2 limits urlencoded nesting to 32 by itself.
export function configureBodyParsers(app: NestExpressApplication): void {
  app.use(json({ limit: BODY_LIMIT_BYTES, verify: refuseDeepJson }));
  app.use(urlencoded({ limit: BODY_LIMIT_BYTES, extended: true }));
}
