import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  LOCALES,
  TEXT_SCALE_MAX,
  TEXT_SCALE_MIN,
  THEMES,
  type DisplaySettings,
  type Locale,
  type Theme,
} from '@yardcall/shared';
import { IsBoolean, IsIn, IsInt, IsOptional, Max, Min } from 'class-validator';

const TEXT_SCALE_MESSAGE = `Text size is a whole percentage from ${TEXT_SCALE_MIN} to ${TEXT_SCALE_MAX}.`;

export class DisplaySettingsDto implements DisplaySettings {
  @ApiProperty({ minimum: TEXT_SCALE_MIN, maximum: TEXT_SCALE_MAX, example: 150 })
  textScale: number;

  @ApiProperty({ enum: THEMES })
  theme: Theme;

  @ApiProperty()
  gloveMode: boolean;

  @ApiProperty({ enum: LOCALES })
  locale: Locale;
}

// PATCH: only the settings sent change.
export class UpdateDisplaySettingsDto implements Partial<DisplaySettings> {
  @ApiPropertyOptional({ minimum: TEXT_SCALE_MIN, maximum: TEXT_SCALE_MAX, example: 150 })
  @IsOptional()
  @IsInt({ message: TEXT_SCALE_MESSAGE })
  @Min(TEXT_SCALE_MIN, { message: TEXT_SCALE_MESSAGE })
  @Max(TEXT_SCALE_MAX, { message: TEXT_SCALE_MESSAGE })
  textScale?: number;

  @ApiPropertyOptional({ enum: THEMES })
  @IsOptional()
  @IsIn(THEMES, { message: `Choose a theme: ${THEMES.join(', ')}.` })
  theme?: Theme;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'Glove mode is true or false.' })
  gloveMode?: boolean;

  @ApiPropertyOptional({ enum: LOCALES })
  @IsOptional()
  @IsIn(LOCALES, { message: `Choose a language: ${LOCALES.join(', ')}.` })
  locale?: Locale;
}
