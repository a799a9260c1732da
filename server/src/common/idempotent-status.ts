import { HttpStatus } from '@nestjs/common';
import type { Response } from 'express';

// An idempotent create: 201 when this call stored it, 200 when the same client id had stored it already.
export function answerIdempotentCreate(response: Response, created: boolean): void {
  response.status(created ? HttpStatus.CREATED : HttpStatus.OK);
}
