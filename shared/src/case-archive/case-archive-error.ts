/** Why an archive was refused; stable codes the apps translate or map to an HTTP status. */
export type CaseArchiveErrorCode =
  | 'too-large'
  | 'not-a-zip'
  | 'unexpected-entry'
  | 'missing-manifest'
  | 'bad-manifest'
  | 'unknown-format'
  | 'unsupported-version'
  | 'missing-file'
  | 'size-mismatch'
  | 'hash-mismatch';

/** The only error the archive reader throws: a code, a sentence for people and the entry at fault. */
export class CaseArchiveError extends Error {
  readonly code: CaseArchiveErrorCode;
  /** The ZIP entry (or manifest field) the problem is in, when there is one. */
  readonly entry?: string;

  constructor(code: CaseArchiveErrorCode, message: string, entry?: string) {
    super(entry === undefined ? message : `${entry}: ${message}`);
    this.name = 'CaseArchiveError';
    this.code = code;
    if (entry !== undefined) this.entry = entry;
  }
}
