import type { Descriptor, Digraph, Node } from './digraph';
import { compareLabelledWithNatural } from './elements';
import { StereoRefusal } from './refusal';

/** A branch seen from `from`: the edge from → to of the digraph under the current root. */
export interface Edge {
  from: Node;
  to: Node;
}

/** Positive when `a` ranks higher. Rule 5 answers ±2 when it decides by like/unlike reference (pseudo-asymmetry). */
type Rule = (dg: Digraph, a: Edge, b: Edge) => number;

const cmp = (x: number, y: number) => (x > y ? 1 : x < y ? -1 : 0);

// Rule 1a (P-92.1.4.1): higher atomic number first.
const rule1a: Rule = (_dg, a, b) => cmp(a.to.z, b.to.z);

// Rule 1b (P-92.1.4.1, 2013 wording): a duplicate whose original is nearer the root ranks higher;
// applied, as in the 2013 text, to the root distance recorded on every node.
const rule1b: Rule = (_dg, a, b) => cmp(b.to.dist, a.to.dist);

// Rule 2 (P-92.1.4.2): higher mass number first.
const rule2: Rule = (_dg, a, b) => {
  const x = a.to;
  const y = b.to;
  if (x.isotope === null && y.isotope === null) return 0;
  if (x.isotope !== null && y.isotope !== null) return cmp(x.isotope, y.isotope);
  if (x.element !== y.element) return 0; // unreachable after Rule 1a ties; kept neutral
  return x.isotope !== null ? compareLabelledWithNatural(x.element, x.isotope) : -compareLabelledWithNatural(y.element, y.isotope!);
};

// Rule 3 (P-92.1.4.3): seqcis (Z) before seqtrans (E) before non-stereogenic double bonds.
const ORDER3: Partial<Record<Descriptor, number>> = { Z: 2, E: 1 };
const rule3: Rule = (_dg, a, b) => cmp(ORDER3[a.to.aux] ?? 0, ORDER3[b.to.aux] ?? 0);

// Rule 4a (P-92.1.4.4): chirality centres before pseudo-asymmetric/other stereogenic units before none.
const ORDER4A: Partial<Record<Descriptor, number>> = { R: 2, S: 2, seqCis: 2, seqTrans: 2, r: 1, s: 1, E: 1, Z: 1 };
const rule4a: Rule = (_dg, a, b) => cmp(ORDER4A[a.to.aux] ?? 0, ORDER4A[b.to.aux] ?? 0);

const CHIRAL = new Set<Descriptor>(['R', 'S', 'seqCis', 'seqTrans']);
const isRightHanded = (d: Descriptor) => d === 'R' || d === 'seqCis';

/** Chirality-type descriptors found in a branch, breadth-first. */
function branchDescriptors(dg: Digraph, start: Node): Descriptor[] {
  const found: Descriptor[] = [];
  const queue = [start];
  for (let i = 0; i < queue.length; i++) {
    if (CHIRAL.has(queue[i].aux)) found.push(queue[i].aux);
    queue.push(...dg.out(queue[i]));
  }
  return found;
}

// Rule 4b (like/unlike pairs) only acts between branches of the current root holding two or more
// chirality-type descriptors; that comparison (reference descriptor, pair lists) is not implemented,
// so reaching it is a refusal rather than a guess.
const rule4bGuard: Rule = (dg, a, b) => {
  if (a.from !== dg.currentRoot()) return 0;
  if (branchDescriptors(dg, a.to).length > 1 || branchDescriptors(dg, b.to).length > 1) {
    throw new StereoRefusal('Rule 4b (like/unlike descriptor pairs) would be needed; not implemented');
  }
  return 0;
};

// Rule 4c (P-92.1.4.4): r before s.
const ORDER4C: Partial<Record<Descriptor, number>> = { r: 2, s: 1 };
const rule4c: Rule = (_dg, a, b) => cmp(ORDER4C[a.to.aux] ?? 0, ORDER4C[b.to.aux] ?? 0);

// Rule 5 (P-92.1.4.5): R before S (seqCis before seqTrans). Decided here only between root branches
// holding one chirality-type descriptor each; ±2 marks the centre as pseudo-asymmetric (r/s).
const rule5: Rule = (dg, a, b) => {
  if (a.from !== dg.currentRoot()) return 0;
  const x = branchDescriptors(dg, a.to);
  const y = branchDescriptors(dg, b.to);
  if (x.length === 0 && y.length === 0) return 0;
  if (x.length !== 1 || y.length !== 1) throw new StereoRefusal('Rule 5 between unequal descriptor sets; not implemented');
  const rx = isRightHanded(x[0]);
  const ry = isRightHanded(y[0]);
  return rx === ry ? 0 : rx ? 2 : -2;
};

/** Rules 1a, 1b, 2 need no descriptors (the constitutional rules); the rest need auxiliary ones. */
export const CONSTITUTIONAL = [rule1a, rule1b, rule2];
export const ALL_RULES = [rule1a, rule1b, rule2, rule3, rule4a, rule4bGuard, rule4c, rule5];

export interface Priority {
  unique: boolean;
  pseudoAsymmetric: boolean;
}

/**
 * Ranks branches by a list of rules, each rule applied exhaustively through the digraph before the
 * next (hierarchical digraph exploration, P-92.1.4: sphere by sphere, branches explored in order).
 */
export class Ranker {
  private cache = new Map<string, Edge[]>();
  private cacheVersion = -1;

  constructor(
    private readonly dg: Digraph,
    private readonly rules: Rule[],
  ) {}

  private edgesOut(node: Node): Edge[] {
    return this.dg.out(node).map((to) => ({ from: node, to }));
  }

  private compareWith(level: number, a: Edge, b: Edge, deep: boolean): number {
    for (let k = 0; k <= level; k++) {
      const c = deep ? this.explore(k, a, b) : this.rules[k](this.dg, a, b);
      if (c !== 0) return c;
    }
    return 0;
  }

  /** Rule `k` applied to two branches, sphere by sphere. */
  private explore(k: number, a: Edge, b: Edge): number {
    const rule = this.rules[k];
    const first = rule(this.dg, a, b);
    if (first !== 0) return first;
    const qa = [a];
    const qb = [b];
    for (let pos = 0; pos < qa.length; pos++) {
      const as = this.edgesOut(qa[pos].to);
      const bs = this.edgesOut(qb[pos].to);
      this.sortEdges(as, k, false);
      this.sortEdges(bs, k, false);
      for (let i = 0; i < Math.min(as.length, bs.length); i++) {
        const c = rule(this.dg, as[i], bs[i]);
        if (c !== 0) return c;
      }
      if (as.length !== bs.length) return cmp(as.length, bs.length);
      const sa = this.sortedDeep(qa[pos].to, k);
      const sb = this.sortedDeep(qb[pos].to, k);
      for (let i = 0; i < sa.length; i++) {
        const c = rule(this.dg, sa[i], sb[i]);
        if (c !== 0) return c;
        qa.push(sa[i]);
        qb.push(sb[i]);
      }
    }
    return 0;
  }

  private sortedDeep(node: Node, level: number): Edge[] {
    if (this.cacheVersion !== this.dg.version) {
      this.cache.clear();
      this.cacheVersion = this.dg.version;
    }
    const key = `${node.id}:${level}`;
    let sorted = this.cache.get(key);
    if (!sorted) {
      sorted = this.edgesOut(node);
      this.sortEdges(sorted, level, true);
      this.cache.set(key, sorted);
    }
    return sorted;
  }

  /** Insertion sort, highest rank first. */
  sortEdges(edges: Edge[], level: number, deep: boolean): Priority {
    let unique = true;
    let pseudo = 0;
    for (let i = 1; i < edges.length; i++) {
      for (let j = i; j > 0; j--) {
        const c = this.compareWith(level, edges[j - 1], edges[j], deep);
        if (Math.abs(c) > 1) pseudo++;
        if (c < 0) [edges[j - 1], edges[j]] = [edges[j], edges[j - 1]];
        else {
          if (c === 0) unique = false;
          break;
        }
      }
    }
    return { unique, pseudoAsymmetric: pseudo === 1 };
  }

  /** Ranks the branches of `node` (under the current root) with every rule of this ranker. */
  prioritise(edges: Edge[]): Priority {
    return this.sortEdges(edges, this.rules.length - 1, true);
  }

  /** Groups of tied branches in an already sorted list. */
  groups(edges: Edge[]): Edge[][] {
    const groups: Edge[][] = [];
    edges.forEach((e, i) => {
      if (i === 0 || this.compareWith(this.rules.length - 1, edges[i - 1], e, true) !== 0) groups.push([]);
      groups[groups.length - 1].push(e);
    });
    return groups;
  }
}
