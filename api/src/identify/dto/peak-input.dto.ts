import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, IsOptional, IsPositive, Max, Min } from 'class-validator';

/** One picked peak sent as JSON. */
export class PeakInputDto {
  @ApiProperty({ example: 1712, description: 'Position, cm⁻¹' })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  x: number;

  @ApiProperty({ example: 0.82, description: 'Height above the baseline' })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0)
  height: number;

  @ApiPropertyOptional({ example: 12, description: 'Full width at half maximum, cm⁻¹; 0 (unknown) when left out' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsPositive()
  widthCm1?: number;

  @ApiPropertyOptional({ example: 1, description: 'Height relative to the tallest peak, 0–1; computed when left out' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0)
  @Max(1)
  relativeHeight?: number;
}
