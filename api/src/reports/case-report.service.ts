import { HttpException, Injectable } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { AuditEntry } from '../audit/audit-entry.entity';
import { AuditService } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import type { FlatRecord } from '../cases/dto/case-list.dto';
import { ReviewService } from '../review/review.service';
import { Scan } from '../scans/scan.entity';
import { asArray, asNumber, asObject } from '../scans/json-reading';
import { User } from '../users/user.entity';
import { caseReportDocument, type CaseReportData } from './case-report-document';
import { renderPdf } from './pdf-renderer';
import { ScanExportService } from './scan-export.service';
import type { PlotInput } from './spectrum-plot';

/** The case report as PDF: everything of the case on its pages, spectra drawn from the raw files. */
@Injectable()
export class CaseReportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly review: ReviewService,
    private readonly exports: ScanExportService,
    private readonly audit: AuditService,
  ) {}

  /** The PDF of a case the user may read (404 otherwise, from the case bundle). */
  async pdf(caseId: string, user: AuthenticatedUser): Promise<{ fileName: string; bytes: Buffer }> {
    const bundle = await this.review.bundle(caseId, user);
    const inspector = await this.dataSource.getRepository(User).findOneBy({ id: String(bundle.case.inspectorId) });
    const scans = [];
    for (const record of bundle.scans) scans.push({ record, ...(await this.plotOf(record)) });
    const data: CaseReportData = {
      generatedAt: new Date(),
      generatedBy: `${user.displayName} (${user.role.replace('_', ' ')})`,
      caseRecord: bundle.case,
      inspectorName: inspector?.displayName ?? String(bundle.case.inspectorId),
      samples: bundle.samples,
      instrumentChecks: bundle.instrumentChecks,
      notes: bundle.notes,
      photos: bundle.attachments.filter((attachment) => attachment.kind === 'photo'),
      scans,
      escalations: bundle.escalations,
      decisions: bundle.decisions,
      currentDecisions: bundle.currentDecisions,
      audit: await this.auditSummary(caseId),
    };
    return { fileName: `case-report-${caseId}.pdf`, bytes: await renderPdf(caseReportDocument(data)) };
  }

  /** The scan's raw file as a plot, with the peaks of the identification; or why there is no plot. */
  private async plotOf(record: FlatRecord): Promise<{ plot: PlotInput | null; plotNote: string | null }> {
    const scan = await this.dataSource.getRepository(Scan).findOneByOrFail({ id: record.id });
    try {
      const { spectrum } = await this.exports.spectrumOf(scan);
      const result = asObject(record.serverResult) ?? asObject(record.result);
      const peaksCm1 = asArray(result?.peaks)
        .map((peak) => asNumber(asObject(peak)?.x))
        .filter((x): x is number => x !== null);
      return { plot: { xCm1: spectrum.xCm1, y: spectrum.y, technique: scan.technique, peaksCm1 }, plotNote: null };
    } catch (error) {
      // No raw file, still uploading, or unreadable: the report says so in place of the plot.
      if (error instanceof HttpException) return { plot: null, plotNote: `No spectrum plot: ${error.message}.` };
      throw error;
    }
  }

  private async auditSummary(caseId: string): Promise<CaseReportData['audit']> {
    const range = await this.dataSource
      .getRepository(AuditEntry)
      .createQueryBuilder('entry')
      .select('COUNT(*)', 'entries')
      .addSelect('MIN(entry.at)', 'firstAt')
      .addSelect('MAX(entry.at)', 'lastAt')
      .where('entry.caseId = :caseId', { caseId })
      .getRawOne<{ entries: string; firstAt: Date | null; lastAt: Date | null }>();
    return {
      entries: Number(range?.entries ?? 0),
      firstAt: range?.firstAt ? new Date(range.firstAt).toISOString() : null,
      lastAt: range?.lastAt ? new Date(range.lastAt).toISOString() : null,
      chain: await this.audit.verifyCase(caseId),
    };
  }
}
