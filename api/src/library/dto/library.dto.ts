import { ApiProperty } from '@nestjs/swagger';
import type { CurrentLibrary } from '../merge-library';

/** Version stamp of the library in force. */
export class LibraryVersionDto {
  @ApiProperty({ example: '1.4.0+edits.3f9a0c21b7de', description: 'The bundled version, plus a hash of the edits when there are any' })
  version: string;

  @ApiProperty({ example: '2026-12-01' })
  date: string;

  @ApiProperty({ example: 'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855', description: 'SHA-256 of the content' })
  contentHash: string;
}

/**
 * The library in force, in the shape the shared `validateLibrary` reads, so a tablet can validate and
 * use it offline exactly as the server does.
 */
export class LibraryDto {
  @ApiProperty({ type: LibraryVersionDto })
  version: LibraryVersionDto;

  @ApiProperty({ type: 'object', additionalProperties: { type: 'string' }, description: 'Source keys → full citations' })
  sources: Record<string, string>;

  @ApiProperty({ type: 'object', isArray: true, additionalProperties: true, description: 'Active compounds (fixtures/library/README.md)' })
  compounds: Record<string, unknown>[];

  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Which findings are escalated to a safety officer' })
  escalationRules: Record<string, unknown>;

  @ApiProperty({ type: String, isArray: true, example: ['chloroform'], description: 'Retired compound ids' })
  retired: string[];

  /** The current library as the API answers it. */
  static from({ library, retired }: CurrentLibrary): LibraryDto {
    return Object.assign(new LibraryDto(), {
      version: library.version,
      sources: library.sources,
      compounds: library.compounds as unknown as Record<string, unknown>[],
      escalationRules: library.escalationRules as unknown as Record<string, unknown>,
      retired: [...retired],
    });
  }
}
