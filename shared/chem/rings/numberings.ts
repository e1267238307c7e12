import type { Skeleton } from '../numbering/context';
import type { MolGraph } from '../graph/types';
import { bondBetween } from '../graph/rings';

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

/** Bond orders around a monocycle given in ring order: atoms k and k+1, the last closing the ring. */
export function cycleBondOrders(graph: MolGraph, cycle: number[]): number[] {
  const orders = new Array<number>(cycle.length);
  for (let k = 0; k < cycle.length; k++) orders[k] = graph.bonds[bondBetween(graph, cycle[k], cycle[(k + 1) % cycle.length])].order;
  return orders;
}

function doubleBondCount(graph: MolGraph, cycle: number[]): number {
  return cycleBondOrders(graph, cycle).filter((order) => order === 2).length;
}

/** A six-membered carbon ring with alternating double bonds (or aromatic bonds) is benzene. */
export function isBenzene(graph: MolGraph, cycle: number[]): boolean {
  if (cycle.length !== 6 || cycle.some((a) => graph.atoms[a].element !== 'C')) return false;
  return doubleBondCount(graph, cycle) === 3;
}

/** Fully conjugated rings other than benzene ([n]annulenes) and aromatic flags off benzene are not named yet. */
export function isMancudeNonBenzene(graph: MolGraph, cycle: number[]): boolean {
  if (isBenzene(graph, cycle)) return false;
  if (cycle.some((a) => graph.atoms[a].aromatic)) return true;
  return cycle.length % 2 === 0 && doubleBondCount(graph, cycle) === cycle.length / 2;
}
