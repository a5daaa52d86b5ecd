import { BadRequestException, Injectable } from '@nestjs/common';
import { checkStructure, StructureError, type StructureCheck, type StructureFormat } from '@siteband/shared';
import type { StructureCheckRequestDto } from './dto/structure-check-request.dto';

/** An uploaded structure file as multer hands it over (memory storage). */
export interface UploadedStructureFile {
  readonly originalname: string;
  readonly buffer: Buffer;
}

// The same file-name rule as the command line's `symmetry`.
const EXTENSION_FORMATS: Readonly<Record<string, StructureFormat>> = { xyz: 'xyz', mol: 'mol' };

/**
 * Structure checks with the shared `checkStructure`, the one composition the command line and the PWA
 * also use; bad files answer 400 naming the line and the problem, never 500.
 */
@Injectable()
export class SymmetryService {
  /** The structure check of JSON text. */
  checkText(text: string, request: StructureCheckRequestDto): StructureCheck {
    const { format, tolerance, convention } = request;
    return refuseBadStructure(() =>
      checkStructure(text, {
        ...(format !== undefined ? { format } : {}),
        ...(tolerance !== undefined ? { tolerance } : {}),
        ...(convention !== undefined ? { convention } : {}),
      }),
    );
  }

  /** The structure check of an uploaded file; the format comes from the request, else the file name, else the text. */
  checkFile(file: UploadedStructureFile, request: StructureCheckRequestDto): StructureCheck {
    let text: string;
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
    } catch {
      throw structureRefused('the file is not UTF-8 text; upload an XYZ or MOL file');
    }
    if (text.includes('\u0000')) throw structureRefused('the file holds binary data; upload an XYZ or MOL file');
    const extension = /\.([a-z]+)$/i.exec(file.originalname)?.[1]?.toLowerCase();
    const format = request.format ?? (extension ? EXTENSION_FORMATS[extension] : undefined);
    return this.checkText(text, { ...request, ...(format ? { format } : {}) });
  }
}

function refuseBadStructure<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    // The reader names the line; the engine's RangeErrors say which option or geometry it refuses.
    if (error instanceof StructureError || error instanceof RangeError) throw structureRefused(error.message);
    throw error;
  }
}

function structureRefused(message: string): BadRequestException {
  return new BadRequestException({ message, details: [{ field: 'structure', messages: [message] }] });
}
