import { ApiProperty } from '@nestjs/swagger';
import { READING_RULES, type OrganizationSummary, type ReadingRule } from '@yardcall/shared';

export class OrganizationSummaryDto implements OrganizationSummary {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Kestrel Valley Freight' })
  name: string;

  @ApiProperty({
    enum: READING_RULES,
    isArray: true,
    description: 'Readings every walk-around must take; empty: none.',
  })
  requiredReadings: ReadingRule[];
}
