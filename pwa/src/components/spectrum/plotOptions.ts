/** uPlot settings for a spectrum: axis labels with units, IR's falling wavenumber axis, markers. */
import uPlot from 'uplot';

/** Colours read from the theme, so the plot follows the light and dark palettes. */
export interface PlotColours {
  readonly line: string;
  readonly ink: string;
  readonly grid: string;
  readonly peak: string;
  readonly expected: string;
}

/** Reads the palette's custom properties from the document. */
export function themeColours(element: Element): PlotColours {
  const style = getComputedStyle(element);
  const read = (name: string, fallback: string) => style.getPropertyValue(name).trim() || fallback;
  return {
    line: read('--sb-action', '#1b4f72'),
    ink: read('--sb-ink', '#14202b'),
    grid: read('--sb-line-soft', '#c9d0d5'),
    peak: read('--sb-error-ink', '#8a1c1c'),
    expected: read('--sb-warn-line', '#c98a00'),
  };
}

/** What the markers hook draws: observed peaks on top, expected bands as dashed lines. */
export interface Markers {
  peaksCm1: readonly number[];
  expectedCm1: readonly number[];
}

function drawMarkers(u: uPlot, markers: Markers, colours: PlotColours): void {
  const { ctx, bbox } = u;
  const ratio = uPlot.pxRatio;
  const [min, max] = [u.scales.x!.min!, u.scales.x!.max!];
  const inView = (x: number) => x >= Math.min(min, max) && x <= Math.max(min, max);
  ctx.save();
  ctx.lineWidth = 2 * ratio;
  ctx.strokeStyle = colours.expected;
  ctx.setLineDash([6 * ratio, 5 * ratio]);
  for (const x of markers.expectedCm1.filter(inView)) {
    const px = u.valToPos(x, 'x', true);
    ctx.beginPath();
    ctx.moveTo(px, bbox.top);
    ctx.lineTo(px, bbox.top + bbox.height);
    ctx.stroke();
  }
  ctx.setLineDash([]);
  ctx.fillStyle = colours.peak;
  const size = 7 * ratio;
  for (const x of markers.peaksCm1.filter(inView)) {
    const px = u.valToPos(x, 'x', true);
    ctx.beginPath();
    ctx.moveTo(px - size, bbox.top);
    ctx.lineTo(px + size, bbox.top);
    ctx.lineTo(px, bbox.top + 1.6 * size);
    ctx.closePath();
    ctx.fill();
  }
  ctx.restore();
}

/** Options for one spectrum; `markers` is read on every redraw so the overlay can change in place. */
export function spectrumPlotOptions(args: {
  width: number;
  height: number;
  xLabel: string;
  yLabel: string;
  seriesLabel: string;
  descendingX: boolean;
  colours: PlotColours;
  markers: () => Markers;
  formatX: (value: number) => string;
}): uPlot.Options {
  const { colours } = args;
  const axisFont = '600 15px "Atkinson Hyperlegible", sans-serif';
  const labelFont = '700 16px "Atkinson Hyperlegible", sans-serif';
  return {
    width: args.width,
    height: args.height,
    legend: { show: false },
    // Zoom by dragging across the wavenumber axis; the y axis follows the visible data.
    cursor: { drag: { x: true, y: false, setScale: true }, points: { show: false } },
    scales: { x: { time: false, dir: args.descendingX ? -1 : 1 }, y: { auto: true } },
    axes: [
      {
        label: args.xLabel,
        stroke: colours.ink,
        font: axisFont,
        labelFont,
        grid: { stroke: colours.grid, width: 1 },
        ticks: { stroke: colours.grid },
        values: (_u, splits) => splits.map((v) => args.formatX(v)),
      },
      { label: args.yLabel, stroke: colours.ink, font: axisFont, labelFont, size: 70, grid: { stroke: colours.grid, width: 1 }, ticks: { stroke: colours.grid } },
    ],
    series: [{}, { label: args.seriesLabel, stroke: colours.line, width: 2 }],
    hooks: { draw: [(u) => drawMarkers(u, args.markers(), colours)] },
  };
}
