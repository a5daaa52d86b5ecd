import { ApiProperty } from '@nestjs/swagger';

/** The structure check's answer: the shared `checkStructure` object, as the command line's `symmetry --json` prints it. */
export class StructureCheckDto {
  @ApiProperty({ type: String, nullable: true, description: 'Title line of the file' })
  title: string | null;

  @ApiProperty({ example: 'C3v' })
  pointGroup: string;

  @ApiProperty({ type: Number, nullable: true, example: 6, description: 'Number of operations; null for C∞v and D∞h' })
  order: number | null;

  @ApiProperty({ example: 4 })
  atoms: number;

  @ApiProperty({ example: 'H3N', description: 'Hill formula' })
  formula: string;

  @ApiProperty({ type: 'object', isArray: true, additionalProperties: true, description: 'Symmetry elements in the standard frame' })
  elements: Record<string, unknown>[];

  @ApiProperty({ example: 'symmetric top' })
  topType: string;

  @ApiProperty({ type: Number, isArray: true, description: 'Principal moments, u·Å², ascending' })
  principalMoments: number[];

  @ApiProperty({ type: 'object', additionalProperties: true, description: '{ convention, tolerance, maxDeviation, centre, rotation, atoms }: the standard orientation used' })
  orientation: Record<string, unknown>;

  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: '{ total, fundamentals, irActive, ramanActive, coincident, silent, mutualExclusion, gamma, modes[] }',
  })
  vibrations: Record<string, unknown>;

  @ApiProperty({ type: 'object', additionalProperties: true, description: '{ characters, decomposition }; gamma3N, gammaTrans, gammaRot and contributions come alike' })
  gammaVib: Record<string, unknown>;

  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true, description: 'Bonds, Γstretch and stretch combinations' })
  internalCoordinates: Record<string, unknown> | null;

  @ApiProperty({ type: String, isArray: true })
  cautions: string[];
}
