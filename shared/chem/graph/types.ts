/**
 * Our own small molecule graph: the only structure the naming engine works on.
 * openchemlib is used for parsing only; nothing downstream depends on its objects.
 */

export type ElementSymbol = string;

export interface Atom {
  /** Index of the atom in `MolGraph.atoms`; equals the atom's position in the input. */
  index: number;
  element: ElementSymbol;
  /** Formal charge (0 for neutral). */
  charge: number;
  /** Mass number when an isotope is given explicitly (e.g. 13 for [13C]); otherwise null. */
  isotope: number | null;
  /** Implicit + explicit-but-suppressed hydrogens attached to this atom. */
  hydrogens: number;
  /** Unpaired electrons (radical centre) — 0 for ordinary atoms. */
  radicalElectrons: number;
  aromatic: boolean;
  /**
   * Tetrahedral stereo mark from the input, as the input gave it: null when unspecified.
   * `neighbours` is the neighbour order the parity refers to; an implicit hydrogen counts as
   * index -1. `parity` 'clockwise' means: looking from neighbours[0], the remaining neighbours
   * run clockwise (SMILES '@@' convention).
   */
  tetrahedral: { neighbours: number[]; parity: 'clockwise' | 'anticlockwise' } | null;
  /** 2D/3D coordinates when the input had them (molfile); used for wedge interpretation. */
  position: { x: number; y: number; z: number } | null;
}

export type BondOrder = 1 | 2 | 3;

export interface Bond {
  index: number;
  from: number;
  to: number;
  /** Kekulé order; aromatic bonds are kekulised, `aromatic` keeps the fact. */
  order: BondOrder;
  aromatic: boolean;
  /**
   * Double-bond configuration from the input, null when unspecified.
   * `reference` = [a, b]: a is a neighbour of `from`, b a neighbour of `to`;
   * 'cis' means a and b lie on the same side.
   */
  doubleBondStereo: { reference: [number, number]; relation: 'cis' | 'trans' } | null;
}

export interface MolGraph {
  atoms: Atom[];
  bonds: Bond[];
  /** adjacency[i] lists { atom, bond } for every neighbour of atom i. */
  adjacency: { atom: number; bond: number }[][];
  /**
   * Stereo features the input carries that the fields above cannot hold (axial chirality, stereo
   * at unusual centres), in words. Anything listed here keeps a molecule from being named.
   */
  stereoNotes?: string[];
}
