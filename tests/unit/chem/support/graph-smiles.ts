import type { MolGraph } from '../../../../shared/chem/graph/types';

/**
 * Writes a SMILES string from our graph, stereo marks included, so that an independent library
 * can compare it with the input: a check that the parser keeps configurations faithfully.
 * Acyclic molecules only (no ring-closure digits needed); neighbouring stereo double bonds that
 * would share a bond mark are not supported.
 */
export function graphToSmiles(graph: MolGraph): string {
  const parent = new Int32Array(graph.atoms.length).fill(-2);
  const children: number[][] = graph.atoms.map(() => []);
  const order: number[] = [];
  const visit = (atom: number, from: number) => {
    parent[atom] = from;
    order.push(atom);
    for (const { atom: next } of graph.adjacency[atom]) if (parent[next] === -2) (children[atom].push(next), visit(next, atom));
  };
  visit(0, -1);
  if (order.length !== graph.atoms.length) throw new Error('disconnected');
  if (graph.bonds.length !== graph.atoms.length - 1) throw new Error('rings are not supported here');

  // Bond direction marks, as written from parent to child.
  const mark = new Map<number, '/' | '\\'>();
  const setMark = (bond: number, value: '/' | '\\') => {
    if (mark.has(bond) && mark.get(bond) !== value) throw new Error('conflicting bond marks');
    mark.set(bond, value);
  };
  const flip = (c: '/' | '\\') => (c === '/' ? '\\' : '/');
  const bondOf = (a: number, b: number) => graph.adjacency[a].find((e) => e.atom === b)!.bond;
  for (const bond of graph.bonds) {
    if (!bond.doubleBondStereo) continue;
    const [u, v] = parent[bond.to] === bond.from ? [bond.from, bond.to] : [bond.to, bond.from];
    const [refU, refV] = u === bond.from ? bond.doubleBondStereo.reference : [...bond.doubleBondStereo.reference].reverse();
    // Left side as in "refU c1 u": written that way if refU is u's parent, else "u flip(c1) refU".
    const c1 = '/';
    setMark(bondOf(refU, u), parent[u] === refU ? c1 : flip(c1));
    // Right side "v c2 refV" (refV is a child of v): same marks mean trans.
    setMark(bondOf(v, refV), bond.doubleBondStereo.relation === 'trans' ? c1 : flip(c1));
  }

  const atomText = (atom: number): string => {
    const a = graph.atoms[atom];
    const t = a.tetrahedral;
    if (!t) return a.element;
    const written = [...(parent[atom] >= 0 ? [parent[atom]] : []), ...(a.hydrogens ? [-1] : []), ...children[atom]];
    if (parent[atom] < 0 && a.hydrogens) written.splice(0, 0, ...written.splice(written.indexOf(-1), 1));
    const clockwise = (t.parity === 'clockwise') === isEvenPermutation(t.neighbours, written);
    return `[${a.element}${clockwise ? '@@' : '@'}${a.hydrogens ? 'H' : ''}]`;
  };
  const bondText = (from: number, to: number): string => {
    const bond = graph.bonds[bondOf(from, to)];
    return mark.get(bond.index) ?? (bond.order === 2 ? '=' : bond.order === 3 ? '#' : '');
  };
  const write = (atom: number): string => {
    let text = atomText(atom);
    children[atom].forEach((child, i) => {
      const part = bondText(atom, child) + write(child);
      text += i < children[atom].length - 1 ? `(${part})` : part;
    });
    return text;
  };
  return write(0);
}

function isEvenPermutation(from: number[], to: number[]): boolean {
  const position = to.map((x) => from.indexOf(x));
  if (position.some((p) => p < 0)) throw new Error('neighbour lists differ');
  let swaps = 0;
  const p = [...position];
  for (let i = 0; i < p.length; i++) {
    while (p[i] !== i) {
      const j = p[i];
      [p[i], p[j]] = [p[j], p[i]];
      swaps += 1;
    }
  }
  return swaps % 2 === 0;
}
