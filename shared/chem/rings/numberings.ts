import type { Skeleton } from '../numbering/context';
import type { MolGraph } from '../graph/types';

/** Every numbering of a monocycle: each start atom, both directions (or only from `start`). */
export function ringNumberings(graph: MolGraph, cycle: number[], start: number | null): Skeleton[] {
  const kind = isBenzene(graph, cycle) ? 'benzene' : 'ring';
  const n = cycle.length;
  const result: Skeleton[] = [];
  for (let i = 0; i < n; i++) {
    if (start !== null && cycle[i] !== start) continue;
    const forward = new Array<number>(n);
    const backward = new Array<number>(n);
    for (let k = 0; k < n; k++) {
      forward[k] = cycle[(i + k) % n];
      backward[k] = cycle[(i - k + n) % n];
    }
    result.push({ kind, atoms: forward }, { kind, atoms: backward });
  }
  return result;
}

/** A six-membered carbon ring with alternating double bonds (or aromatic bonds) is benzene. */
export function isBenzene(graph: MolGraph, cycle: number[]): boolean {
  if (cycle.length !== 6 || cycle.some((a) => graph.atoms[a].element !== 'C')) return false;
  let doubles = 0;
  for (let k = 0; k < 6; k++) {
    const a = cycle[k];
    const b = cycle[(k + 1) % 6];
    const edge = graph.adjacency[a].find((e) => e.atom === b)!;
    if (graph.bonds[edge.bond].order === 2) doubles += 1;
  }
  return doubles === 3;
}

/** Fully conjugated rings other than benzene ([n]annulenes) and aromatic flags off benzene are not named yet. */
export function isMancudeNonBenzene(graph: MolGraph, cycle: number[]): boolean {
  if (isBenzene(graph, cycle)) return false;
  if (cycle.some((a) => graph.atoms[a].aromatic)) return true;
  let doubles = 0;
  for (let k = 0; k < cycle.length; k++) {
    const edge = graph.adjacency[cycle[k]].find((e) => e.atom === cycle[(k + 1) % cycle.length])!;
    if (graph.bonds[edge.bond].order === 2) doubles += 1;
  }
  return cycle.length % 2 === 0 && doubles === cycle.length / 2;
}
