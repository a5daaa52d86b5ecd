import { plotIndices, PLOT_HEIGHT_PT, PLOT_WIDTH_PT, spectrumPlot } from './spectrum-plot';

describe('plotIndices', () => {
  it('keeps every point of a short trace and the lowest and highest of each column of a long one', () => {
    expect(plotIndices([3, 1, 4, 1, 5], 4)).toEqual([0, 1, 2, 3, 4]);
    const y = [5, 9, 1, 7, 2, /**/ 3, 3, 3, 3, 3, /**/ 0, 2, 8, 2, 0, /**/ 6, 5, 4, 3, 2];
    expect(plotIndices(y, 2)).toEqual([1, 2, 10, 12]);
    expect(plotIndices(y, 4)).toEqual([1, 2, 5, 10, 12, 15, 19]);
  });
});

describe('spectrumPlot', () => {
  const xCm1 = Float64Array.from({ length: 3001 }, (_, i) => 200 + i);
  const y = Float64Array.from(xCm1, (x) => 10 + 1000 * Math.exp(-(((x - 1044) / 3) ** 2)));

  it('draws the trace as one polyline inside the frame, with a tick per peak in range', () => {
    const plot = spectrumPlot({ xCm1, y, technique: 'raman', peaksCm1: [1044, 5000] }) as unknown as { columns: { stack: { canvas: Record<string, unknown>[] }[] }[] };
    const canvas = plot.columns[0].stack[0].canvas;
    const line = canvas.find((element) => element.type === 'polyline') as { points: { x: number; y: number }[] };
    expect(line.points.length).toBeLessThanOrEqual(800);
    for (const point of line.points) {
      expect(point.x).toBeGreaterThanOrEqual(0);
      expect(point.x).toBeLessThanOrEqual(PLOT_WIDTH_PT);
      expect(point.y).toBeGreaterThanOrEqual(0);
      expect(point.y).toBeLessThanOrEqual(PLOT_HEIGHT_PT);
    }
    // The band's top survives the reduction: the highest point is drawn at the top margin.
    expect(Math.min(...line.points.map((point) => point.y))).toBeCloseTo(6, 6);
    const ticks = canvas.filter((element) => element.type === 'line') as { x1: number }[];
    expect(ticks).toHaveLength(1);
    expect(ticks[0].x1).toBeCloseTo(((1044 - 200) / 3000) * PLOT_WIDTH_PT, 6);
  });

  it('runs an IR axis from high to low wavenumber', () => {
    const plot = spectrumPlot({ xCm1, y, technique: 'ir', peaksCm1: [1044] }) as unknown as { columns: { stack: { canvas: { type: string; x1?: number }[] }[] }[] };
    const tick = plot.columns[0].stack[0].canvas.find((element) => element.type === 'line');
    expect(tick?.x1).toBeCloseTo(((3200 - 1044) / 3000) * PLOT_WIDTH_PT, 6);
  });
});
