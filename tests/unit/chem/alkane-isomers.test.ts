import { beforeAll, describe, expect, it } from 'vitest';
import { describeSync, loadChemistry, type NameStyle } from '../../../shared/chem/index';
import { alkaneIsomerSmiles } from './support/alkanes';

// OEIS A000602: number of n-node unrooted quartic trees = constitutional isomers of CnH2n+2.
const A000602 = [1, 1, 1, 2, 3, 5, 9, 18, 35, 75, 159, 355];

const isomers = alkaneIsomerSmiles(12);

beforeAll(loadChemistry);

describe('acyclic alkane isomers C1–C12', () => {
  it('our enumerator reproduces OEIS A000602', () => {
    expect(isomers.slice(1).map((list) => list.length)).toEqual(A000602);
  });

  for (const style of ['preferred', 'traditional'] as NameStyle[]) {
    it(`names every isomer, all names distinct (${style})`, () => {
      const seen = new Map<string, string>();
      for (let n = 1; n <= 12; n++) {
        for (const smiles of isomers[n]) {
          const { naming, formula } = describeSync({ smiles }, { style });
          expect(formula).toBe(n === 1 ? 'CH4' : `C${n}H${2 * n + 2}`);
          if (!naming.ok) throw new Error(`${smiles}: ${naming.reason}`);
          expect(naming.name).toMatch(/ane$/);
          const clash = seen.get(naming.name);
          if (clash) throw new Error(`${smiles} and ${clash} both named ${naming.name}`);
          seen.set(naming.name, smiles);
        }
      }
      expect(seen.size).toBe(A000602.reduce((a, b) => a + b, 0));
    });
  }

  it('the parent chain is a longest chain and the explanation covers every carbon', () => {
    for (const smiles of isomers[10]) {
      const { naming } = describeSync({ smiles });
      if (!naming.ok) throw new Error(naming.reason);
      const atoms = new Set([...naming.explanation.parent.atoms, ...naming.explanation.substituents.flatMap((s) => s.atoms)]);
      expect(atoms.size).toBe(10);
      // The stem of the parent name tells its length; no substituent may hold a longer chain.
      for (const s of naming.explanation.substituents) expect(s.atoms.length * 2).toBeLessThanOrEqual(10);
    }
  });
});
