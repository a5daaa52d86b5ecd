/** A point on the drawing, with its depth for painting back to front. */
export interface ProjectedPoint {
  readonly x: number;
  readonly y: number;
  readonly depth: number;
}

/**
 * Orthographic view of standard-orientation coordinates (principal axis z): turned by `turnDeg`
 * about z, then tilted by `tiltDeg` towards the viewer, so z points up the screen when the tilt is 0.
 * Screen y grows downwards, as in SVG.
 */
export function projectPoint([x, y, z]: readonly [number, number, number], turnDeg: number, tiltDeg: number): ProjectedPoint {
  const a = (turnDeg * Math.PI) / 180;
  const b = (tiltDeg * Math.PI) / 180;
  const x1 = x * Math.cos(a) - y * Math.sin(a);
  const y1 = x * Math.sin(a) + y * Math.cos(a);
  // Tilt about the screen's horizontal axis: y1 is the depth before the tilt.
  const up = z * Math.cos(b) + y1 * Math.sin(b);
  const depth = y1 * Math.cos(b) - z * Math.sin(b);
  return { x: x1, y: -up, depth };
}
