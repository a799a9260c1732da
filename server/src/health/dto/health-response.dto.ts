import { ApiProperty } from '@nestjs/swagger';
import type { HealthResponse } from '@yardcall/shared';

export class HealthResponseDto implements HealthResponse {
  @ApiProperty({ enum: ['ok', 'error'] })
  status: 'ok' | 'error';

  @ApiProperty({ enum: ['up', 'down'] })
  database: 'up' | 'down';
}
