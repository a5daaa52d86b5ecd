import { BadRequestException } from '@nestjs/common';
import { checkStructure } from '@siteband/shared';
import { SymmetryService } from './symmetry.service';

// Idealised ammonia: r(N–H) 1.012 Å, ∠HNH 106.7° (invented placement, standard bond data from memory of the CRC Handbook).
const AMMONIA = '4\nammonia\nN 0 0 0\nH 0.937530 0 -0.381028\nH -0.468765 0.811924 -0.381028\nH -0.468765 -0.811924 -0.381028\n';
const service = new SymmetryService();
const refused = (run: () => unknown): BadRequestException => {
  try {
    run();
  } catch (error) {
    if (error instanceof BadRequestException) return error;
    throw error;
  }
  throw new Error('expected a 400');
};

describe('SymmetryService', () => {
  it('answers the shared checkStructure object (the command line’s `symmetry --json`)', () => {
    const check = service.checkText(AMMONIA, {});
    expect(check).toEqual(checkStructure(AMMONIA));
    // Γvib of NH3 (C3v) = 2A1 + 2E, 4 IR- and 4 Raman-active fundamentals: Cotton, Chemical Applications of Group Theory, from memory.
    expect([check.pointGroup, check.vibrations.gamma, check.vibrations.irActive, check.vibrations.ramanActive]).toEqual(['C3v', { A1: 2, E: 2 }, 4, 4]);
  });

  it('passes the options on: the xz convention relabels a planar C2v molecule’s B modes', () => {
    // Water in the yz plane (invented placement); Mulliken yz gives 2A1 + B2, the xz plane 2A1 + B1 (REFERENCES §3).
    const water = '3\nwater\nO 0 0 0.1173\nH 0 0.7572 -0.4692\nH 0 -0.7572 -0.4692\n';
    expect(service.checkText(water, { convention: 'yz' }).vibrations.gamma).toEqual({ A1: 2, B2: 1 });
    expect(service.checkText(water, { convention: 'xz' }).vibrations.gamma).toEqual({ A1: 2, B1: 1 });
  });

  it('takes the format from the file name and refuses files that are not UTF-8 text', () => {
    const asMol = () => service.checkFile({ originalname: 'ammonia.mol', buffer: Buffer.from(AMMONIA) }, {});
    expect(refused(asMol).message).toMatch(/^line \d+: /);
    expect(service.checkFile({ originalname: 'ammonia.xyz', buffer: Buffer.from(AMMONIA) }, {}).pointGroup).toBe('C3v');
    expect(refused(() => service.checkFile({ originalname: 'x.xyz', buffer: Buffer.from([0x34, 0x0a, 0xff, 0xfe]) }, {})).message).toContain('not UTF-8 text');
    expect(refused(() => service.checkFile({ originalname: 'x.xyz', buffer: Buffer.from('4\n\u0000') }, {})).message).toContain('binary data');
  });

  it('answers a 400 naming the line for a bad structure, and for a tolerance the engine refuses', () => {
    const error = refused(() => service.checkText('3\nbad\nO 0 0 0\nH 0 0.75 x\nH 0 -0.75 0\n', {}));
    expect(error.getResponse()).toEqual({ message: expect.stringMatching(/^line 4: /), details: [{ field: 'structure', messages: [expect.stringMatching(/^line 4: /)] }] });
    expect(refused(() => service.checkText(AMMONIA, { tolerance: 5 })).message).toMatch(/tolerance/);
  });
});
