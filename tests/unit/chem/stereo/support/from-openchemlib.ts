/**
 * Test-only bridge from openchemlib to our MolGraph, used until shared/chem/parsing fills the
 * stereo fields. Only connectivity and the raw parities are read, never openchemlib's CIP labels.
 *
 * openchemlib parity conventions (determined on small probes, then confirmed by the RDKit
 * comparison in the tests): atom parity 1/2 refers to the neighbours in ascending atom index with
 * an implicit hydrogen last, 1 = looking from the first, the rest clockwise; bond parity 1/2
 * refers to the lowest-index neighbour on each end, 1 = trans, 2 = cis.
 */
import * as OCL from 'openchemlib';
import type { Atom, Bond, BondOrder, MolGraph } from '../../../../../shared/chem/graph/types';

export function graphFromSmiles(smiles: string): MolGraph {
  const mol = OCL.Molecule.fromSmiles(smiles);
  mol.ensureHelperArrays(OCL.Molecule.cHelperParities);
  const n = mol.getAllAtoms();
  const atoms: Atom[] = [];
  for (let i = 0; i < n; i++) {
    atoms.push({
      index: i,
      element: mol.getAtomLabel(i),
      charge: mol.getAtomCharge(i),
      isotope: mol.getAtomMass(i) || null,
      hydrogens: mol.getImplicitHydrogens(i),
      radicalElectrons: 0,
      aromatic: mol.isAromaticAtom(i),
      tetrahedral: null,
      position: null,
    });
  }
  const bonds: Bond[] = [];
  const adjacency: MolGraph['adjacency'] = atoms.map(() => []);
  for (let b = 0; b < mol.getAllBonds(); b++) {
    const from = mol.getBondAtom(0, b);
    const to = mol.getBondAtom(1, b);
    bonds.push({ index: b, from, to, order: mol.getBondOrder(b) as BondOrder, aromatic: mol.isAromaticBond(b), doubleBondStereo: null });
    adjacency[from].push({ atom: to, bond: b });
    adjacency[to].push({ atom: from, bond: b });
  }
  for (let i = 0; i < n; i++) {
    const parity = mol.getAtomParity(i);
    if (parity !== 1 && parity !== 2) continue;
    const neighbours = adjacency[i].map((x) => x.atom).sort((a, b) => a - b);
    if (atoms[i].hydrogens === 1) neighbours.push(-1);
    atoms[i].tetrahedral = { neighbours, parity: parity === 1 ? 'clockwise' : 'anticlockwise' };
  }
  for (const bond of bonds) {
    const parity = mol.getBondParity(bond.index);
    if (bond.order !== 2 || (parity !== 1 && parity !== 2)) continue;
    const lowest = (end: number, other: number) =>
      Math.min(...adjacency[end].map((x) => x.atom).filter((a) => a !== other));
    bond.doubleBondStereo = {
      reference: [lowest(bond.from, bond.to), lowest(bond.to, bond.from)],
      relation: parity === 1 ? 'trans' : 'cis',
    };
  }
  return { atoms, bonds, adjacency };
}
