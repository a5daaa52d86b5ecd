import { SpectrumImportError } from './import-error.js';

/** Most points a JCAMP-DX text may decode to; far above any scan (handheld: a few thousand). */
export const MAX_JCAMP_POINTS = 2_000_000;

// DUP characters of JCAMP-DX compressed data: S…Z stand for the digits 1…8, s for 9; the
// repeat count is that digit followed by any plain digits ("S9999" repeats 19999 times).
const DUP = /[S-Zs]\d*/g;
const DUP_DIGIT: Record<string, number> = { S: 1, T: 2, U: 3, V: 4, W: 5, X: 6, Y: 7, Z: 8, s: 9 };

/**
 * Refuse a JCAMP-DX text whose data would expand past maxPoints before decoding it: a short
 * line with a large DUP count would otherwise make the decoder allocate without bound.
 */
export function checkJcampExpansion(text: string, maxPoints = MAX_JCAMP_POINTS): void {
  let inData = false;
  let repeated = 0;
  let lineNumber = 0;
  for (const line of text.split(/\r?\n/)) {
    lineNumber++;
    if (line.startsWith('##')) {
      inData = /^##(XYDATA|PEAK\s*TABLE|XYPOINTS|DATA\s*TABLE)\s*=/i.test(line);
      continue;
    }
    if (!inData) continue;
    const data = line.split('$$')[0];
    for (const match of data.matchAll(DUP)) {
      repeated += Number(`${DUP_DIGIT[match[0][0]]}${match[0].slice(1)}`) - 1;
      if (repeated > maxPoints) {
        throw new SpectrumImportError(
          'too-large',
          `the compressed data repeat values more than ${maxPoints} times (DUP counts); the file cannot be a scan`,
          { line: lineNumber },
        );
      }
    }
  }
}
