import { applyDecorators } from '@nestjs/common';
import { IsInt, Max, Min } from 'class-validator';

// A durationMs field: whole milliseconds from 0 to the most the thing can last, said in words in the
// message (e.g. 'A voice note', 'an hour').
export function DurationMs(maxMs: number, what: string, most: string): PropertyDecorator {
  return applyDecorators(
    IsInt({ message: 'Send durationMs as a whole number of milliseconds.' }),
    Min(0, { message: 'durationMs cannot be negative.' }),
    Max(maxMs, { message: `${what} lasts at most ${maxMs} ms (${most}).` }),
  );
}
