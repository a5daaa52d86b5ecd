import { dirname, join } from 'node:path';
import pdfmake from 'pdfmake';
import type { TDocumentDefinitions } from 'pdfmake/interfaces';

/** The PWA's bundled Atkinson Hyperlegible (WOFF files of @fontsource, which pdfkit reads), Latin subset. */
const FONT_DIR = join(dirname(require.resolve('@fontsource/atkinson-hyperlegible/package.json')), 'files');
const font = (weight: 400 | 700, style: 'normal' | 'italic') => join(FONT_DIR, `atkinson-hyperlegible-latin-${weight}-${style}.woff`);

export const REPORT_FONT = 'AtkinsonHyperlegible';

let configured = false;

/** pdfmake for the server: our one font, no URL fetching, local reads only from the font folder. */
function configure(): void {
  if (configured) return;
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy((path) => path.startsWith(FONT_DIR));
  pdfmake.setFonts({
    [REPORT_FONT]: { normal: font(400, 'normal'), bold: font(700, 'normal'), italics: font(400, 'italic'), bolditalics: font(700, 'italic') },
  });
  configured = true;
}

/**
 * Spellings for characters the Latin subset of the font lacks but our data uses (band assignments,
 * units): sub- and superscript digits, Greek mode letters, primes, arrows and relations.
 */
const SPELLED: Record<string, string> = {
  '⁻': '-', '⁺': '+', '′': "'", '″': "''", '→': '->', '≥': '>=', '≤': '<=', '≈': '~', '≡': '#',
  ν: 'nu', δ: 'delta', ρ: 'rho', ω: 'omega', τ: 'tau', γ: 'gamma', α: 'alpha', β: 'beta', π: 'pi', σ: 'sigma', λ: 'lambda',
  Σ: 'Sigma', Π: 'Pi', Δ: 'Delta',
};
const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** The text with every character the report font cannot draw spelled in ones it can. */
export function printable(text: string): string {
  return text.replace(/[^\u0000-\u00ff–—‘’“”•…]/gu, (char) => {
    const sub = SUBSCRIPT_DIGITS.indexOf(char);
    if (sub >= 0) return String(sub);
    const sup = SUPERSCRIPT_DIGITS.indexOf(char);
    if (sup >= 0) return String(sup);
    return SPELLED[char] ?? char;
  });
}

/** Every string of a document definition through `printable` (functions such as the footer included). */
function printableDeep<T>(value: T): T {
  if (typeof value === 'string') return printable(value) as T;
  if (typeof value === 'function') return ((...args: unknown[]) => printableDeep((value as (...a: unknown[]) => unknown)(...args))) as T;
  if (Array.isArray(value)) return value.map(printableDeep) as T;
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([key, member]) => [key, printableDeep(member)])) as T;
  }
  return value;
}

/** Renders a document definition to PDF bytes. */
export async function renderPdf(definition: TDocumentDefinitions): Promise<Buffer> {
  configure();
  return pdfmake.createPdf(printableDeep({ ...definition, defaultStyle: { font: REPORT_FONT, ...definition.defaultStyle } })).getBuffer();
}
