import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import type { PhotoResponse, PhotoUpload, VoiceNoteResponse, VoiceNoteUpload } from '@yardcall/shared';
import { Type } from 'class-transformer';
import { IsNotEmpty, IsOptional, IsString, Matches, MaxLength } from 'class-validator';
import { DurationMs } from '../../common/dto/duration-ms.decorator';
import { ItemRecordDto } from '../../common/dto/item-record.dto';

// The same bound as the column and as the inspections' own client ids.
const CLIENT_ID_MAX = 64;
const ITEM_KEY_MAX = 160;
// An hour: far past any note a driver records at one item; stops nonsense numbers.
const DURATION_MAX_MS = 60 * 60 * 1000;

// The text fields that come with a photo, as multipart/form-data.
export class PhotoUploadDto implements PhotoUpload {
  @ApiProperty({ description: 'The checklist item the file is about.', example: 'u0.axle0.left.tire.tread' })
  @IsString({ message: 'Send the item key as text.' })
  @IsNotEmpty({ message: 'Send the key of the checklist item (itemKey) the file is about.' })
  @MaxLength(ITEM_KEY_MAX, { message: `An item key has at most ${ITEM_KEY_MAX} characters.` })
  itemKey: string;

  @ApiProperty({ description: 'Made by the client: the same upload sent again returns the same record.' })
  @IsString({ message: 'Send the client id as text.' })
  @IsNotEmpty({ message: 'Send a client id.' })
  @MaxLength(CLIENT_ID_MAX, { message: `A client id has at most ${CLIENT_ID_MAX} characters.` })
  @Matches(/^[A-Za-z0-9_-]+$/, { message: 'A client id uses only letters, digits, hyphens and underscores.' })
  clientId: string;
}

// The text fields that come with a voice note, as multipart/form-data.
export class VoiceNoteUploadDto extends PhotoUploadDto implements VoiceNoteUpload {
  @ApiProperty({ description: 'Length of the recording in milliseconds.', example: 4200 })
  @Type(() => Number)
  @DurationMs(DURATION_MAX_MS, 'A voice note', 'an hour')
  durationMs: number;

  @ApiPropertyOptional({ description: 'What the speech engine heard while recording.' })
  @IsOptional()
  @IsString({ message: 'Send what was heard as text.' })
  @MaxLength(2000, { message: 'Keep what was heard under 2000 characters.' })
  heard?: string;
}

export class VoiceNoteResponseDto extends ItemRecordDto implements VoiceNoteResponse {
  @ApiProperty({ type: String, nullable: true })
  heard: string | null;

  @ApiProperty()
  durationMs: number;

  @ApiProperty({ example: 'audio/webm', description: 'Found from the content, not taken from the client.' })
  mimeType: string;

  @ApiProperty()
  sizeBytes: number;

  @ApiProperty({ description: 'SHA-256 of the stored bytes, hex.' })
  sha256: string;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ example: '/api/notes/0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c/audio' })
  audioUrl: string;
}

export class PhotoResponseDto extends ItemRecordDto implements PhotoResponse {
  @ApiProperty({ example: 'image/jpeg' })
  mimeType: string;

  @ApiProperty()
  sizeBytes: number;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ example: '/api/photos/0b6f3c1e-4a5d-4f7e-9c2b-8d1e2f3a4b5c' })
  url: string;
}
