import type { Atom, Bond, BondOrder, MolGraph } from '../graph/types';
import { ChemInputError } from './errors';
import { MAX_HEAVY_ATOMS, MAX_INPUT_CHARACTERS } from './limits';
import { checkElement, checkSmilesSyntax } from './smiles-syntax';
import { checkMolfileShape } from './molfile-shape';

type OclModule = typeof import('openchemlib');
type OclMolecule = InstanceType<OclModule['Molecule']>;

let ocl: OclModule | null = null;
/**
 * One parser and one scratch molecule serve every SMILES: a parse clears the molecule first, and
 * nothing keeps it after `toGraph` (the canonical forms parse afresh), so the allocations of a
 * new parser and molecule per input are saved.
 */
let smilesParser: InstanceType<OclModule['SmilesParser']> | null = null;
let scratch: OclMolecule | null = null;

/** openchemlib is ESM and slow to initialise, so it is imported on first need only. */
export async function loadChemistry(): Promise<void> {
  if (ocl) return;
  const module = await import('openchemlib');
  ocl = ((module as unknown as { default?: OclModule }).default ?? module) as OclModule;
  // The first molecule pays the one-time initialisation; do it here rather than on a user's input.
  ocl.Molecule.fromSmiles('CC');
  smilesParser = new ocl.SmilesParser();
  scratch = new ocl.Molecule(0, 0);
}

function library(): OclModule {
  if (!ocl) throw new Error('call loadChemistry() before describeSync()');
  return ocl;
}

export type ChemInput = { smiles: string } | { molfile: string };

export interface ParsedMolecule {
  graph: MolGraph;
  /** openchemlib's canonical ID code (constitution, charges, isotopes and stereo); computed on demand. */
  canonical: () => string;
  /** openchemlib's canonical isomeric SMILES; computed on demand. */
  smiles: () => string;
}

export function parseInput(input: ChemInput): ParsedMolecule {
  const { Molecule } = library();
  let molecule: OclMolecule;
  let full = (): OclMolecule => molecule;
  let stereo = true;
  if ('smiles' in input) {
    const smiles = input.smiles.trim();
    if (smiles === '') throw new ChemInputError('empty', 'the SMILES is empty');
    if (smiles.length > MAX_INPUT_CHARACTERS) tooLarge(`${smiles.length} characters`);
    checkSmilesSyntax(smiles);
    // Parity perception is the costliest step and only marks (@, /, \\) can give parities.
    stereo = /[@/\\]/.test(smiles);
    // Without invented 2D coordinates the parse is ~40x faster and the stereo parities are the
    // same (they come from @/@@ and / \\); the canonical forms below use a full parse.
    molecule = guard(() => smilesParser!.parseMolecule(smiles, { noCoordinates: true, noStereo: !stereo, molecule: scratch! }), 'SMILES');
    full = () => Molecule.fromSmiles(smiles);
  } else {
    const text = input.molfile;
    if (text.trim() === '') throw new ChemInputError('empty', 'the molfile is empty');
    if (text.length > MAX_INPUT_CHARACTERS * 10) tooLarge(`${text.length} characters`);
    checkMolfileShape(text);
    molecule = guard(() => Molecule.fromMolfile(text), 'molfile');
    if (molecule.getAllAtoms() === 0) throw new ChemInputError('unparsable', 'molfile: no atoms could be read');
  }
  molecule.ensureHelperArrays(stereo ? Molecule.cHelperParities : Molecule.cHelperRings);
  const graph = toGraph(molecule, 'molfile' in input, stereo);
  let canonicalForm: OclMolecule | null = null;
  const canonicalMolecule = () => (canonicalForm ??= full());
  return { graph, canonical: () => canonicalMolecule().getIDCode(), smiles: () => canonicalMolecule().toIsomericSmiles() };
}

function guard(parse: () => OclMolecule, what: string): OclMolecule {
  try {
    return parse();
  } catch (error) {
    const detail = String((error as Error)?.message ?? error).replace(/^.*?(SmilesParser|MolfileParser)?:\s*/, '');
    throw new ChemInputError('unparsable', `${what}: ${detail}`);
  }
}

function tooLarge(what: string): never {
  throw new ChemInputError('too_large', `the input is too large (${what})`);
}

/**
 * Converts openchemlib's molecule into our graph. Plain hydrogen atoms (openchemlib moves them
 * behind all other atoms) are folded into their neighbour's hydrogen count; isotope-labelled
 * hydrogens stay atoms so that formula and masses see them.
 */
function toGraph(mol: OclMolecule, hasCoordinates: boolean, stereo: boolean): MolGraph {
  const kept = mol.getAtoms(); // atoms before this index are everything except plain hydrogens
  let heavy = 0;
  for (let a = 0; a < kept; a++) if (mol.getAtomicNo(a) !== 1) heavy += 1;
  if (heavy > MAX_HEAVY_ATOMS) {
    throw new ChemInputError('too_large', `the molecule has ${heavy} non-hydrogen atoms; at most ${MAX_HEAVY_ATOMS} are accepted`);
  }
  const isFragment = mol.isFragment();
  const atoms: Atom[] = [];
  const adjacency: MolGraph['adjacency'] = [];
  for (let a = 0; a < kept; a++) {
    const symbol = mol.getAtomLabel(a);
    checkElement(symbol, null);
    if (mol.getAtomicNo(a) === 0 || (isFragment && mol.getAtomList(a)?.length)) {
      throw new ChemInputError('unsupported_feature', 'query atoms (atom lists, R groups) are not supported');
    }
    // Plain hydrogens come after all other neighbours in openchemlib's neighbour lists.
    const plainHydrogens = mol.getAllConnAtoms(a) - mol.getConnAtoms(a);
    const mass = mol.getAtomMass(a);
    atoms.push({
      index: a,
      element: symbol,
      charge: mol.getAtomCharge(a),
      isotope: mass > 0 ? mass : null,
      hydrogens: mol.getImplicitHydrogens(a) + plainHydrogens,
      radicalElectrons: radicalElectrons(mol.getAtomRadical(a)),
      aromatic: mol.isAromaticAtom(a),
      tetrahedral: null,
      // openchemlib's y axis points down; molfiles' points up.
      position: hasCoordinates ? { x: mol.getAtomX(a), y: -mol.getAtomY(a), z: mol.getAtomZ(a) } : null,
    });
    adjacency.push([]);
  }
  const bonds: Bond[] = [];
  const bondIndexOf = new Map<number, number>();
  const bondCount = mol.getAllBonds();
  for (let b = 0; b < bondCount; b++) {
    const from = mol.getBondAtom(0, b);
    const to = mol.getBondAtom(1, b);
    if (from >= kept || to >= kept) continue;
    const order = mol.getBondOrder(b);
    if (order < 1 || order > 3) {
      throw new ChemInputError('unsupported_feature', `bond order ${order} between atoms ${from + 1} and ${to + 1} is not supported`);
    }
    const index = bonds.length;
    if (stereo) bondIndexOf.set(b, index);
    bonds.push({ index, from, to, order: order as BondOrder, aromatic: mol.isAromaticBond(b), doubleBondStereo: null });
    // Neighbour lists in bond order, as every part of the engine has always seen them.
    adjacency[from].push({ atom: to, bond: index });
    adjacency[to].push({ atom: from, bond: index });
  }
  const graph: MolGraph = { atoms, bonds, adjacency, stereoNotes: [] };
  if (stereo) {
    readTetrahedralParities(mol, graph, kept);
    readDoubleBondParities(mol, graph, kept, bondIndexOf);
  }
  return graph;
}

function radicalElectrons(radical: number): number {
  // openchemlib: 16 = doublet (one unpaired electron), 32/48 = singlet/triplet carbene-like (two).
  if (radical === 16) return 1;
  if (radical === 32 || radical === 48) return 2;
  return 0;
}

/**
 * openchemlib's atom parity (Molecule.getAtomParity): with the neighbour of highest atom index
 * (an implicit or plain hydrogen counts as highest) pointing away from the viewer, parity 1 means
 * the other three neighbours run clockwise in ascending index order. Our graph records the view
 * *from* that highest neighbour (SMILES convention), which reverses the sense: parity 1 becomes
 * 'anticlockwise'. Hydrogens are -1 in our neighbour lists.
 */
function readTetrahedralParities(mol: OclMolecule, graph: MolGraph, kept: number): void {
  const { Molecule } = library();
  for (let a = 0; a < kept; a++) {
    const parity = mol.getAtomParity(a);
    if (parity !== Molecule.cAtomParity1 && parity !== Molecule.cAtomParity2) continue;
    const neighbours: number[] = [];
    for (let k = 0; k < mol.getAllConnAtoms(a); k++) neighbours.push(mol.getConnAtom(a, k));
    const isAllene = mol.getAllConnAtoms(a) === 2 && mol.getAtomPi(a) === 2;
    if (isAllene) {
      graph.stereoNotes!.push(`axial (allene) configuration at atom ${a + 1}`);
      continue;
    }
    const implicit = mol.getImplicitHydrogens(a);
    if (neighbours.length + implicit !== 4) {
      graph.stereoNotes!.push(`stereo centre at atom ${a + 1} (${graph.atoms[a].element}) with ${neighbours.length + implicit} neighbours`);
      continue;
    }
    neighbours.sort((x, y) => x - y);
    const highest = implicit > 0 ? -1 : neighbours.pop()!;
    const ordered = [highest, ...neighbours].map((n) => (n >= kept ? -1 : n));
    graph.atoms[a].tetrahedral = { neighbours: ordered, parity: parity === Molecule.cAtomParity1 ? 'anticlockwise' : 'clockwise' };
  }
}

/**
 * openchemlib's double-bond parity (Molecule.getBondParity): 1 ("E") when the neighbours of lowest
 * atom index at either end lie on opposite sides, 2 ("Z") when on the same side. We record those
 * two neighbours as the reference pair. Axial parities on single bonds are noted, not kept.
 */
function readDoubleBondParities(mol: OclMolecule, graph: MolGraph, kept: number, bondIndexOf: Map<number, number>): void {
  const { Molecule } = library();
  for (const [oclBond, ours] of bondIndexOf) {
    const parity = mol.getBondParity(oclBond);
    if (parity !== Molecule.cBondParityEor1 && parity !== Molecule.cBondParityZor2) continue;
    const bond = graph.bonds[ours];
    // In rings of up to seven atoms a double bond can only be cis; that is no stereo mark.
    if (bond.order === 2 && mol.isSmallRingBond(oclBond)) continue;
    if (bond.order !== 2) {
      graph.stereoNotes!.push(`axial configuration about the bond between atoms ${bond.from + 1} and ${bond.to + 1}`);
      continue;
    }
    const lowestOther = (atom: number, other: number): number => {
      let best = Infinity;
      for (let k = 0; k < mol.getAllConnAtoms(atom); k++) {
        const n = mol.getConnAtom(atom, k);
        if (n !== other) best = Math.min(best, n);
      }
      return best;
    };
    const a = lowestOther(bond.from, bond.to);
    const b = lowestOther(bond.to, bond.from);
    if (!Number.isFinite(a) || !Number.isFinite(b)) continue;
    bond.doubleBondStereo = {
      reference: [a >= kept ? -1 : a, b >= kept ? -1 : b],
      relation: parity === Molecule.cBondParityEor1 ? 'trans' : 'cis',
    };
  }
}
