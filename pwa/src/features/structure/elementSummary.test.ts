import { describe, expect, it } from 'vitest';
import { elementSummary } from './elementSummary';

describe('elementSummary', () => {
  it('counts repeated elements and keeps the order they were found in', () => {
    const found = [{ label: 'E' }, { label: 'C3' }, { label: 'σv' }, { label: 'σv' }, { label: 'σv' }];
    expect(elementSummary(found)).toEqual([
      { label: 'E', count: 1 },
      { label: 'C3', count: 1 },
      { label: 'σv', count: 3 },
    ]);
  });

  it('gives nothing for nothing', () => {
    expect(elementSummary([])).toEqual([]);
  });
});
