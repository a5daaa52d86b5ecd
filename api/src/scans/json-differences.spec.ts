import { jsonDifferences } from './json-differences';

describe('jsonDifferences', () => {
  it('lists differing leaves by dotted path, a missing key as null', () => {
    const tablet = { a: 1, b: { c: [1, 2], d: 'x' }, e: true };
    const server = { a: 1, b: { c: [1, 3], d: 'x', f: 2 } };
    expect(jsonDifferences(tablet, server, 10)).toEqual([
      { path: 'b.c', tablet: [1, 2], server: [1, 3] },
      { path: 'b.f', tablet: null, server: 2 },
      { path: 'e', tablet: true, server: null },
    ]);
  });

  it('stops at the limit and finds nothing in equal documents', () => {
    expect(jsonDifferences({ a: 1, b: 2, c: 3 }, { a: 0, b: 0, c: 0 }, 2).map((d) => d.path)).toEqual(['a', 'b']);
    expect(jsonDifferences({ a: { b: [1] } }, { a: { b: [1] } }, 5)).toEqual([]);
  });
});
