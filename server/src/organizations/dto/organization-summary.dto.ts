import { ApiProperty } from '@nestjs/swagger';
import type { OrganizationSummary } from '@yardcall/shared';

export class OrganizationSummaryDto implements OrganizationSummary {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'Kestrel Valley Freight' })
  name: string;
}
