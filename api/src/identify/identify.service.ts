import { BadRequestException, Injectable, PayloadTooLargeException } from '@nestjs/common';
import {
  identifyScan,
  identifySpectrum,
  importSpectrum,
  SpectrumImportError,
  xyAscending,
  type IdentifyResult,
  type ProcessedScan,
  type ProcessOptions,
  type Spectrum,
} from '@siteband/shared';
import { LibraryService } from '../library/library.service';
import type { IdentifyRequestDto } from './dto/identify-request.dto';
import type { PeakInputDto } from './dto/peak-input.dto';
import type { SpectrumInputDto } from './dto/spectrum-input.dto';

/** An uploaded instrument file as multer hands it over (memory storage). */
export interface UploadedScanFile {
  readonly originalname: string;
  readonly buffer: Buffer;
}

/** A processed scan's answer: the command line's `identify --json` object, with the uploaded file name when there is one. */
export type IdentifyAnswer = IdentifyResult & { file?: string; quality?: ProcessedScan['quality']; processing?: ProcessedScan['parameters'] };

/** An instrument file's run through the pipeline: every processing option, the laser line and the match window. */
export interface FileRun {
  readonly process: ProcessOptions;
  readonly excitationNm?: number;
  readonly toleranceCm1?: number;
}

/** The processed scan and its likely compounds, as the shared identifySpectrum returns them. */
export interface Identification {
  readonly processed: ProcessedScan;
  readonly result: IdentifyResult;
}

/**
 * Likely compounds for a scan with the shared identification code, ranked against the compound
 * library in force (bundled + supervisors' edits), so the server answers exactly as a tablet does
 * once it has synced the library.
 */
@Injectable()
export class IdentifyService {
  constructor(private readonly library: LibraryService) {}

  /** Import the instrument's file (JCAMP-DX or delimited text), process it and rank the library. */
  async identifyFile(file: UploadedScanFile, request: IdentifyRequestDto): Promise<IdentifyAnswer> {
    const { processed, result } = await this.identifyFileWith(file, {
      process: processOptionsOf(request),
      ...(request.excitationNm !== undefined ? { excitationNm: request.excitationNm } : {}),
      ...(request.toleranceCm1 !== undefined ? { toleranceCm1: request.toleranceCm1 } : {}),
    });
    return { file: file.originalname, ...answerOf(processed, result) };
  }

  /**
   * Import the instrument's file and identify it with the pipeline's options given in full (the
   * server's recomputation runs the tablet's recorded settings this way).
   */
  async identifyFileWith(file: UploadedScanFile, run: FileRun): Promise<Identification> {
    const spectrum = refuseBadInput(() =>
      importSpectrum(new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.byteLength), {
        fileName: file.originalname,
        technique: run.process.technique,
        ...(run.excitationNm !== undefined ? { excitationNm: run.excitationNm } : {}),
      }),
    );
    return this.rankSpectrum(spectrum, run.process, run.toleranceCm1);
  }

  /** Process a spectrum sent as JSON and rank the library. */
  async identifyJsonSpectrum(input: SpectrumInputDto, request: IdentifyRequestDto): Promise<IdentifyAnswer> {
    // The pipeline wants an ascending axis; instruments often write descending wavenumbers.
    const { x, y } = refuseBadInput(() => xyAscending(input.xCm1, input.y));
    const spectrum: Spectrum = {
      xCm1: x,
      y,
      ordinate: input.ordinate,
      technique: request.technique,
      ...(request.excitationNm !== undefined ? { excitationNm: request.excitationNm } : {}),
    };
    const { processed, result } = await this.rankSpectrum(spectrum, processOptionsOf(request), request.toleranceCm1);
    return answerOf(processed, result);
  }

  /** Rank the library for a peak list already picked elsewhere. */
  async identifyPeaks(peaks: readonly PeakInputDto[], request: IdentifyRequestDto): Promise<IdentifyResult> {
    if (request.atr !== undefined || request.excitationNm !== undefined) {
      throw new BadRequestException('atr and excitationNm apply to a file or a spectrum, not to a peak list');
    }
    const tallest = Math.max(0, ...peaks.map((p) => p.height));
    const { library } = await this.library.current();
    return refuseBadInput(() =>
      identifyScan(
        {
          technique: request.technique,
          phase: request.phase,
          peaks: peaks.map((p) => ({
            x: p.x,
            height: p.height,
            widthCm1: p.widthCm1 ?? 0,
            relativeHeight: p.relativeHeight ?? (tallest > 0 ? p.height / tallest : 0),
          })),
          ...(request.toleranceCm1 !== undefined ? { toleranceCm1: request.toleranceCm1 } : {}),
        },
        { library },
      ),
    );
  }

  private async rankSpectrum(spectrum: Spectrum, process: ProcessOptions, toleranceCm1: number | undefined): Promise<Identification> {
    const { library } = await this.library.current();
    return refuseBadInput(() => identifySpectrum(spectrum, { process, ...(toleranceCm1 !== undefined ? { toleranceCm1 } : {}), library }));
  }
}

/** The pipeline's options a request asks for: its technique and phase, ATR when set, the defaults otherwise. */
function processOptionsOf(request: IdentifyRequestDto): ProcessOptions {
  return { technique: request.technique, phase: request.phase, ...(request.atr ? { atr: true } : {}) };
}

function answerOf(processed: ProcessedScan, result: IdentifyResult): IdentifyResult & Pick<IdentifyAnswer, 'quality' | 'processing'> {
  return { ...result, quality: processed.quality, processing: processed.parameters };
}

/**
 * Runs shared code that refuses bad input by throwing: the importer's SpectrumImportError and the
 * pipeline's RangeErrors become a 400 with their message (413 for a file over the size limit).
 */
function refuseBadInput<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof SpectrumImportError && error.code === 'too-large') throw new PayloadTooLargeException(error.message);
    if (error instanceof SpectrumImportError || error instanceof RangeError) throw new BadRequestException(error.message);
    throw error;
  }
}
