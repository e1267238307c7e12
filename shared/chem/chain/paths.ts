import type { NamingContext } from '../numbering/context';
import { isChainCarbon } from '../numbering/context';

/** Acyclic carbon neighbours of an atom (chains never run through rings or heteroatoms). */
function chainNeighbours(ctx: NamingContext, atom: number, blocked: number): number[] {
  return ctx.graph.adjacency[atom].filter((e) => e.atom !== blocked && isChainCarbon(ctx, e.atom)).map((e) => e.atom);
}

/**
 * Chain neighbours inside a substituent group: the carbon of a -COOH group is not a chain atom
 * there, because as a prefix the whole group is 'carboxy' (2-carboxyethyl, P-65.1.5.1).
 */
function substituentChainNeighbours(ctx: NamingContext, atom: number, blocked: number): number[] {
  return chainNeighbours(ctx, atom, blocked).filter((a) => !ctx.groups.has(a));
}

/** The atoms of the acyclic carbon tree containing `start`, and its leaves (atoms with one chain neighbour or none). */
function carbonTree(ctx: NamingContext, start: number): { tree: number[]; leaves: number[] } {
  const tree: number[] = [];
  const seen = new Set<number>([start]);
  for (let i = 0, queue = [start]; i < queue.length; i++) {
    tree.push(queue[i]);
    for (const next of chainNeighbours(ctx, queue[i], -1)) if (!seen.has(next)) (seen.add(next), queue.push(next));
  }
  return { tree, leaves: tree.filter((a) => chainNeighbours(ctx, a, -1).length <= 1) };
}

/**
 * All longest chains of the acyclic carbon tree containing `start` (P-44.3: the principal chain has
 * the greater number of skeletal atoms), each given in both directions. Only leaf-to-leaf paths
 * can be longest, so the search pairs leaves: breadth-first from every leaf.
 */
export function longestParentChains(ctx: NamingContext, start: number): number[][] {
  const { leaves } = carbonTree(ctx, start);
  let best = 0;
  let pairs: [number, number, Map<number, number>][] = [];
  for (const leaf of leaves) {
    const parent = new Map<number, number>([[leaf, -1]]);
    const depth = new Map<number, number>([[leaf, 1]]);
    for (let i = 0, queue = [leaf]; i < queue.length; i++) {
      for (const next of chainNeighbours(ctx, queue[i], -1)) {
        if (parent.has(next)) continue;
        parent.set(next, queue[i]);
        depth.set(next, depth.get(queue[i])! + 1);
        queue.push(next);
      }
    }
    for (const other of leaves) {
      const length = depth.get(other)!;
      if (length > best) (best = length), (pairs = []);
      if (length === best) pairs.push([leaf, other, parent]);
    }
  }
  return pairs.map(([, other, parent]) => {
    const path: number[] = [];
    for (let a = other; a !== -1; a = parent.get(a)!) path.push(a);
    return path; // runs from `other` to `leaf`; the pair (other, leaf) supplies the reverse direction
  });
}

/**
 * Longest chains of a substituent group that contain its attachment atom (P-29.2 and P-44.3
 * applied to the group), in both directions: the attachment atom may lie inside the chain
 * ('pentan-3-yl'). With `fromAttachment`, only chains starting at the attachment atom (the
 * 'alkyl' method of general nomenclature: '1-methylbutyl').
 */
export function longestSubstituentChains(ctx: NamingContext, atom: number, from: number, fromAttachment: boolean): number[][] {
  const branches = substituentChainNeighbours(ctx, atom, from).map((first) => leafPaths(ctx, first, atom));
  const longest = (paths: number[][]) => Math.max(0, ...paths.map((p) => p.length));
  const arms = branches.map((paths) => ({ paths, length: longest(paths) }));
  const candidates: number[][] = [];
  const lengths = arms.map((a) => a.length).sort((a, b) => b - a);
  if (fromAttachment) {
    const best = lengths[0] ?? 0;
    if (best === 0) return [[atom]];
    for (const arm of arms) for (const p of arm.paths) if (p.length === best) candidates.push([atom, ...p]);
    return candidates;
  }
  const target = 1 + (lengths[0] ?? 0) + (lengths[1] ?? 0);
  if (arms.length === 0) return [[atom]];
  for (let i = 0; i < arms.length; i++) {
    for (const p of arms[i].paths) {
      if (1 + p.length === target) candidates.push([atom, ...p], [...p].reverse().concat(atom));
      for (let j = i + 1; j < arms.length; j++) {
        for (const q of arms[j].paths) {
          if (1 + p.length + q.length !== target) continue;
          candidates.push([...[...p].reverse(), atom, ...q], [...[...q].reverse(), atom, ...p]);
        }
      }
    }
  }
  return candidates;
}

/** Paths from `first` (reached from `from`) to every leaf of its branch, longest ones only. */
function leafPaths(ctx: NamingContext, first: number, from: number): number[][] {
  const result: number[][] = [];
  const walk = (atom: number, previous: number, path: number[]) => {
    path.push(atom);
    const next = substituentChainNeighbours(ctx, atom, previous);
    if (next.length === 0) result.push([...path]);
    for (const n of next) walk(n, atom, path);
    path.pop();
  };
  walk(first, from, []);
  const best = Math.max(...result.map((p) => p.length));
  return result.filter((p) => p.length === best);
}

/**
 * Chains of the acyclic carbon tree containing `start` with the greatest number of principal
 * characteristic groups (P-44.1.1) and, among those, the greatest length (P-44.3), in both
 * directions. `weight` counts the principal groups each atom carries. Such chains always run leaf
 * to leaf, because lengthening a chain never loses a group.
 */
export function principalChains(ctx: NamingContext, start: number, weight: (atom: number) => number): number[][] {
  const { leaves } = carbonTree(ctx, start);
  let best = { groups: -1, length: 0 };
  let paths: number[][] = [];
  for (const leaf of leaves) {
    const parent = new Map<number, number>([[leaf, -1]]);
    const depth = new Map<number, number>([[leaf, 1]]);
    const groups = new Map<number, number>([[leaf, weight(leaf)]]);
    for (let i = 0, queue = [leaf]; i < queue.length; i++) {
      for (const next of chainNeighbours(ctx, queue[i], -1)) {
        if (parent.has(next)) continue;
        parent.set(next, queue[i]);
        depth.set(next, depth.get(queue[i])! + 1);
        groups.set(next, groups.get(queue[i])! + weight(next));
        queue.push(next);
      }
    }
    for (const other of leaves) {
      const score = { groups: groups.get(other)!, length: depth.get(other)! };
      const order = score.groups - best.groups || score.length - best.length;
      if (order < 0) continue;
      if (order > 0) (best = score), (paths = []);
      const path: number[] = [];
      for (let a = other; a !== -1; a = parent.get(a)!) path.push(a);
      paths.push(path);
    }
  }
  return paths;
}

/** One atom of every acyclic carbon tree (chains cannot cross rings or heteroatoms). */
export function chainTrees(ctx: NamingContext): number[] {
  const starts: number[] = [];
  const seen = new Set<number>();
  for (let atom = 0; atom < ctx.graph.atoms.length; atom++) {
    if (seen.has(atom) || !isChainCarbon(ctx, atom)) continue;
    starts.push(atom);
    for (const a of carbonTree(ctx, atom).tree) seen.add(a);
  }
  return starts;
}
