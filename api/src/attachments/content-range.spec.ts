import { parseContentRange } from './content-range';

describe('parseContentRange', () => {
  it('takes a missing or empty header as the whole declared file', () => {
    expect(parseContentRange(undefined, 1000)).toEqual({ start: 0, end: 999, total: 1000 });
    expect(parseContentRange('  ', 5)).toEqual({ start: 0, end: 4, total: 5 });
  });

  it('reads a chunk range with inclusive ends', () => {
    expect(parseContentRange('bytes 1048576-2097151/3000000', 3000000)).toEqual({ start: 1048576, end: 2097151, total: 3000000 });
    expect(parseContentRange('bytes 0-0/1', 1)).toEqual({ start: 0, end: 0, total: 1 });
  });

  it.each([
    ['bytes=0-9/10', /must look like/],
    ['bytes 0-9/*', /must look like/],
    ['bytes */10', /must look like/],
    ['bytes -1-9/10', /must look like/],
    ['bytes 9-3/10', /end 3 is before its start 9/],
    ['bytes 0-10/10', /end 10 must be below the total 10/],
  ])('refuses %s with a reason', (header, reason) => {
    const parsed = parseContentRange(header, 10);
    expect(parsed).toEqual({ problem: expect.stringMatching(reason) });
  });
});
