import type { MolGraph } from '../graph/types';
import { atomicNumber } from './elements';
import { StereoRefusal } from './refusal';

/** Stereodescriptors as the sequence rules see them; 'none' = not (or not yet) stereogenic. */
export type Descriptor = 'R' | 'S' | 'r' | 's' | 'E' | 'Z' | 'seqCis' | 'seqTrans' | 'none';

/**
 * A node of the hierarchical digraph (IUPAC 2013 P-92.1.4): an atom reached along one path from
 * the root. Duplicate atoms (P-92.1.4.4) stand for ring closures and for the extra bonds of
 * double and triple bonds; they end the path.
 */
export interface Node {
  id: number;
  /** Index in MolGraph.atoms; -1 for an implicit hydrogen. */
  atom: number;
  z: number;
  isotope: number | null;
  element: string;
  kind: 'atom' | 'hydrogen' | 'ringDuplicate' | 'bondDuplicate';
  /**
   * Rule 1b distance: path length + 1 for real atoms; for a duplicate, the distance of the atom it
   * duplicates on the current path (0 when that atom lies ahead, i.e. the far end of a multiple bond).
   */
  dist: number;
  parent: Node | null;
  parentBond: number;
  children: Node[] | null;
  aux: Descriptor;
}

/** Digraphs are explored lazily; this bound turns a combinatorial explosion into a refusal. */
const MAX_NODES = 50_000;

export class Digraph {
  readonly origin: Node;
  private root: Node;
  /** For the current root: each node on the path root → origin, mapped to its neighbour toward the root. */
  private towardRoot = new Map<Node, Node>();
  private count = 0;
  /** Bumped whenever the root or any auxiliary descriptor changes; invalidates cached sorts. */
  version = 0;

  constructor(
    private readonly graph: MolGraph,
    originAtom: number,
  ) {
    this.origin = this.newNode(originAtom, 'atom', 1, null, -1);
    this.root = this.origin;
  }

  private newNode(atom: number, kind: Node['kind'], dist: number, parent: Node | null, parentBond: number): Node {
    if (++this.count > MAX_NODES) {
      throw new StereoRefusal('the CIP digraph is too large to explore (more than 50 000 nodes)');
    }
    const source = atom >= 0 ? this.graph.atoms[atom] : null;
    return {
      id: this.count,
      atom,
      z: source ? atomicNumber(source.element) : 1,
      isotope: source ? source.isotope : null,
      element: source ? source.element : 'H',
      kind,
      dist,
      parent,
      parentBond,
      children: kind === 'atom' ? null : [],
      aux: 'none',
    };
  }

  /** Distance of `atom` on the path from the origin to `node` (inclusive), 0 when not on it. */
  private pathDistance(node: Node, atom: number): number {
    for (let n: Node | null = node; n; n = n.parent) if (n.atom === atom && n.kind === 'atom') return n.dist;
    return 0;
  }

  children(node: Node): Node[] {
    if (node.children) return node.children;
    const children: Node[] = [];
    const atomIsOrigin = node === this.origin;
    for (const { atom: nb, bond } of this.graph.adjacency[node.atom]) {
      const extra = this.graph.bonds[bond].order - 1;
      const seenAt = this.pathDistance(node, nb);
      if (seenAt === 0) {
        children.push(this.newNode(nb, 'atom', node.dist + 1, node, bond));
        // The root keeps its own multiple bonds undoubled (e.g. the C=C under study, S=O centres).
        if (!atomIsOrigin) for (let i = 0; i < extra; i++) children.push(this.newNode(nb, 'bondDuplicate', 0, node, bond));
      } else if (bond === node.parentBond) {
        if (nb !== this.origin.atom) {
          for (let i = 0; i < extra; i++) children.push(this.newNode(nb, 'bondDuplicate', seenAt, node, bond));
        }
      } else {
        children.push(this.newNode(nb, 'ringDuplicate', seenAt, node, bond));
        for (let i = 0; i < extra; i++) children.push(this.newNode(nb, 'bondDuplicate', seenAt, node, bond));
      }
    }
    for (let i = 0; i < this.graph.atoms[node.atom].hydrogens; i++) {
      children.push(this.newNode(-1, 'hydrogen', node.dist + 1, node, -1));
    }
    node.children = children;
    return children;
  }

  /** Tree neighbours: children and parent. */
  neighbours(node: Node): Node[] {
    const children = this.children(node);
    return node.parent ? [...children, node.parent] : children;
  }

  currentRoot(): Node {
    return this.root;
  }

  /** Re-roots the same tree at `node` (auxiliary descriptors, P-92.1.4.3): edges along the path flip. */
  setRoot(node: Node): void {
    if (node === this.root) return;
    this.root = node;
    this.towardRoot.clear();
    for (let child = node, up = node.parent; up; child = up, up = up.parent) this.towardRoot.set(up, child);
    this.version++;
  }

  /** Neighbours of `node` away from the current root. */
  out(node: Node): Node[] {
    if (node === this.root) return this.neighbours(node);
    const up = this.towardRoot.get(node) ?? node.parent;
    return this.neighbours(node).filter((n) => n !== up);
  }

  isTerminal(node: Node): boolean {
    return node.kind !== 'atom' || this.neighbours(node).length === 1;
  }

  /** Every node, breadth-first from the origin (expands the whole tree). */
  all(): Node[] {
    const queue = [this.origin];
    for (let i = 0; i < queue.length; i++) queue.push(...this.children(queue[i]));
    return queue;
  }

  setAux(values: Map<Node, Descriptor>): void {
    for (const [node, d] of values) node.aux = d;
    this.version++;
  }
}
