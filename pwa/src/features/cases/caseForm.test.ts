import { describe, expect, it } from 'vitest';
import { caseDataOf, emptyCaseDraft } from './caseDraft';
import { filterCases, NO_FILTER } from './filterCases';
import { caseProblems } from './saveCase';
import type { CaseListItem } from './useCases';

function item(siteName: string, startedAt: string, status: 'open' | 'submitted'): CaseListItem {
  const data = { ...caseDataOf({ ...emptyCaseDraft(), siteName }, status), startedAt };
  return { row: { id: siteName, caseId: siteName, data, version: null, sync: 'local', editedAt: 0 }, sampleCount: 0 };
}

describe('the case form', () => {
  it('turns typed coordinates (comma or point) into numbers and flags a lone latitude', () => {
    const draft = { ...emptyCaseDraft(new Date('2026-05-01T10:00:00Z')), siteName: ' Quarry ', latitude: '51,45', longitude: '-2.6', enteredByHand: true, accuracyM: '12' };
    const data = caseDataOf(draft, 'open');
    expect(data).toMatchObject({ siteName: 'Quarry', latitude: 51.45, longitude: -2.6, locationAccuracyM: null, locationEnteredByHand: true });
    expect(caseProblems(data)).toEqual([]);
    expect(caseProblems({ ...data, longitude: null })).toEqual(['capture.case.errors.bothCoordinates']);
    expect(caseProblems({ ...data, latitude: 95 })).toEqual(['capture.case.errors.latitude']);
    expect(caseProblems({ ...data, siteName: '' })).toEqual(['capture.case.errors.siteName']);
  });
});

describe('filterCases', () => {
  const items = [item('Quarry north', '2026-05-01T10:00:00Z', 'open'), item('Rail yard', '2026-05-03T10:00:00Z', 'submitted')];
  it('filters by text, status and day range together', () => {
    expect(filterCases(items, { ...NO_FILTER, text: 'QUARRY' }).map((i) => i.row.id)).toEqual(['Quarry north']);
    expect(filterCases(items, { ...NO_FILTER, status: 'submitted' }).map((i) => i.row.id)).toEqual(['Rail yard']);
    expect(filterCases(items, { ...NO_FILTER, from: '2026-05-02' }).map((i) => i.row.id)).toEqual(['Rail yard']);
    expect(filterCases(items, { ...NO_FILTER, to: '2026-05-01' }).map((i) => i.row.id)).toEqual(['Quarry north']);
    expect(filterCases(items, { ...NO_FILTER, text: 'rail', status: 'open' })).toEqual([]);
  });
});
