import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { initI18n } from '../../i18n';
import { addSignedInStrings } from '../../i18n/signedInStrings';
import { answerStructureRequest } from '../../features/structure/structureProtocol';
import { StructureCheckResult } from './StructureCheckResult';

beforeAll(async () => {
  await initI18n();
  addSignedInStrings();
});
afterEach(cleanup);

function outcomeOf(text: string) {
  const reply = answerStructureRequest({ id: 1, text });
  if (!reply.ok) throw new Error(reply.problem.message);
  return { check: reply.check, table: reply.table };
}

// Idealised CO2 (C=O 1.16 Å) and ammonia; their Γvib follow from the point group alone.
const CO2 = ['3', 'carbon dioxide', 'C 0 0 0', 'O 0 0 1.16', 'O 0 0 -1.16'].join('\n');
const AMMONIA = ['4', 'ammonia', 'N 0 0 0.1', 'H 0.94 0 -0.27', 'H -0.47 0.814 -0.27', 'H -0.47 -0.814 -0.27'].join('\n');

describe('StructureCheckResult', () => {
  it('shows the group, Γvib, counts and one table row per species for ammonia', () => {
    render(<StructureCheckResult outcome={outcomeOf(AMMONIA)} />);
    expect(screen.getByTestId('structure-point-group').textContent).toBe('C3v');
    expect(screen.getByTestId('structure-gamma-vib').textContent).toBe('2A1 + 2E');
    expect(screen.getByTestId('count-ir').textContent).toMatch(/^4\s*IR active/);
    expect(screen.getByTestId('count-silent').textContent).toMatch(/^0\s*silent/);
    expect(screen.getByTestId('mutual-exclusion').textContent).toMatch(/Not centrosymmetric/);
    const rows = within(screen.getByTestId('modes-table')).getAllByRole('row');
    expect(rows).toHaveLength(3); // header + A1 + E
    expect(within(screen.getByTestId('character-table')).getAllByRole('row')).toHaveLength(4); // header + A1, A2, E
  });

  it('states mutual exclusion for a centrosymmetric molecule and names the model group of a linear one', () => {
    render(<StructureCheckResult outcome={outcomeOf(CO2)} />);
    expect(screen.getByTestId('structure-point-group').textContent).toBe('D∞h');
    expect(screen.getByTestId('mutual-exclusion').textContent).toMatch(/mutual exclusion holds/);
    expect(screen.getByTestId('count-both').textContent).toMatch(/^0\s*in both/);
    expect(screen.getByText(/worked on its finite model group/)).toBeTruthy();
  });
});
