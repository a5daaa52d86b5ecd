import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Sample } from '../samples/sample.entity';
import { SyncedRecord } from '../sync/synced-record';

export const SCAN_TECHNIQUES = ['ir', 'raman'] as const;
export type ScanTechnique = (typeof SCAN_TECHNIQUES)[number];
export const SCAN_PHASES = ['condensed', 'gas'] as const;
export type ScanPhase = (typeof SCAN_PHASES)[number];

/** One recorded spectrum of a sample, with the identification the tablet computed for it. */
@Entity({ name: 'scans' })
@Index('IDX_scans_syncSeq', ['syncSeq'])
@Index('IDX_scans_sampleId', ['sampleId'])
@Index('IDX_scans_caseId', ['caseId'])
export class Scan extends SyncedRecord {
  @Column({ type: 'uuid' })
  sampleId: string;

  @ManyToOne(() => Sample, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'sampleId', foreignKeyConstraintName: 'FK_scans_sample' })
  sample?: Sample;

  /** Copied from the sample by the server, for visibility filters. */
  @Column({ type: 'uuid' })
  caseId: string;

  @Column({ type: 'enum', enum: SCAN_TECHNIQUES })
  technique: ScanTechnique;

  @Column({ type: 'enum', enum: SCAN_PHASES })
  phase: ScanPhase;

  /** Laser wavelength of a Raman scan, in nm; null for IR. */
  @Column({ type: 'double', nullable: true })
  excitationNm: number | null;

  @Column({ type: 'datetime', precision: 3 })
  recordedAt: Date;

  /** The instrument check this scan relied on. */
  @Column({ type: 'uuid', nullable: true })
  instrumentCheckId: string | null;

  /** The raw instrument file (an attachment of kind raw-scan) and its SHA-256 as the tablet computed it. */
  @Column({ type: 'uuid', nullable: true })
  rawAttachmentId: string | null;

  @Column({ type: 'char', length: 64, nullable: true })
  rawSha256: string | null;

  /** What the tablet read from the raw file (range, points, units...). */
  @Column({ type: 'json', nullable: true })
  parsedSummary: Record<string, unknown> | null;

  /** The likely compounds as computed on the tablet, with processing parameters, library and code versions. */
  @Column({ type: 'json', nullable: true })
  result: Record<string, unknown> | null;

  /** When the inspector acknowledged the caution card for this scan. */
  @Column({ type: 'datetime', precision: 3, nullable: true })
  inspectorAcknowledgedAt: Date | null;

  /** The server's own recomputation of `result`; null until one has run. */
  @Column({ type: 'json', nullable: true })
  serverResult: Record<string, unknown> | null;

  /** true when the server's recomputation disagrees with the tablet's result; null until one has run. */
  @Column({ type: 'boolean', nullable: true })
  resultMismatch: boolean | null;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  serverRecomputedAt: Date | null;

  /** How the server's result differs from the tablet's (a `ResultComparison`); null until one has run. */
  @Column({ type: 'json', nullable: true })
  mismatch: Record<string, unknown> | null;

  /** Why the last recomputation failed (unreadable file, storage down...); null when it ran or has not run yet. */
  @Column({ type: 'varchar', length: 1000, nullable: true })
  serverRecomputeError: string | null;

  /** The first likely compound of the tablet's `result` (set by the server on each push), for the review queue. */
  @Column({ type: 'varchar', length: 64, nullable: true })
  likelyCompoundId: string | null;

  @Column({ type: 'varchar', length: 200, nullable: true })
  likelyCompoundName: string | null;

  /** The shared hazard rank (0–3) of the tablet's `result`, for the review queue. */
  @Column({ type: 'tinyint', default: 0 })
  hazardRank: number;
}
