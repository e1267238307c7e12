import type { NamingContext } from '../numbering/context';
import { isChainCarbon } from '../numbering/context';

interface ChainNeighbours {
  /** Acyclic carbon neighbours of every atom (chains never run through rings or heteroatoms). */
  all: number[][];
  /**
   * The same without the carbons of prefix groups: the carbon of a -COOH group is not a chain atom
   * inside a substituent, because as a prefix the whole group is 'carboxy' (2-carboxyethyl, P-65.1.5.1).
   */
  substituent: number[][];
}

/** Chain searches ask for the same neighbours many times per molecule, so they are listed once. */
const neighbourLists = new WeakMap<NamingContext, ChainNeighbours>();

function chainNeighbourLists(ctx: NamingContext): ChainNeighbours {
  let lists = neighbourLists.get(ctx);
  if (!lists) {
    const chainCarbon = ctx.graph.atoms.map((_, atom) => isChainCarbon(ctx, atom));
    const all = ctx.graph.adjacency.map((edges) => edges.filter((e) => chainCarbon[e.atom]).map((e) => e.atom));
    lists = { all, substituent: all.map((atoms) => atoms.filter((a) => !ctx.groups.has(a))) };
    neighbourLists.set(ctx, lists);
  }
  return lists;
}

/** The atoms of the acyclic carbon tree containing `start`, and its leaves (atoms with one chain neighbour or none). */
function carbonTree(neighbours: number[][], start: number): { tree: number[]; leaves: number[] } {
  const tree = [start];
  const seen = new Uint8Array(neighbours.length);
  seen[start] = 1;
  for (let i = 0; i < tree.length; i++) {
    for (const next of neighbours[tree[i]]) if (!seen[next]) (seen[next] = 1), tree.push(next);
  }
  return { tree, leaves: tree.filter((a) => neighbours[a].length <= 1) };
}

/**
 * Breadth-first search over a carbon tree from `leaf`: each atom's predecessor (-1 for the leaf)
 * and its depth (1 for the leaf, 0 where not reached).
 */
function searchFrom(neighbours: number[][], leaf: number, queue: number[]): { parent: Int32Array; depth: Int32Array } {
  const parent = new Int32Array(neighbours.length);
  const depth = new Int32Array(neighbours.length);
  parent[leaf] = -1;
  depth[leaf] = 1;
  queue.length = 0;
  queue.push(leaf);
  for (let i = 0; i < queue.length; i++) {
    const atom = queue[i];
    for (const next of neighbours[atom]) {
      if (depth[next] !== 0) continue;
      parent[next] = atom;
      depth[next] = depth[atom] + 1;
      queue.push(next);
    }
  }
  return { parent, depth };
}

function pathTo(parent: Int32Array, end: number): number[] {
  const path: number[] = [];
  for (let a = end; a !== -1; a = parent[a]) path.push(a);
  return path;
}

/**
 * All longest chains of the acyclic carbon tree containing `start` (P-44.3: the principal chain has
 * the greater number of skeletal atoms), each given in both directions. Only leaf-to-leaf paths
 * can be longest, so the search pairs leaves: breadth-first from every leaf.
 */
export function longestParentChains(ctx: NamingContext, start: number): number[][] {
  const neighbours = chainNeighbourLists(ctx).all;
  const { leaves } = carbonTree(neighbours, start);
  const queue: number[] = [];
  let best = 0;
  let pairs: [number, Int32Array][] = [];
  for (const leaf of leaves) {
    const { parent, depth } = searchFrom(neighbours, leaf, queue);
    for (const other of leaves) {
      const length = depth[other];
      if (length > best) (best = length), (pairs = []);
      if (length === best) pairs.push([other, parent]);
    }
  }
  // Each path runs from `other` to its leaf; the pair (other, leaf) supplies the reverse direction.
  return pairs.map(([other, parent]) => pathTo(parent, other));
}

/**
 * Longest chains of a substituent group that contain its attachment atom (P-29.2 and P-44.3
 * applied to the group), in both directions: the attachment atom may lie inside the chain
 * ('pentan-3-yl'). With `fromAttachment`, only chains starting at the attachment atom (the
 * 'alkyl' method of general nomenclature: '1-methylbutyl').
 */
export function longestSubstituentChains(ctx: NamingContext, atom: number, from: number, fromAttachment: boolean): number[][] {
  const neighbours = chainNeighbourLists(ctx).substituent;
  const arms: { paths: number[][]; length: number }[] = [];
  for (const first of neighbours[atom]) {
    if (first === from) continue;
    const paths = leafPaths(neighbours, first, atom);
    arms.push({ paths, length: paths[0].length });
  }
  const candidates: number[][] = [];
  const lengths = arms.map((a) => a.length).sort((a, b) => b - a);
  if (fromAttachment) {
    const best = lengths[0] ?? 0;
    if (best === 0) return [[atom]];
    for (const arm of arms) for (const p of arm.paths) if (p.length === best) candidates.push([atom].concat(p));
    return candidates;
  }
  const target = 1 + (lengths[0] ?? 0) + (lengths[1] ?? 0);
  if (arms.length === 0) return [[atom]];
  for (let i = 0; i < arms.length; i++) {
    for (const p of arms[i].paths) {
      const reversed = p.slice().reverse();
      if (1 + p.length === target) candidates.push([atom].concat(p), reversed.concat(atom));
      for (let j = i + 1; j < arms.length; j++) {
        for (const q of arms[j].paths) {
          if (1 + p.length + q.length !== target) continue;
          candidates.push(reversed.concat(atom, q), q.slice().reverse().concat(atom, p));
        }
      }
    }
  }
  return candidates;
}

/** Paths from `first` (reached from `from`) to every leaf of its branch, longest ones only (never empty). */
function leafPaths(neighbours: number[][], first: number, from: number): number[][] {
  const result: number[][] = [];
  walkToLeaves(neighbours, first, from, [], result);
  let best = 0;
  for (const p of result) best = Math.max(best, p.length);
  return result.filter((p) => p.length === best);
}

function walkToLeaves(neighbours: number[][], atom: number, previous: number, path: number[], result: number[][]): void {
  path.push(atom);
  let leaf = true;
  for (const next of neighbours[atom]) {
    if (next === previous) continue;
    leaf = false;
    walkToLeaves(neighbours, next, atom, path, result);
  }
  if (leaf) result.push(path.slice());
  path.pop();
}

/**
 * Chains of the acyclic carbon tree containing `start` with the greatest number of principal
 * characteristic groups (P-44.1.1) and, among those, the greatest length (P-44.3), in both
 * directions. `weight` counts the principal groups each atom carries. Such chains always run leaf
 * to leaf, because lengthening a chain never loses a group.
 */
export function principalChains(ctx: NamingContext, start: number, weight: (atom: number) => number): number[][] {
  const neighbours = chainNeighbourLists(ctx).all;
  const { tree, leaves } = carbonTree(neighbours, start);
  const weights = new Int32Array(neighbours.length);
  for (const atom of tree) weights[atom] = weight(atom);
  const groups = new Int32Array(neighbours.length);
  const queue: number[] = [];
  let best = { groups: -1, length: 0 };
  let paths: number[][] = [];
  for (const leaf of leaves) {
    const { parent, depth } = searchFrom(neighbours, leaf, queue);
    // The queue holds the tree in search order, so each atom's predecessor comes before it.
    groups[leaf] = weights[leaf];
    for (let i = 1; i < queue.length; i++) groups[queue[i]] = groups[parent[queue[i]]] + weights[queue[i]];
    for (const other of leaves) {
      const score = { groups: groups[other], length: depth[other] };
      const order = score.groups - best.groups || score.length - best.length;
      if (order < 0) continue;
      if (order > 0) (best = score), (paths = []);
      paths.push(pathTo(parent, other));
    }
  }
  return paths;
}

/** One atom of every acyclic carbon tree (chains cannot cross rings or heteroatoms). */
export function chainTrees(ctx: NamingContext): number[] {
  const neighbours = chainNeighbourLists(ctx).all;
  const starts: number[] = [];
  const seen = new Uint8Array(neighbours.length);
  for (let atom = 0; atom < neighbours.length; atom++) {
    if (seen[atom] || !isChainCarbon(ctx, atom)) continue;
    starts.push(atom);
    for (const a of carbonTree(neighbours, atom).tree) seen[a] = 1;
  }
  return starts;
}
