import type { MolGraph } from '../graph/types';
import { NamingRefusal } from '../assembly/refusal';

export type PrefixGroupKind = 'fluoro' | 'chloro' | 'bromo' | 'iodo' | 'nitro';

/** A characteristic group cited only as a prefix (P-61.3 halogen compounds, P-61.5 nitro). */
export interface PrefixGroup {
  kind: PrefixGroupKind;
  /** The group's atom bonded to the skeleton carbon. */
  atom: number;
  atoms: number[];
}

const HALO: Record<string, PrefixGroupKind> = { F: 'fluoro', Cl: 'chloro', Br: 'bromo', I: 'iodo' };

/**
 * Classifies every non-carbon atom into a group the engine can name, or refuses. Returns the
 * groups keyed by their attachment atom (the atom bonded to carbon).
 */
export function findPrefixGroups(graph: MolGraph): Map<number, PrefixGroup> {
  const groups = new Map<number, PrefixGroup>();
  const claimed = new Set<number>();
  for (const atom of graph.atoms) {
    if (atom.element === 'C' || claimed.has(atom.index)) continue;
    const neighbours = graph.adjacency[atom.index];
    const halo = HALO[atom.element];
    if (halo && atom.charge === 0 && atom.hydrogens === 0 && neighbours.length === 1 && graph.atoms[neighbours[0].atom].element === 'C' && graph.bonds[neighbours[0].bond].order === 1) {
      groups.set(atom.index, { kind: halo, atom: atom.index, atoms: [atom.index] });
      claimed.add(atom.index);
      continue;
    }
    const nitro = nitroGroup(graph, atom.index);
    if (nitro) {
      groups.set(atom.index, nitro);
      for (const a of nitro.atoms) claimed.add(a);
      continue;
    }
    if (atom.element === 'O' && neighbours.length === 1 && graph.atoms[neighbours[0].atom].element === 'N' && nitroGroup(graph, neighbours[0].atom)) continue;
    throw new NamingRefusal(describeUnhandled(graph, atom.index));
  }
  return groups;
}

/** N bonded to one carbon and two oxygens, as N(=O)=O or its charge-separated form [N+](=O)[O-]. */
function nitroGroup(graph: MolGraph, n: number): PrefixGroup | null {
  const atom = graph.atoms[n];
  if (atom.element !== 'N' || atom.hydrogens !== 0) return null;
  const neighbours = graph.adjacency[n];
  if (neighbours.length !== 3) return null;
  const carbons = neighbours.filter((e) => graph.atoms[e.atom].element === 'C' && graph.bonds[e.bond].order === 1);
  const oxygens = neighbours.filter((e) => graph.atoms[e.atom].element === 'O' && graph.adjacency[e.atom].length === 1 && graph.atoms[e.atom].hydrogens === 0);
  if (carbons.length !== 1 || oxygens.length !== 2) return null;
  const charges = [atom.charge, ...oxygens.map((e) => graph.atoms[e.atom].charge)];
  const orders = oxygens.map((e) => graph.bonds[e.bond].order).sort();
  const separated = atom.charge === 1 && orders[0] === 1 && orders[1] === 2 && charges.reduce((a, b) => a + b, 0) === 0;
  const neutral = charges.every((c) => c === 0) && orders[0] === 2 && orders[1] === 2;
  if (!separated && !neutral) return null;
  return { kind: 'nitro', atom: n, atoms: [n, ...oxygens.map((e) => e.atom)] };
}

function describeUnhandled(graph: MolGraph, index: number): string {
  const atom = graph.atoms[index];
  if (atom.charge !== 0) return `charged atom ${atom.element}${atom.charge > 0 ? '+' : '-'} (atom ${index + 1}): ions are not named yet`;
  if (['N', 'O', 'S', 'P', 'B'].includes(atom.element)) {
    return `the ${atom.element} atom ${index + 1} belongs to a characteristic group that is not named yet (only halogen and nitro substituents are)`;
  }
  return `atom ${index + 1} (${atom.element}) is not handled yet`;
}
