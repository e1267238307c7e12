import type { Atom, Bond, MolGraph } from '../graph/types';
import type { Descriptor, Digraph, Node } from './digraph';
import { Ranker, type Edge } from './rules';
import { StereoRefusal } from './refusal';

/** A stereogenic unit as marked in the input: a tetrahedral centre or a double bond. */
export type StereoUnit =
  | { kind: 'tetrahedral'; atom: number; mark: NonNullable<Atom['tetrahedral']>; inRing: boolean }
  | { kind: 'doubleBond'; bond: Bond; mark: NonNullable<Bond['doubleBondStereo']> };

export const focusAtoms = (unit: StereoUnit): number[] =>
  unit.kind === 'tetrahedral' ? [unit.atom] : [unit.bond.from, unit.bond.to];

function permutationIsOdd(from: number[], to: number[]): boolean {
  const p = from.map((x) => to.indexOf(x));
  if (p.includes(-1)) throw new StereoRefusal('stereo mark does not match the neighbours of its atom');
  let odd = false;
  for (let i = 0; i < p.length; i++) for (let j = i + 1; j < p.length; j++) if (p[i] > p[j]) odd = !odd;
  return odd;
}

/**
 * R/S of a tetrahedral centre at `node` (the digraph re-rooted there). The ligands are ranked; the
 * marked parity (looking from neighbours[0], the others clockwise or not) is carried over to the
 * order [lowest, highest, second, third]: seen from the lowest-ranked ligand, clockwise means the
 * highest → second → third path is anticlockwise from the viewing side of P-92.1.1, i.e. S.
 */
export function labelTetrahedral(
  dg: Digraph,
  ranker: Ranker,
  node: Node,
  unit: Extract<StereoUnit, { kind: 'tetrahedral' }>,
): Descriptor {
  dg.setRoot(node);
  const edges: Edge[] = dg.out(node).map((to) => ({ from: node, to }));
  const priority = ranker.prioritise(edges);
  if (!priority.unique) {
    const groups = ranker.groups(edges);
    const tiedHoldStereo = groups.some((g) => g.length > 1 && g.some((e) => holdsStereo(dg, e.to)));
    // With two pairs of tied branches (or a fully symmetric set), the 2013 rules need further
    // reference-based comparison (later "Rule 6"); those centres may still be stereogenic.
    if (groups.length <= 2 && (tiedHoldStereo || unit.inRing)) {
      throw new StereoRefusal(`centre at atom ${unit.atom + 1} has two pairs of equivalent ligands; not handled`);
    }
    return 'none';
  }
  // Bond duplicates (only met on re-rooted centres with a multiple bond, e.g. P=O) are not ligands.
  const ranked = edges.filter((e) => e.to.kind !== 'bondDuplicate').map((e) => e.to.atom);
  if (ranked.length !== 4) throw new StereoRefusal(`centre at atom ${unit.atom + 1} does not have four ligands`);
  const viewFromLowest = [ranked[3], ranked[0], ranked[1], ranked[2]];
  let clockwise = unit.mark.parity === 'clockwise';
  if (permutationIsOdd(unit.mark.neighbours, viewFromLowest)) clockwise = !clockwise;
  if (priority.pseudoAsymmetric) return clockwise ? 's' : 'r';
  return clockwise ? 'S' : 'R';
}

function holdsStereo(dg: Digraph, start: Node): boolean {
  const queue = [start];
  for (let i = 0; i < queue.length; i++) {
    if (queue[i].aux !== 'none') return true;
    queue.push(...dg.out(queue[i]));
  }
  return false;
}

/** True when the bond lies in a ring of at most `maxSize` atoms. */
export function bondInRing(graph: MolGraph, bondIndex: number, maxSize: number): boolean {
  const { from, to } = graph.bonds[bondIndex];
  const depth = new Map([[from, 0]]);
  const queue = [from];
  for (let i = 0; i < queue.length; i++) {
    const a = queue[i];
    if (depth.get(a)! + 1 >= maxSize) continue;
    for (const { atom, bond } of graph.adjacency[a]) {
      if (bond === bondIndex || depth.has(atom)) continue;
      if (atom === to) return true;
      depth.set(atom, depth.get(a)! + 1);
      queue.push(atom);
    }
  }
  return false;
}

/**
 * E/Z (or seqCis/seqTrans) of a double bond, with `first` the node of one of its atoms; the other
 * end must be its real tree neighbour. Each side's ligands are ranked with the digraph re-rooted at
 * that end; the marked reference atoms are swapped for the top-ranked ones.
 */
export function labelDoubleBond(
  dg: Digraph,
  ranker: Ranker,
  first: Node,
  unit: Extract<StereoUnit, { kind: 'doubleBond' }>,
): Descriptor {
  const { bond, mark } = unit;
  const partnerAtom = first.atom === bond.from ? bond.to : bond.from;
  const second = dg.neighbours(first).find((n) => n.kind === 'atom' && n.atom === partnerAtom);
  if (!second) return 'none';
  const reference = (atom: number) => (atom === bond.from ? mark.reference[0] : mark.reference[1]);
  let cis = mark.relation === 'cis';
  const pseudo: boolean[] = [];
  for (const [end, other] of [
    [first, second],
    [second, first],
  ] as const) {
    dg.setRoot(end);
    const edges: Edge[] = dg.out(end).filter((n) => n.atom !== other.atom).map((to) => ({ from: end, to }));
    const priority = ranker.prioritise(edges);
    if (!priority.unique) return 'none';
    pseudo.push(priority.pseudoAsymmetric);
    const ref = reference(end.atom);
    if (!edges.some((e) => e.to.atom === ref)) throw new StereoRefusal('double-bond reference atom is not a neighbour');
    if (edges[0].to.atom !== ref) cis = !cis;
  }
  if (pseudo[0] !== pseudo[1]) return cis ? 'seqCis' : 'seqTrans';
  return cis ? 'Z' : 'E';
}
