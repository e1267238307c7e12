import { beforeAll, describe, expect, it } from 'vitest';
import { ChemInputError, describeSync, loadChemistry } from '../../../shared/chem/index';
import { parseInput } from '../../../shared/chem/parsing/openchemlib';
import { graphToSmiles } from './support/graph-smiles';
import { canonicalSmiles, rdkit } from './support/rdkit';

beforeAll(loadChemistry);

function inputError(input: { smiles: string } | { molfile: string }): ChemInputError {
  try {
    describeSync(input);
  } catch (error) {
    if (error instanceof ChemInputError) return error;
    throw error;
  }
  throw new Error('no error raised');
}

// The SMILES faults follow the OpenSMILES specification (balanced branches, closed ring bonds,
// only the organic subset B C N O P S F Cl Br I may go without brackets, '*' is the wildcard atom);
// the element list and the 999-atom ceiling are this engine's own limits, no outside source.
describe('bad input gives typed errors that say where and what', () => {
  it.each([
    ['', 'empty', /empty/],
    ['   ', 'empty', /empty/],
    ['C(C', 'unparsable', /'\(' at position 2 is never closed/],
    ['CC)C', 'unparsable', /'\)' at position 3 has no matching/],
    ['C1CC', 'unparsable', /ring bond 1 opened at position 2 is never closed/],
    ['CC=', 'unparsable', /bond at position 3 has no atom after it/],
    ['CXC', 'unparsable', /unknown atom symbol 'X' at position 2/],
    ['C[Xx]C', 'unparsable', /unknown element 'Xx'/],
    ['CC[Fe]', 'unsupported_element', /element Fe at position 3 is not supported/],
    ['CZnC', 'unparsable', /Zn at position 2 must be written in brackets/],
    ['C*C', 'unparsable', /wildcard/],
    ['C C', 'unparsable', /space at position 2/],
    ['C'.repeat(1000), 'too_large', /1000 non-hydrogen atoms; at most 999/],
  ])('%j → %s', (smiles, code, message) => {
    const error = inputError({ smiles });
    expect(error.code).toBe(code);
    expect(error.message).toMatch(message);
  });

  it('accepts 999 heavy atoms', () => {
    // An acyclic alkane is CnH2n+2: common practice, no source.
    expect(describeSync({ smiles: 'C'.repeat(999) }).formula).toBe('C999H2000');
  });

  // CTfile Formats (MDL molfile): three header lines, then the counts line ending in V2000/V3000.
  it.each([
    ['garbage', /counts line|fewer than 4 lines/],
    ['\n\n\nnot a counts line\n', /line 4 is not a V2000 or V3000 counts line/],
    ['\n  x\n\n  2  1  0  0  0  0  0  0  0  0999 V2000\n', /file ends early/],
  ])('molfile %j is refused', (molfile, message) => {
    const error = inputError({ molfile });
    expect(error.code).toBe('unparsable');
    expect(error.message).toMatch(message);
  });
});

describe('molfiles (V2000 and V3000)', () => {
  it('reads both versions written by RDKit and names them like the SMILES', async () => {
    const rd = await rdkit();
    for (const smiles of ['CC(C)CC(C)(C)C', 'Clc1ccc(Br)cc1', 'C=CC1CCCCC1', 'C[N+](=O)[O-]', 'OC(=O)c1ccc(N)cc1', 'CCOC(C)=O', 'CC(=O)Nc1ccccc1', 'N#CCC(O)C', 'O=Cc1ccccc1O', 'CN(C)CCOc1ccccc1']) {
      const mol = rd.get_mol(smiles)!;
      const expected = describeSync({ smiles });
      for (const molfile of [mol.get_molblock(), mol.get_v3Kmolblock()]) {
        const fromFile = describeSync({ molfile });
        expect(fromFile.formula).toBe(expected.formula);
        expect(fromFile.canonical).toBe(expected.canonical);
        expect(fromFile.naming).toEqual(expected.naming);
      }
      mol.delete();
    }
  });

  it('folds explicit hydrogens of a molfile into hydrogen counts', async () => {
    const rd = await rdkit();
    const mol = rd.get_mol('CC(Cl)Br')!;
    const withH = rd.get_mol(mol.add_hs())!;
    const parsed = parseInput({ molfile: withH.get_molblock() });
    expect(parsed.graph.atoms.map((a) => `${a.element}${a.hydrogens}`)).toEqual(['C3', 'C1', 'Cl0', 'Br0']);
    expect(describeSync({ molfile: withH.get_molblock() }).naming).toMatchObject({ ok: true, name: '1-bromo-1-chloroethane' });
    mol.delete();
    withH.delete();
  });
});

/**
 * Stereo marks must reach the graph faithfully (the stereo module reads them). Check: write a
 * SMILES from our graph's marks and let RDKit (independent) confirm it is the same stereoisomer
 * as the input, for every combination of marks on a few acyclic skeletons, from SMILES and from
 * RDKit's wedged molfiles.
 */
function expand(template: string): string[] {
  const slots = template.match(/[{][^}]*[}]/g) ?? [];
  let results = [template];
  for (const slot of slots) {
    const options = slot.slice(1, -1).split('|');
    results = results.flatMap((r) => options.map((o) => r.replace(slot, o)));
  }
  return results;
}

const stereoSet = [
  'C[C{@|@@}H](Cl)CC',
  'F[C{@|@@}](Cl)(Br)C',
  'C[C{@|@@}H](Cl)[C{@|@@}H](Br)C',
  'C[C{@|@@}H](O)[C{@|@@}H](Cl)[C{@|@@}H](F)C',
  'C{/|\\}C=C{/|\\}C',
  'C{/|\\}C(CC)=C{/|\\}Cl',
  'Cl{/|\\}C=C{/|\\}C[C{@|@@}H](Br)C',
  '[C{@|@@}H](Cl)(F)CC',
  'CC{/|\\}C(C)=C(F){/|\\}Cl',
].flatMap(expand);

describe('stereo marks are kept faithfully', () => {
  it(`from SMILES (${stereoSet.length} stereoisomers)`, async () => {
    for (const smiles of stereoSet) {
      const { graph } = parseInput({ smiles });
      expect(await canonicalSmiles(graphToSmiles(graph)), smiles).toBe(await canonicalSmiles(smiles));
    }
  });

  it('from molfile wedges and coordinates (RDKit V2000 and V3000 output)', async () => {
    const rd = await rdkit();
    for (const smiles of stereoSet) {
      const mol = rd.get_mol(smiles)!;
      for (const molfile of [mol.get_molblock(), mol.get_v3Kmolblock()]) {
        const { graph } = parseInput({ molfile });
        expect(await canonicalSmiles(graphToSmiles(graph)), smiles).toBe(await canonicalSmiles(smiles));
      }
      mol.delete();
    }
  });

  it('unspecified stereo gives no marks', () => {
    // OpenSMILES: a centre or double bond without @/@@ or directional-bond marks has unspecified configuration.
    const { graph } = parseInput({ smiles: 'CC(Cl)C(Br)C=CC' });
    expect(graph.atoms.some((a) => a.tetrahedral)).toBe(false);
    expect(graph.bonds.some((b) => b.doubleBondStereo)).toBe(false);
  });
});
