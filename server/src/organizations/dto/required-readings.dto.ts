import { ApiProperty } from '@nestjs/swagger';
import { READING_RULES, type ReadingRule, type UpdateRequiredReadingsRequest } from '@yardcall/shared';
import { ArrayMaxSize, IsArray, IsString } from 'class-validator';

// Each rule at most once, with room for a client that repeats one; the service names any unknown rule.
const RULES_SENT_MAX = READING_RULES.length * 2;

export class UpdateRequiredReadingsDto implements UpdateRequiredReadingsRequest {
  @ApiProperty({ enum: READING_RULES, isArray: true, example: ['steer_tread_depth'], description: 'Empty: none.' })
  @IsArray({ message: `Send requiredReadings as a list, empty for none; each one of: ${READING_RULES.join(', ')}.` })
  @ArrayMaxSize(RULES_SENT_MAX, { message: `Send each required reading once; there are ${READING_RULES.length}.` })
  @IsString({ each: true, message: `Each required reading is one of: ${READING_RULES.join(', ')}.` })
  requiredReadings: ReadingRule[];
}
