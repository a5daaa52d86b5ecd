/** Why an import was refused; stable codes the user interface can translate. */
export type SpectrumImportErrorCode =
  | 'empty'
  | 'too-large'
  | 'unrecognised-format'
  | 'no-spectrum-block'
  | 'not-numeric'
  | 'non-finite'
  | 'too-few-points'
  | 'duplicate-x'
  | 'unknown-units'
  | 'implausible-axis'
  | 'technique-mismatch'
  | 'missing-excitation'
  | 'invalid-option';

/** Where in the file the problem was found, when that is known. */
export interface SpectrumImportErrorLocation {
  /** 1-based line number in the text file. */
  readonly line?: number;
  /** Column header or JCAMP-DX label. */
  readonly field?: string;
  /** 0-based block index in a multi-block JCAMP-DX file. */
  readonly block?: number;
}

/** The only error the importer throws: a code, a sentence for people and the place in the file. */
export class SpectrumImportError extends Error {
  readonly code: SpectrumImportErrorCode;
  readonly line?: number;
  readonly field?: string;
  readonly block?: number;

  constructor(code: SpectrumImportErrorCode, message: string, where: SpectrumImportErrorLocation = {}) {
    const place = [
      where.block !== undefined ? `block ${where.block}` : '',
      where.line !== undefined ? `line ${where.line}` : '',
      where.field !== undefined ? `field "${where.field}"` : '',
    ]
      .filter(Boolean)
      .join(', ');
    super(place ? `${message} (${place})` : message);
    this.name = 'SpectrumImportError';
    this.code = code;
    if (where.line !== undefined) this.line = where.line;
    if (where.field !== undefined) this.field = where.field;
    if (where.block !== undefined) this.block = where.block;
  }
}
