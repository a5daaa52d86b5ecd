import { describe, expect, it } from 'vitest';
import { answerStructureRequest, characterTableOf } from './structureProtocol';

// Ammonia near its experimental geometry (N–H 1.01 Å, pyramidal); any C3v pyramid gives 2A1 + 2E.
const AMMONIA = ['4', 'ammonia', 'N 0 0 0.1', 'H 0.94 0 -0.27', 'H -0.47 0.814 -0.27', 'H -0.47 -0.814 -0.27'].join('\n');

describe('answerStructureRequest', () => {
  it('answers a good structure with its point group, Γvib and the group table', () => {
    const reply = answerStructureRequest({ id: 7, text: AMMONIA });
    expect(reply.id).toBe(7);
    if (!reply.ok) throw new Error(reply.problem.message);
    expect(reply.check.pointGroup).toBe('C3v');
    expect(reply.check.vibrations.gamma).toEqual({ A1: 2, E: 2 });
    expect(reply.table.group).toBe('C3v');
    expect(reply.table.classes).toEqual(['E', '2C3', '3σv']);
    expect(reply.table.rows.map((r) => r.label)).toEqual(['A1', 'A2', 'E']);
  });

  it('names the line of a malformed XYZ file', () => {
    const broken = AMMONIA.replace('H -0.47 0.814 -0.27', 'H -0.47 zero -0.27');
    const reply = answerStructureRequest({ id: 1, text: broken });
    expect(reply.ok).toBe(false);
    if (reply.ok) return;
    expect(reply.problem.line).toBe(5);
    expect(reply.problem.message).toMatch(/line 5/);
  });

  it('passes the tolerance on, so an impossible one is refused with a message', () => {
    const reply = answerStructureRequest({ id: 2, text: AMMONIA, tolerance: -1 });
    expect(reply.ok).toBe(false);
    if (reply.ok) return;
    expect(reply.problem.line).toBeNull();
    expect(reply.problem.message.length).toBeGreaterThan(0);
  });

  it('follows the planar convention for water: yz puts the antisymmetric stretch in B2, xz in B1', () => {
    const water = ['3', 'water', 'O 0 0 0.117', 'H 0 0.757 -0.469', 'H 0 -0.757 -0.469'].join('\n');
    const yz = answerStructureRequest({ id: 3, text: water, convention: 'yz' });
    const xz = answerStructureRequest({ id: 4, text: water, convention: 'xz' });
    if (!yz.ok || !xz.ok) throw new Error('water was refused');
    expect(yz.check.vibrations.gamma).toEqual({ A1: 2, B2: 1 });
    expect(xz.check.vibrations.gamma).toEqual({ A1: 2, B1: 1 });
  });
});

describe('characterTableOf', () => {
  it('shows a linear group through its finite model group', () => {
    const table = characterTableOf('D∞h');
    expect(table.group).not.toBe('D∞h');
    expect(table.rows.length).toBeGreaterThan(4);
    for (const row of table.rows) expect(row.characters).toHaveLength(table.classes.length);
  });
});
