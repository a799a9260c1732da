import { BadRequestException } from '@nestjs/common';
import type { FieldProblem } from '@yardcall/shared';

// A 400 that names each field and what is wrong with it; the filter renders it as ApiErrorBody.fields.
export class ApiValidationException extends BadRequestException {
  constructor(
    readonly fields: FieldProblem[],
    message = fields.length === 1
      ? `Check ${fields[0]?.field}: ${fields[0]?.message}`
      : `Check these ${fields.length} fields: ${fields.map((f) => f.field).join(', ')}.`,
  ) {
    super(message);
  }
}
