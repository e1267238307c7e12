import type { MolGraph } from './types';

export interface RingSystems {
  /** Each ring system as its atoms; a monocycle's atoms come in ring order. */
  systems: { atoms: number[]; bonds: number[]; monocycle: boolean }[];
  /** Ring system index per atom, -1 for acyclic atoms. */
  systemOf: Int32Array;
}

/**
 * Ring perception: a bond lies in a ring exactly when it is not a bridge (Tarjan's bridge
 * finding); ring systems are the connected pieces of ring bonds. A system with as many bonds as
 * atoms is a monocycle; anything else is fused, bridged or spiro.
 */
export function findRingSystems(graph: MolGraph): RingSystems {
  const n = graph.atoms.length;
  const order = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const isBridge = new Uint8Array(graph.bonds.length);
  let counter = 0;
  for (let root = 0; root < n; root++) {
    if (order[root] >= 0) continue;
    // Iterative DFS: stack of [atom, parent bond, next neighbour position].
    const stack: [number, number, number][] = [[root, -1, 0]];
    order[root] = low[root] = counter++;
    while (stack.length) {
      const top = stack[stack.length - 1];
      const [atom, parentBond] = top;
      if (top[2] < graph.adjacency[atom].length) {
        const { atom: next, bond } = graph.adjacency[atom][top[2]++];
        if (bond === parentBond) continue;
        if (order[next] < 0) {
          order[next] = low[next] = counter++;
          stack.push([next, bond, 0]);
        } else low[atom] = Math.min(low[atom], order[next]);
      } else {
        stack.pop();
        if (stack.length) {
          const parent = stack[stack.length - 1][0];
          low[parent] = Math.min(low[parent], low[atom]);
          if (low[atom] > order[parent]) isBridge[parentBond] = 1;
        }
      }
    }
  }
  const systemOf = new Int32Array(n).fill(-1);
  const systems: RingSystems['systems'] = [];
  for (let start = 0; start < n; start++) {
    if (systemOf[start] >= 0) continue;
    const ringBonds = graph.adjacency[start].filter((e) => !isBridge[e.bond]);
    if (ringBonds.length === 0) continue;
    const id = systems.length;
    const atoms: number[] = [];
    const bonds = new Set<number>();
    const queue = [start];
    systemOf[start] = id;
    while (queue.length) {
      const atom = queue.shift()!;
      atoms.push(atom);
      for (const { atom: next, bond } of graph.adjacency[atom]) {
        if (isBridge[bond]) continue;
        bonds.add(bond);
        if (systemOf[next] < 0) {
          systemOf[next] = id;
          queue.push(next);
        }
      }
    }
    const monocycle = bonds.size === atoms.length;
    systems.push({ atoms: monocycle ? walkCycle(graph, start, bonds) : atoms, bonds: [...bonds], monocycle });
  }
  return { systems, systemOf };
}

function walkCycle(graph: MolGraph, start: number, bonds: Set<number>): number[] {
  const cycle = [start];
  let previous = -1;
  let current = start;
  for (;;) {
    const next = graph.adjacency[current].find((e) => bonds.has(e.bond) && e.atom !== previous && !(cycle.length > 1 && e.atom === cycle[cycle.length - 2]));
    if (!next || next.atom === start) break;
    cycle.push(next.atom);
    previous = current;
    current = next.atom;
  }
  return cycle;
}

export function bondBetween(graph: MolGraph, a: number, b: number): number {
  const edge = graph.adjacency[a].find((e) => e.atom === b);
  return edge ? edge.bond : -1;
}
