import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { SIGNATURE_ROLES, type SignatureInput, type SignatureResponse, type SignatureRole } from '@yardcall/shared';
import { Transform } from 'class-transformer';
import { IsNotEmpty, IsOptional, IsString, MaxLength } from 'class-validator';
import { PersonRefDto } from './person-ref.dto';

function trimmed({ value }: { value: unknown }): unknown {
  return typeof value === 'string' ? value.trim() : value;
}

// A drawn signature as an SVG path is a few KB; a PNG data URL of a phone-sized pad stays well under this.
export const DRAWING_MAX_CHARS = 200_000;

export class SignatureInputDto implements SignatureInput {
  @ApiProperty({ example: 'Dana Okafor', description: 'The name as the signer types it.' })
  @Transform(trimmed)
  @IsString({ message: 'Type your name as text.' })
  @IsNotEmpty({ message: 'Type your name to sign.' })
  @MaxLength(120, { message: 'Keep the name under 120 characters.' })
  name: string;

  @ApiPropertyOptional({ description: 'The drawn signature as an SVG path or a PNG data URL.' })
  @IsOptional()
  @IsString({ message: 'Send the drawing as text (an SVG path or a PNG data URL).' })
  @MaxLength(DRAWING_MAX_CHARS, { message: `Keep the drawing under ${DRAWING_MAX_CHARS} characters.` })
  drawing?: string;
}

export class SignatureResponseDto implements SignatureResponse {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ enum: SIGNATURE_ROLES })
  role: SignatureRole;

  @ApiProperty({ type: PersonRefDto })
  signer: PersonRefDto;

  @ApiProperty()
  name: string;

  @ApiProperty({ description: 'What the signer certified, in the inspection’s language.' })
  statement: string;

  @ApiProperty({ format: 'date-time' })
  signedAt: string;

  @ApiProperty()
  hasDrawing: boolean;
}
