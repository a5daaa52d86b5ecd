import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { MAX_TOLERANCE_CM1, type Phase, type Technique } from '@siteband/shared';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsNumber, IsOptional, IsPositive, Max, ValidateNested } from 'class-validator';
import { FormBoolean, FormNumber } from './form-values';
import { PeakInputDto } from './peak-input.dto';
import { SpectrumInputDto } from './spectrum-input.dto';

export const TECHNIQUES: readonly Technique[] = ['ir', 'raman'];
export const PHASES: readonly Phase[] = ['condensed', 'gas'];

/** Most peaks a JSON peak list may hold: a handheld scan gives tens; the gas-phase pairing is quadratic in the count. */
export const MAX_INPUT_PEAKS = 500;

/**
 * What to identify: an uploaded instrument file (multipart field `file`), or in JSON either a spectrum
 * or a peak list. Exactly one of the three.
 */
export class IdentifyRequestDto {
  @ApiProperty({ enum: TECHNIQUES })
  @IsIn(TECHNIQUES, { message: `technique must be one of ${TECHNIQUES.join(', ')}` })
  technique: Technique;

  @ApiProperty({ enum: PHASES, description: 'condensed: liquid, solid or film; gas: a gas cell' })
  @IsIn(PHASES, { message: `phase must be one of ${PHASES.join(', ')}` })
  phase: Phase;

  @ApiPropertyOptional({ description: 'IR on a diamond ATR accessory (file or spectrum only)' })
  @IsOptional()
  @FormBoolean()
  @IsBoolean({ message: 'atr must be true or false' })
  atr?: boolean;

  @ApiPropertyOptional({ example: 785, description: 'Raman excitation wavelength, nm (file or spectrum only)' })
  @IsOptional()
  @FormNumber()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'excitationNm must be a number' })
  @IsPositive({ message: 'excitationNm must be a positive wavelength in nm' })
  excitationNm?: number;

  @ApiPropertyOptional({ example: 8, maximum: MAX_TOLERANCE_CM1, description: 'Match window ±cm⁻¹; default from the phase' })
  @IsOptional()
  @FormNumber()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'toleranceCm1 must be a number' })
  @IsPositive({ message: 'toleranceCm1 must be positive' })
  @Max(MAX_TOLERANCE_CM1, { message: `toleranceCm1 must be at most ${MAX_TOLERANCE_CM1} cm⁻¹` })
  toleranceCm1?: number;

  @ApiPropertyOptional({ type: SpectrumInputDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => SpectrumInputDto)
  spectrum?: SpectrumInputDto;

  @ApiPropertyOptional({ type: PeakInputDto, isArray: true, maxItems: MAX_INPUT_PEAKS })
  @IsOptional()
  @IsArray({ message: 'peaks must be a list' })
  @ArrayMaxSize(MAX_INPUT_PEAKS)
  @ValidateNested({ each: true })
  @Type(() => PeakInputDto)
  peaks?: PeakInputDto[];
}
