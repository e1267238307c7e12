/**
 * Small molecules with one to three stereo elements, written as SMILES templates: `{t}` is a
 * tetrahedral mark (@ or @@), `{d}` a double-bond direction (/ or \). `expand` writes every
 * stereoisomer of a template (all mark combinations).
 */
const SUBSTITUENTS = [
  'C', 'CC', 'CCC', 'C(C)C', 'C(C)(C)C', 'CC(C)C', 'CCCC', 'CCCCC', 'CO', 'OC', 'O', 'N', 'NC', 'F', 'Cl', 'Br', 'I',
  'C=C', 'C#C', 'C=O', 'C(=O)O', 'C(=O)OC', 'C(=O)N', 'C#N', 'c1ccccc1', 'Cc1ccccc1', 'C(F)(F)F', 'CCl', 'CBr',
  'C1CC1', 'C1CCCCC1', 'CCO', 'CCCl', 'C(C)O', 'C(O)C=C', '[2H]', 'C[2H]', '[13CH3]', 'OC(C)=O', 'C(C)=C',
];

/** Deterministic pseudo-random choice so the set is the same on every run. */
function* picks(count: number, seed: number): Generator<number> {
  let x = seed;
  for (;;) {
    x = (x * 48271) % 2147483647; // Park–Miller: products stay exact in doubles
    yield x % count;
  }
}

function distinct(n: number, seed: number, k: number): string[][] {
  const out: string[][] = [];
  const seen = new Set<string>();
  const it = picks(SUBSTITUENTS.length, seed);
  while (out.length < n) {
    const chosen: string[] = [];
    while (chosen.length < k) {
      const s = SUBSTITUENTS[it.next().value as number];
      if (!chosen.includes(s)) chosen.push(s);
    }
    const key = chosen.join('|');
    if (!seen.has(key)) {
      seen.add(key);
      out.push(chosen);
    }
  }
  return out;
}

export function templates(): string[] {
  const list: string[] = [];
  // One centre: three different substituents plus H (ties broken deep, duplicates, rings, halogens).
  for (const [x, y, z] of distinct(120, 7, 3)) list.push(`[C{t}H](${x})(${y})${z}`);
  // One centre without H.
  for (const [w, x, y, z] of distinct(30, 11, 4)) list.push(`[C{t}](${w})(${x})(${y})${z}`);
  // Two adjacent centres.
  for (const [w, x, y, z] of distinct(50, 13, 4)) list.push(`[C{t}H](${w})(${x})[C{t}H](${y})${z}`);
  // Double bonds, with and without a branch.
  for (const [x, y] of distinct(40, 17, 2)) list.push(`C({d}${x})=C{d}${y}`);
  for (const [x, y, z] of distinct(40, 19, 3)) list.push(`C({d}${x})(${y})=C{d}${z}`);
  // A centre next to a double bond.
  for (const [x, y, z] of distinct(40, 23, 3)) list.push(`C({d}${x})=C{d}[C{t}H](${y})${z}`);
  // Centres whose ligands differ only by stereo (pseudo-asymmetry, Rules 3-5) and rings.
  list.push(
    'C[C{t}H](O)[C{t}H](O)[C{t}H](O)C',
    'C[C{t}H](Cl)[C{t}H](O)[C{t}H](Cl)C',
    'OC(=O)[C{t}H](O)[C{t}H](O)C(=O)O',
    'C[C{t}H](O)C[C{t}H](O)C',
    'C[C{t}H](N)[C{t}H](F)[C{t}H](N)C',
    'C{d}C=C{d}C(Cl)C{d}C=C{d}C',
    'C{d}C=C{d}[C{t}H](O)C{d}C=C{d}C',
    'C[C{t}H](Br)C(F)[C{t}H](Br)C',
    'C[C{t}H]1CC[C{t}H](C)CC1',
    'O[C{t}H]1CC[C{t}H](Cl)CC1',
    'C[C{t}H]1CCC[C{t}H]1O',
    'C[C{t}H]1CC[C{t}H](O)C1',
    'N[C{t}H]1CCCC[C{t}H]1C(=O)O',
    'C[C{t}H]1C[C{t}H](C)C[C{t}H](C)C1',
    'C[C{t}H]1CC[C{t}H](C)C1',
    'Cl[C{t}H]1C[C{t}H]1Cl',
    'C[C{t}H]1CCC=C1',
    'C[C{t}H](CC{d}C=C{d}C)CC{d}C=C{d}C',
    'OC[C{t}H](O)[C{t}H](O)CO',
    'CC[C{t}H](C)[C{t}H](C)CC',
    'C{d}C=C{d}C=C{d}C=C{d}C',
    'C[C{t}H](c1ccccc1)[C{t}H](C)c1ccccc1',
    'C[C{t}H]([2H])O',
    'C[C{t}H](C[2H])CC',
    'O[C{t}H]([13CH3])C',
    'Cl{d}C=C{d}C1CC1',
    'C1CCCCCC{d}C=C{d}1',
  );
  return list;
}

export function expand(template: string): string[] {
  const slots = template.match(/\{[td]\}/g) ?? [];
  const out: string[] = [];
  for (let mask = 0; mask < 1 << slots.length; mask++) {
    let i = 0;
    out.push(
      template.replace(/\{([td])\}/g, (_m, kind: string) => {
        const bit = (mask >> i++) & 1;
        return kind === 't' ? (bit ? '@@' : '@') : bit ? '\\' : '/';
      }),
    );
  }
  return out;
}
