import { ApiPropertyOptional } from '@nestjs/swagger';
import type { PlanarConvention, StructureFormat } from '@siteband/shared';
import { IsIn, IsNumber, IsOptional, IsPositive, IsString, Max, MaxLength } from 'class-validator';
import { FormNumber } from '../../identify/dto/form-values';

/** Largest structure file accepted, bytes: a 1000-atom XYZ is about 50 kB. */
export const MAX_STRUCTURE_BYTES = 1024 * 1024;

const FORMATS: readonly StructureFormat[] = ['xyz', 'mol'];
const CONVENTIONS: readonly PlanarConvention[] = ['yz', 'xz'];

/** A structure check: the structure as JSON text or as an uploaded file (multipart field `file`). */
export class StructureCheckRequestDto {
  @ApiPropertyOptional({ example: '3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692', description: 'XYZ or MOL V2000 text (JSON only)' })
  @IsOptional()
  @IsString({ message: 'structure must be the text of an XYZ or MOL file' })
  @MaxLength(MAX_STRUCTURE_BYTES)
  structure?: string;

  @ApiPropertyOptional({ enum: FORMATS, description: 'Default: from the file name, else detected from the text' })
  @IsOptional()
  @IsIn(FORMATS, { message: `format must be one of ${FORMATS.join(', ')}` })
  format?: StructureFormat;

  @ApiPropertyOptional({ example: 0.1, maximum: 1, description: 'Å an atom may sit from its symmetric position (default 0.1)' })
  @IsOptional()
  @FormNumber()
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'tolerance must be a number of ångström' })
  @IsPositive({ message: 'tolerance must be a positive distance in Å' })
  @Max(1, { message: 'tolerance must be at most 1 Å' })
  tolerance?: number;

  @ApiPropertyOptional({ enum: CONVENTIONS, description: 'Plane of a planar C2v or D2h molecule (default yz, Mulliken 1955)' })
  @IsOptional()
  @IsIn(CONVENTIONS, { message: `convention must be one of ${CONVENTIONS.join(', ')}` })
  convention?: PlanarConvention;
}
