import { describe, expect, it } from 'vitest';
import { projectPoint } from './projectAtoms';

describe('projectPoint', () => {
  it('draws the principal axis z straight up when there is no tilt', () => {
    const p = projectPoint([0, 0, 1], 37, 0);
    expect(p.x).toBeCloseTo(0, 12);
    expect(p.y).toBeCloseTo(-1, 12);
  });

  it('turns about z: a quarter turn takes x to the depth direction', () => {
    const p = projectPoint([1, 0, 0], 90, 0);
    expect(p.x).toBeCloseTo(0, 12);
    expect(p.depth).toBeCloseTo(1, 12);
  });

  it('keeps lengths: an orthographic view never stretches a vector', () => {
    const v: [number, number, number] = [0.3, -1.2, 0.7];
    const p = projectPoint(v, 123, 25);
    expect(Math.hypot(p.x, p.y, p.depth)).toBeCloseTo(Math.hypot(...v), 12);
  });
});
