/** A structure file that cannot be read, with the 1-based line at fault. */
export class StructureError extends Error {
  readonly line: number;

  constructor(line: number, problem: string) {
    super(`line ${line}: ${problem}`);
    this.name = 'StructureError';
    this.line = line;
  }
}
