import { ApiProperty } from '@nestjs/swagger';
import type { CaughtMail } from '@yardcall/shared';

export class CaughtMailDto implements CaughtMail {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ type: [String] })
  to: string[];

  @ApiProperty()
  subject: string;

  @ApiProperty()
  text: string;

  @ApiProperty({ format: 'date-time' })
  receivedAt: string;
}
