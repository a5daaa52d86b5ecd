import { ConflictException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { isUniform, resampleUniform, spectrumToJcamp, SpectrumImportError, type Spectrum } from '@siteband/shared';
import { DataSource } from 'typeorm';
import type { Attachment } from '../attachments/attachment.entity';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { importRawScan, RawScanFiles } from '../scans/raw-scan-files';
import type { Scan } from '../scans/scan.entity';
import { visibleScan } from './visible-scan';

/** A scan's raw file read back as a spectrum, for the export and the case report. */
export interface ScanSpectrum {
  scan: Scan;
  raw: Attachment;
  spectrum: Spectrum;
}

/** Exports of a scan from its stored raw file, read by the shared importer and written by the shared exporter. */
@Injectable()
export class ScanExportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly rawFiles: RawScanFiles,
  ) {}

  /**
   * The scan's raw file as a spectrum: 404 when the scan has no raw file on the server, 409 while its
   * upload is incomplete, 422 when the shared importer cannot read it.
   */
  async spectrumOf(scan: Scan): Promise<ScanSpectrum> {
    const raw = await this.rawFiles.attachmentOf(scan);
    if (!raw) throw new NotFoundException(`Scan ${scan.id} has no raw file on the server`);
    if (!raw.storageKey) throw new ConflictException(`The raw file of scan ${scan.id} is not completely uploaded yet (${raw.receivedBytes} of ${raw.size} bytes)`);
    const bytes = await this.rawFiles.read(raw);
    try {
      return { scan, raw, spectrum: { ...importRawScan(scan, raw, bytes), technique: scan.technique } };
    } catch (error) {
      if (error instanceof SpectrumImportError) throw new UnprocessableEntityException(`The raw file of scan ${scan.id} cannot be read: ${error.message}`);
      throw error;
    }
  }

  /**
   * JCAMP-DX 4.24 of a scan the user may see. An uneven axis (JCAMP-DX XYDATA needs an even one) is
   * resampled by linear interpolation at its median spacing, and the file says so in a private label.
   */
  async jcamp(scanId: string, user: AuthenticatedUser): Promise<{ fileName: string; text: string }> {
    const { scan, raw, spectrum } = await this.spectrumOf(await visibleScan(this.dataSource.manager, scanId, user));
    const meta: Record<string, string> = { 'SITEBAND SCAN': scan.id, 'SITEBAND RAW FILE': `${raw.fileName} sha256:${raw.sha256}` };
    let written = spectrum;
    if (!isUniform(spectrum.xCm1)) {
      const even = resampleUniform(spectrum.xCm1, spectrum.y);
      meta['SITEBAND RESAMPLED'] = `linear interpolation of ${spectrum.xCm1.length} points onto ${even.x.length} evenly spaced points`;
      written = { ...spectrum, xCm1: even.x, y: even.y };
    }
    const text = spectrumToJcamp({ ...written, title: spectrum.title ?? `Siteband scan ${scan.id}` }, meta);
    return { fileName: `scan-${scan.id}.jdx`, text };
  }
}
