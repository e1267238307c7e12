import type { MolGraph } from '../graph/types';
import { NamingRefusal } from '../assembly/refusal';

export type PrefixGroupKind = 'fluoro' | 'chloro' | 'bromo' | 'iodo' | 'nitro' | 'hydroxy' | 'oxo' | 'ether' | 'carboxy' | 'amino' | 'cyano' | 'carbamoyl' | 'ester' | 'acylHalide';

/**
 * A non-carbon group hanging from a carbon atom, as the engine cites it when it is not the
 * principal characteristic group: halogen (P-61.3), nitro (P-61.5), hydroxy (P-63.1.3), oxo
 * (P-64.1.2), amino (P-62.2.1.1, with its own N-substituents) prefixes; groups built on one
 * carbon are keyed by that carbon: carboxy (P-65.1.5.1), cyano (P-66.5.1.2), carbamoyl (P-66.1.4.1),
 * and the ester and acid-halide groups, which are named only as principal groups. 'ether' marks a bridging oxygen named as an alkoxy or aryloxy prefix
 * (P-63.2.2.2) from either side.
 */
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
    const group = atom.element === 'C' ? acylGroup(graph, atom.index) ?? cyanoGroup(graph, atom.index) : null;
    if (group) {
      groups.set(atom.index, group);
      for (const a of group.atoms) if (a !== atom.index) claimed.add(a);
    }
  }
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
    const amine = aminoGroup(graph, atom.index);
    if (amine) {
      groups.set(atom.index, amine);
      claimed.add(atom.index);
      continue;
    }
    const oxygen = oxygenGroup(graph, atom.index);
    if (oxygen) {
      groups.set(atom.index, oxygen);
      claimed.add(atom.index);
      continue;
    }
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

/**
 * A carbonyl carbon whose remaining neighbour, if any, is carbon, with one more group: OH (carboxy),
 * O-C (ester, the O and its carbon not being part of an anhydride), N with only carbons and
 * hydrogens otherwise (amide), or a halogen (acid halide). The group's atoms stop at the ester
 * oxygen and the amide nitrogen: the alkyl and N-groups are named on their own.
 */
function acylGroup(graph: MolGraph, c: number): PrefixGroup | null {
  const edges = graph.adjacency[c];
  const oxo = edges.find((e) => graph.atoms[e.atom].element === 'O' && graph.bonds[e.bond].order === 2 && graph.atoms[e.atom].charge === 0);
  if (!oxo) return null;
  const rest = edges.filter((e) => e !== oxo && graph.atoms[e.atom].element !== 'C');
  if (rest.length !== 1 || graph.bonds[rest[0].bond].order !== 1) return null;
  const x = rest[0].atom;
  const atom = graph.atoms[x];
  if (atom.charge !== 0 || edges.filter((e) => graph.atoms[e.atom].element === 'C').length + graph.atoms[c].hydrogens !== 1) return null;
  const others = graph.adjacency[x].filter((e) => e.atom !== c);
  const atoms = [c, oxo.atom, x];
  if (atom.element === 'O' && others.length === 0 && atom.hydrogens === 1) return { kind: 'carboxy', atom: c, atoms };
  if (atom.element === 'O' && others.length === 1 && atom.hydrogens === 0 && graph.atoms[others[0].atom].element === 'C' && !isCarbonyl(graph, others[0].atom)) {
    return { kind: 'ester', atom: c, atoms };
  }
  const nitrogenOk = others.every((e) => graph.atoms[e.atom].element === 'C' && graph.bonds[e.bond].order === 1 && !isCarbonyl(graph, e.atom));
  if (atom.element === 'N' && nitrogenOk && others.length + atom.hydrogens === 2) return { kind: 'carbamoyl', atom: c, atoms };
  if (HALO[atom.element] && others.length === 0) return { kind: 'acylHalide', atom: c, atoms };
  return null;
}

/** C#N on a carbon whose other neighbour, if any, is carbon (HCN has a hydrogen there). */
function cyanoGroup(graph: MolGraph, c: number): PrefixGroup | null {
  const edges = graph.adjacency[c];
  const triple = edges.find((e) => graph.atoms[e.atom].element === 'N' && graph.bonds[e.bond].order === 3);
  if (!triple) return null;
  const n = graph.atoms[triple.atom];
  if (n.charge !== 0 || graph.adjacency[triple.atom].length !== 1) return null;
  if (edges.some((e) => e !== triple && graph.atoms[e.atom].element !== 'C')) return null;
  return { kind: 'cyano', atom: c, atoms: [c, triple.atom] };
}

/**
 * A neutral amine nitrogen: one to three carbons by single bonds, hydrogens for the rest
 * (P-62.2). Nitrogen on a carbonyl carbon is an amide, which is refused by name.
 */
function aminoGroup(graph: MolGraph, n: number): PrefixGroup | null {
  const atom = graph.atoms[n];
  const edges = graph.adjacency[n];
  if (atom.element !== 'N' || atom.charge !== 0 || edges.length === 0) return null;
  if (edges.some((e) => graph.atoms[e.atom].element !== 'C' || graph.bonds[e.bond].order !== 1)) return null;
  if (edges.length + atom.hydrogens !== 3) return null;
  const acyl = edges.find((e) => isCarbonyl(graph, e.atom));
  if (acyl) throw new NamingRefusal(`the N atom ${n + 1} belongs to an amide or other C(=O)-N group, which is not named yet`);
  return { kind: 'amino', atom: n, atoms: [n] };
}

/** True when carbon `c` carries a doubly bonded oxygen. */
export function isCarbonyl(graph: MolGraph, c: number): boolean {
  return graph.adjacency[c].some((e) => graph.atoms[e.atom].element === 'O' && graph.bonds[e.bond].order === 2);
}

/**
 * Neutral oxygen on carbon: C-OH (hydroxy), C=O on a carbon whose other neighbours are carbon or
 * hydrogen only (ketone or aldehyde: oxo), C-O-C (ether). Oxygen on a carbonyl carbon belongs to
 * an acid, ester or anhydride, which are refused by name here rather than taken apart.
 */
function oxygenGroup(graph: MolGraph, o: number): PrefixGroup | null {
  const atom = graph.atoms[o];
  const neighbours = graph.adjacency[o];
  if (atom.element !== 'O' || atom.charge !== 0 || neighbours.some((e) => graph.atoms[e.atom].element !== 'C')) return null;
  const carbons = neighbours.map((e) => e.atom);
  const where = `the O atom ${o + 1}`;
  if (neighbours.length === 1 && graph.bonds[neighbours[0].bond].order === 2) {
    const c = carbons[0];
    const others = graph.adjacency[c].filter((e) => e.atom !== o);
    if (others.some((e) => graph.atoms[e.atom].element !== 'C')) throw new NamingRefusal(carbonylRefusal(graph, c, where));
    if (graph.atoms[c].hydrogens === 0 && others.length < 2) throw new NamingRefusal(`${where} belongs to a ketene (C=C=O), which is not named yet`);
    return { kind: 'oxo', atom: o, atoms: [o] };
  }
  if (neighbours.some((e) => graph.bonds[e.bond].order !== 1)) return null;
  if (carbons.some((c) => isCarbonyl(graph, c))) throw new NamingRefusal(carbonylRefusal(graph, carbons.find((c) => isCarbonyl(graph, c))!, where));
  if (neighbours.length === 1 && atom.hydrogens === 1) return { kind: 'hydroxy', atom: o, atoms: [o] };
  if (neighbours.length === 2 && atom.hydrogens === 0) return { kind: 'ether', atom: o, atoms: [o] };
  return null;
}

function carbonylRefusal(graph: MolGraph, c: number, where: string): string {
  const elements = new Set(graph.adjacency[c].map((e) => graph.atoms[e.atom].element));
  if (graph.adjacency[c].some((e) => graph.atoms[e.atom].charge !== 0)) return `${where} belongs to a charged group (e.g. a carboxylate): ions are not named yet`;
  const carbonylOxygens = graph.adjacency[c].filter((e) => graph.atoms[e.atom].element === 'O').length;
  if (elements.has('N')) return `${where} belongs to an amide or other C(=O)-N group, which is not named yet`;
  if ([...elements].some((x) => HALO[x])) return `${where} belongs to an acid halide, which is not named yet`;
  if (carbonylOxygens >= 2) return `${where} belongs to a carboxylic acid, ester, anhydride or carbonate, which is not named yet`;
  return `${where} belongs to a carbonyl group with a heteroatom on its carbon, which is not named yet`;
}

function describeUnhandled(graph: MolGraph, index: number): string {
  const atom = graph.atoms[index];
  if (atom.charge !== 0) return `charged atom ${atom.element}${atom.charge > 0 ? '+' : '-'} (atom ${index + 1}): ions are not named yet`;
  if (['N', 'O', 'S', 'P', 'B'].includes(atom.element)) {
    return `the ${atom.element} atom ${index + 1} belongs to a characteristic group that is not named yet (named: halogen, nitro, acids, aldehydes, ketones, alcohols, ethers, amines)`;
  }
  return `atom ${index + 1} (${atom.element}) is not handled yet`;
}
