/**
 * Hand-built MolGraphs for worked examples, independent of any parser: atoms as
 * [element, implicit H], bonds as [from, to, order], stereo marks given explicitly.
 */
import type { Atom, Bond, BondOrder, MolGraph } from '../../../../../shared/chem/graph/types';

export function build(
  atomSpecs: [string, number][],
  bondSpecs: [number, number, BondOrder][],
  marks: {
    tetrahedral?: Record<number, NonNullable<Atom['tetrahedral']>>;
    doubleBonds?: Record<number, NonNullable<Bond['doubleBondStereo']>>;
    isotopes?: Record<number, number>;
  } = {},
): MolGraph {
  const atoms: Atom[] = atomSpecs.map(([element, hydrogens], index) => ({
    index, element, charge: 0, isotope: marks.isotopes?.[index] ?? null, hydrogens, radicalElectrons: 0,
    aromatic: false, tetrahedral: marks.tetrahedral?.[index] ?? null, position: null,
  }));
  const adjacency: MolGraph['adjacency'] = atoms.map(() => []);
  const bonds: Bond[] = bondSpecs.map(([from, to, order], index) => {
    adjacency[from].push({ atom: to, bond: index });
    adjacency[to].push({ atom: from, bond: index });
    return { index, from, to, order, aromatic: false, doubleBondStereo: marks.doubleBonds?.[index] ?? null };
  });
  return { atoms, bonds, adjacency };
}
