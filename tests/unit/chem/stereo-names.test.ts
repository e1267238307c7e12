import { beforeAll, describe, expect, it } from 'vitest';
import { describeSync, loadChemistry } from '../../../shared/chem/index';
import { rdkit } from './support/rdkit';

/**
 * Descriptor placement (P-91.3, P-93.5): the labels come from our stereo module; here we check
 * that each lands on the right locant, against RDKit's CIP labeller (independent), and the
 * format "(2R,3S)-name", "(2E)-name", "(E)-1,2-dichloroethene" (written from memory of the
 * 2013 examples).
 */
beforeAll(loadChemistry);

async function rdkitLabels(smiles: string): Promise<{ atoms: Map<number, string>; bonds: Map<string, string> }> {
  const rd = await rdkit();
  const mol = rd.get_mol(smiles)!;
  const tags = JSON.parse(mol.get_stereo_tags()) as { CIP_atoms: [number, string][]; CIP_bonds: [number, number, string][] };
  mol.delete();
  return {
    atoms: new Map(tags.CIP_atoms.map(([a, l]) => [a, l.replace(/[()]/g, '')])),
    bonds: new Map(tags.CIP_bonds.map(([a, b, l]) => [`${Math.min(a, b)}-${Math.max(a, b)}`, l.replace(/[()]/g, '')])),
  };
}

const molecules = [
  'C[C@@H](Cl)CC', 'C[C@H](Cl)CC', 'C[C@H](Cl)[C@@H](Br)C', 'C[C@@H](Cl)[C@@H](Br)C', 'C/C=C/C', 'C/C=C\\C',
  'C/C=C/C[C@H](Cl)C', 'CC/C=C(/C)CC', 'Cl/C=C/Cl', 'Cl/C=C\\Cl', 'F[C@](Cl)(Br)I', 'C[C@@H]1CCCC[C@H]1C',
  'C[C@@H]1CCC[C@H](Cl)C1', 'CC[C@@H](C)[C@H](C)CC(C)C', 'C=C[C@H](Br)CC',
  // With principal characteristic groups on the parent (P-93.5 with P-63, P-64, P-65, P-62).
  'C[C@@H](O)CC', 'C[C@@H](O)C(=O)O', 'OC/C=C/CO', 'C/C=C/C=O', 'CCOC(=O)[C@H](C)O', 'C[C@H](Cl)C(=O)OCC',
  'O[C@@H]1CCCC[C@H]1N', 'C[C@@H](O)CC(=O)C', 'OC(=O)/C=C\\C(=O)O', 'C[C@H](N)CC', 'CC(=O)/C=C/c1ccccc1',
];

describe('stereodescriptors placed on the parent', () => {
  it.each(molecules)('%s: every descriptor matches RDKit at its locant', async (smiles) => {
    const { naming } = describeSync({ smiles });
    if (!naming.ok) throw new Error(naming.reason);
    const reference = await rdkitLabels(smiles);
    // At the front, or after the alkyl word of an ester (ethyl (2S)-2-chloropropanoate).
    const match = /(?:^|\s)\((\d*[RSEZrs](?:,\d*[RSEZrs])*)\)-/.exec(naming.name);
    expect(match, naming.name).not.toBeNull();
    const parent = naming.explanation.parent.atoms;
    const descriptors = match![1].split(',');
    expect(descriptors.length).toBe(reference.atoms.size + reference.bonds.size);
    for (const d of descriptors) {
      const [, locantText, label] = /^(\d*)([RSEZrs])$/.exec(d)!;
      const locant = locantText ? Number(locantText) : 1;
      if (label === 'E' || label === 'Z') {
        const [a, b] = [parent[locant - 1], parent[locant % parent.length]];
        expect(reference.bonds.get(`${Math.min(a, b)}-${Math.max(a, b)}`), `${naming.name} bond ${d}`).toBe(label);
      } else {
        expect(reference.atoms.get(parent[locant - 1]), `${naming.name} centre ${d}`).toBe(label);
      }
    }
  });

  it.each([
    ['C[C@@H](Cl)CC', '(2R)-2-chlorobutane'],
    ['C/C=C/C', '(2E)-but-2-ene'],
    ['C/C=C\\C', '(2Z)-but-2-ene'],
    ['Cl/C=C/Cl', '(E)-1,2-dichloroethene'],
    ['C[C@H](Cl)C(=O)OCC', 'ethyl (2S)-2-chloropropanoate'], // P-93.5: before the acid component
    ['C[C@@H](Cl)C(=O)Cl', '(2R)-2-chloropropanoyl chloride'],
    ['C[C@@H](O)CC', '(2R)-butan-2-ol'],
    ['C[C@H](C)CC', '2-methylbutane'], // a mark on a non-stereogenic centre gives no descriptor
  ])('%s → %s', (smiles, expected) => {
    const { naming } = describeSync({ smiles });
    expect(naming).toMatchObject({ ok: true, name: expected });
  });
});
