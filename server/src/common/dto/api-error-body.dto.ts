import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { ApiErrorBody, FieldProblem } from '@yardcall/shared';

export class FieldProblemDto implements FieldProblem {
  @ApiProperty({ example: 'config.axles.0.brake' })
  field: string;

  @ApiProperty({ example: 'Choose a brake type: air_drum, air_disc, hydraulic.' })
  message: string;
}

export class ApiErrorBodyDto implements ApiErrorBody {
  @ApiProperty({ example: 400 })
  statusCode: number;

  @ApiProperty({ example: 'Bad Request' })
  error: string;

  @ApiProperty({ example: 'Check config.axles.0.brake: Choose a brake type: air_drum, air_disc, hydraulic.' })
  message: string;

  @ApiPropertyOptional({ type: [FieldProblemDto] })
  fields?: FieldProblemDto[];
}
