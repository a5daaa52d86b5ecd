import type { Content } from 'pdfmake/interfaces';

/** Drawing size of a spectrum plot in pt (the page's text width is about 515 pt on A4 with 40 pt margins). */
export const PLOT_WIDTH_PT = 480;
export const PLOT_HEIGHT_PT = 150;

/** Columns the trace is reduced to: each keeps its lowest and highest point, so no peak disappears. */
const PLOT_COLUMNS = 400;

/** One trace of a scan as the report draws it. */
export interface PlotInput {
  xCm1: ArrayLike<number>;
  y: ArrayLike<number>;
  /** IR plots run from high to low wavenumber (the trade's habit, common practice); Raman shift runs upward. */
  technique: 'ir' | 'raman';
  /** Picked peak positions in cm⁻¹, marked under the trace. */
  peaksCm1: readonly number[];
}

/**
 * The indices of a trace reduced to at most two per column (its minimum and maximum, in order), so a
 * vector plot of thousands of points stays small without losing a peak.
 */
export function plotIndices(y: ArrayLike<number>, columns = PLOT_COLUMNS): number[] {
  const n = y.length;
  if (n <= 2 * columns) return Array.from({ length: n }, (_, i) => i);
  const picked: number[] = [];
  for (let column = 0; column < columns; column++) {
    const from = Math.floor((column * n) / columns);
    const to = Math.floor(((column + 1) * n) / columns);
    let low = from;
    let high = from;
    for (let i = from + 1; i < to; i++) {
      if (y[i] < y[low]) low = i;
      if (y[i] > y[high]) high = i;
    }
    picked.push(...(low === high ? [low] : [Math.min(low, high), Math.max(low, high)]));
  }
  return picked;
}

/** A vector plot (pdfmake canvas: frame, trace as one polyline, peak ticks) with its axis labels. */
export function spectrumPlot(input: PlotInput): Content {
  const n = input.xCm1.length;
  const xs = Array.from(input.xCm1);
  const xMin = Math.min(...xs);
  const xMax = Math.max(...xs);
  let yMin = Infinity;
  let yMax = -Infinity;
  for (let i = 0; i < n; i++) {
    yMin = Math.min(yMin, input.y[i]);
    yMax = Math.max(yMax, input.y[i]);
  }
  const ySpan = yMax > yMin ? yMax - yMin : 1;
  const xSpan = xMax > xMin ? xMax - xMin : 1;
  const descending = input.technique === 'ir';
  const px = (x: number) => ((descending ? xMax - x : x - xMin) / xSpan) * PLOT_WIDTH_PT;
  const py = (y: number) => PLOT_HEIGHT_PT - 6 - ((y - yMin) / ySpan) * (PLOT_HEIGHT_PT - 12);
  const ticks = input.peaksCm1
    .filter((x) => x >= xMin && x <= xMax)
    .map((x) => ({ type: 'line' as const, x1: px(x), y1: PLOT_HEIGHT_PT, x2: px(x), y2: PLOT_HEIGHT_PT - 5, lineWidth: 0.8, lineColor: '#b00020' }));
  const [left, right] = descending ? [xMax, xMin] : [xMin, xMax];
  const axis = input.technique === 'ir' ? 'Wavenumber (cm-1)' : 'Raman shift (cm-1)';
  return {
    columns: [
      {
        width: PLOT_WIDTH_PT,
        stack: [
          {
            canvas: [
              { type: 'rect', x: 0, y: 0, w: PLOT_WIDTH_PT, h: PLOT_HEIGHT_PT, lineWidth: 0.5, lineColor: '#555555' },
              { type: 'polyline', lineWidth: 0.8, lineColor: '#000000', points: plotIndices(input.y).map((i) => ({ x: px(input.xCm1[i]), y: py(input.y[i]) })) },
              ...ticks,
            ],
          },
          {
            columns: [
              { text: left.toFixed(0), width: 60 },
              { text: `${axis}; red ticks: picked peaks`, alignment: 'center', width: '*' },
              { text: right.toFixed(0), alignment: 'right', width: 60 },
            ],
            fontSize: 8,
            margin: [0, 2, 0, 6],
          },
        ],
      },
    ],
    unbreakable: true,
  };
}
