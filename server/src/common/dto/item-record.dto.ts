import { ApiProperty } from '@nestjs/swagger';

// What every record kept at a checklist item answers with (an answer, a voice note, a photo): its id,
// the client id it was sent under (the same record answers a retry) and the item.
export class ItemRecordDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty()
  clientId: string;

  @ApiProperty()
  itemKey: string;
}
