/**
 * Our own enumerator of the constitutional isomers of acyclic alkanes: unrooted trees of up to n
 * carbons with degree at most 4, grown one atom at a time and deduplicated by a canonical form
 * (the AHU encoding rooted at the tree's centre or bicentre). Output is SMILES.
 */
type Tree = number[][]; // adjacency lists

function rootedCode(tree: Tree, atom: number, parent: number): string {
  const children = tree[atom].filter((n) => n !== parent).map((n) => rootedCode(tree, n, atom)).sort();
  return `(${children.join('')})`;
}

function centres(tree: Tree): number[] {
  const degree = tree.map((n) => n.length);
  let layer = degree.map((d, i) => (d <= 1 ? i : -1)).filter((i) => i >= 0);
  let remaining = tree.length;
  const removed = new Uint8Array(tree.length);
  while (remaining > 2) {
    const next: number[] = [];
    for (const leaf of layer) {
      removed[leaf] = 1;
      remaining -= 1;
      for (const n of tree[leaf]) if (!removed[n] && --degree[n] === 1) next.push(n);
    }
    layer = next;
  }
  return tree.map((_, i) => i).filter((i) => !removed[i]);
}

function canonical(tree: Tree): string {
  return centres(tree).map((c) => rootedCode(tree, c, -1)).sort()[0];
}

export function toSmiles(tree: Tree): string {
  const write = (atom: number, parent: number): string => {
    const children = tree[atom].filter((n) => n !== parent);
    return 'C' + children.map((c, i) => (i < children.length - 1 ? `(${write(c, atom)})` : write(c, atom))).join('');
  };
  return write(0, -1);
}

/** Isomer trees for every carbon count 1..max: result[n] lists the trees with n carbons. */
export function alkaneIsomers(max: number): Tree[][] {
  const byCount: Tree[][] = [[], [[[]]]];
  for (let n = 2; n <= max; n++) {
    const seen = new Map<string, Tree>();
    for (const tree of byCount[n - 1]) {
      for (let atom = 0; atom < tree.length; atom++) {
        if (tree[atom].length >= 4) continue;
        const grown = tree.map((ns) => [...ns]);
        grown.push([atom]);
        grown[atom].push(n - 1);
        const code = canonical(grown);
        if (!seen.has(code)) seen.set(code, grown);
      }
    }
    byCount.push([...seen.values()]);
  }
  return byCount;
}

export function alkaneIsomerSmiles(max: number): string[][] {
  return alkaneIsomers(max).map((trees) => trees.map(toSmiles));
}
