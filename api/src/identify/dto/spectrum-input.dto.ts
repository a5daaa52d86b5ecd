import { ApiProperty } from '@nestjs/swagger';
import { DEFAULT_MIN_POINTS, type OrdinateKind } from '@siteband/shared';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, IsNumber } from 'class-validator';

const ORDINATES: readonly OrdinateKind[] = ['absorbance', 'transmittance', 'intensity'];

/** Most points a JSON spectrum may hold: far above a handheld scan (a few thousand), well under the JSON body limit. */
export const MAX_SPECTRUM_POINTS = 20000;

/** A spectrum sent as JSON: wavenumbers (IR) or Raman shifts in cm⁻¹ and the ordinate. */
export class SpectrumInputDto {
  @ApiProperty({ type: Number, isArray: true, description: 'cm⁻¹, strictly ascending or strictly descending' })
  @IsArray()
  @ArrayMinSize(DEFAULT_MIN_POINTS)
  @ArrayMaxSize(MAX_SPECTRUM_POINTS)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { each: true, message: 'xCm1 must hold finite numbers only' })
  xCm1: number[];

  @ApiProperty({ type: Number, isArray: true })
  @IsArray()
  @ArrayMinSize(DEFAULT_MIN_POINTS)
  @ArrayMaxSize(MAX_SPECTRUM_POINTS)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { each: true, message: 'y must hold finite numbers only' })
  y: number[];

  @ApiProperty({ enum: ORDINATES, description: 'IR: absorbance or transmittance (0–1); Raman: intensity' })
  @IsIn(ORDINATES, { message: `ordinate must be one of ${ORDINATES.join(', ')}` })
  ordinate: OrdinateKind;
}
