import { compareIdentifications, PEAK_POSITION_TOLERANCE_CM1, SCORE_TOLERANCE } from './identification-comparison';

// Synthetic results in the stored form (invented ids and numbers), enough fields for the comparison.
const library = { version: '1.0.0', date: '2026-12-01', contentHash: 'sha256:abc' };
const server = {
  libraryVersion: library,
  parameters: { methodVersion: '1.0.0', toleranceCm1: 10 },
  candidates: ['a', 'b', 'c', 'd', 'e', 'f'].map((id, i) => ({ id, score: 0.9 - i * 0.1 })),
  peaks: [{ x: 1000.5 }, { x: 1450.25 }, { x: 2950 }],
  processing: { gridStepCm1: 4, baseline: { lambda: 1e5 } },
};
const copy = (): Record<string, any> => JSON.parse(JSON.stringify(server));

describe('compareIdentifications', () => {
  it('finds no difference between identical results', () => {
    const { mismatch, comparison } = compareIdentifications(copy(), server, 'tablet');
    expect(mismatch).toBe(false);
    expect(comparison).toEqual({
      parametersFrom: 'tablet',
      differences: [],
      notes: [],
      libraryVersion: null,
      methodVersion: null,
      candidates: null,
      scores: [],
      peaks: null,
      processing: [],
    });
  });

  it('compares only the top five candidates, in order', () => {
    const beyondTop = copy();
    beyondTop.candidates[5].id = 'z';
    expect(compareIdentifications(beyondTop, server, 'tablet').mismatch).toBe(false);

    const swapped = copy();
    [swapped.candidates[3], swapped.candidates[4]] = [swapped.candidates[4], swapped.candidates[3]];
    const { mismatch, comparison } = compareIdentifications(swapped, server, 'tablet');
    expect(mismatch).toBe(true);
    expect(comparison.candidates).toEqual({ tablet: ['a', 'b', 'c', 'e', 'd'], server: ['a', 'b', 'c', 'd', 'e'] });
    expect(comparison.scores).toEqual([]);
  });

  it('flags band agreements further apart than the tolerance only', () => {
    const close = copy();
    close.candidates[1].score += SCORE_TOLERANCE / 2;
    expect(compareIdentifications(close, server, 'tablet').mismatch).toBe(false);

    const apart = copy();
    apart.candidates[1].score += 3 * SCORE_TOLERANCE;
    const { mismatch, comparison } = compareIdentifications(apart, server, 'tablet');
    expect(mismatch).toBe(true);
    expect(comparison.scores).toEqual([{ id: 'b', tablet: 0.8 + 3 * SCORE_TOLERANCE, server: 0.8 }]);
  });

  it('flags peaks that moved beyond the tolerance, and a different peak count', () => {
    const nudged = copy();
    nudged.peaks[1].x += PEAK_POSITION_TOLERANCE_CM1 / 2;
    expect(compareIdentifications(nudged, server, 'tablet').mismatch).toBe(false);

    const moved = copy();
    moved.peaks[2].x += 2 * PEAK_POSITION_TOLERANCE_CM1;
    expect(compareIdentifications(moved, server, 'tablet').comparison.peaks).toEqual({
      tabletCount: 3,
      serverCount: 3,
      moved: [{ tabletCm1: 2950 + 2 * PEAK_POSITION_TOLERANCE_CM1, serverCm1: 2950 }],
    });

    const fewer = copy();
    fewer.peaks.pop();
    const { comparison } = compareIdentifications(fewer, server, 'tablet');
    expect(comparison.peaks).toEqual({ tabletCount: 2, serverCount: 3, moved: [] });
    expect(comparison.differences).toEqual(['Peak count differs: tablet 2, server 3']);
  });

  it('names another ranking method version as a difference', () => {
    const older = copy();
    older.parameters.methodVersion = '0.9.0';
    const { mismatch, comparison } = compareIdentifications(older, server, 'tablet');
    expect(mismatch).toBe(true);
    expect(comparison.methodVersion).toEqual({ tablet: '0.9.0', server: '1.0.0' });
    expect(comparison.differences).toEqual(['Ranking method version differs: tablet 0.9.0, server 1.0.0']);
  });

  it('reports another library as such, not as a mismatch, and still compares the peaks', () => {
    const older = copy();
    older.libraryVersion = 'demo-1';
    // Another library ranks other compounds: not a disagreement of the identification.
    older.candidates = [{ id: 'q', score: 0.5 }];
    const { mismatch, comparison } = compareIdentifications(older, server, 'tablet');
    expect(mismatch).toBe(false);
    expect(comparison.libraryVersion).toEqual({ tablet: 'demo-1', server: '1.0.0 (sha256:abc)' });
    expect(comparison.candidates).toBeNull();
    expect(comparison.scores).toEqual([]);
    expect(comparison.notes).toEqual([
      'Compound library differs: tablet demo-1, server 1.0.0 (sha256:abc); the likely compounds were ranked against different libraries and are not compared',
    ]);

    older.peaks[0].x += 1;
    const moved = compareIdentifications(older, server, 'tablet');
    expect(moved.mismatch).toBe(true);
    expect(moved.comparison.differences).toEqual([`1 peak position(s) differ by more than ${PEAK_POSITION_TOLERANCE_CM1} cm⁻¹`]);
  });

  it('notes processing settings the server ran differently without flagging an otherwise equal result', () => {
    const tuned = copy();
    tuned.processing.baseline.lambda = 1e4;
    const { mismatch, comparison } = compareIdentifications(tuned, server, 'tablet');
    expect(mismatch).toBe(false);
    expect(comparison.processing).toEqual([{ path: 'baseline.lambda', tablet: 1e4, server: 1e5 }]);
    expect(comparison.notes).toEqual(["The server's processing differs from the tablet's recorded settings at: baseline.lambda"]);
  });

  it('says when the defaults were used, and compares nothing without a tablet result', () => {
    const { processing: _processing, ...bare } = copy();
    expect(compareIdentifications(bare, server, 'defaults').comparison.notes).toEqual([
      'The tablet recorded no processing settings: the server used the pipeline defaults',
    ]);
    const { mismatch, comparison } = compareIdentifications(null, server, 'defaults');
    expect(mismatch).toBeNull();
    expect(comparison.notes).toContain('The tablet sent no result: there is nothing to compare');
  });

  it('treats unreadable tablet fields as differences rather than failing', () => {
    const { mismatch, comparison } = compareIdentifications({ candidates: 'many', peaks: [{ x: 'far' }, {}, null] }, server, 'defaults');
    expect(mismatch).toBe(true);
    expect(comparison.candidates?.tablet).toEqual([]);
    expect(comparison.differences).toContain('Compound library not recorded: tablet not recorded, server 1.0.0 (sha256:abc)');
    expect(comparison.peaks?.moved).toEqual([
      { tabletCm1: null, serverCm1: 1000.5 },
      { tabletCm1: null, serverCm1: 1450.25 },
      { tabletCm1: null, serverCm1: 2950 },
    ]);
  });
});
