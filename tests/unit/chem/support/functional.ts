/**
 * A deterministic mixed set of functionalised molecules for the generated-set tests and the
 * naming benchmark: small skeletons (chains, branched chains, alkenes, cyclohexane, cyclopentane,
 * benzene, cyclohexanone) with up to three sites, each filled from a list of characteristic groups (or left
 * as hydrogen). `=O` goes only on CH2 sites. Names are not predicted here: the tests compare
 * the engine with itself across atom orders and with RDKit's formulas and canonical forms.
 */
const CORES: string[] = [
  'CC{a}', 'CCC{a}', 'CC(C)C{a}', 'CCC({a})C{b}', 'CC({a})CC{b}', 'CCCC({a})C{b}', 'C=CC({a})C{b}', 'CC=CC{a}', 'CC(C{c})CC{b}',
  'CCCCCC{a}', 'CCC(CC)C(C{c})C{b}', 'CC({a})C(C{c})C{b}', 'CC(C)(C)CC{a}',
  'C1CCC({a})CC1{b}', 'C1CCC({a})C({c})C1', 'C1CC({a})CC1C{b}', 'C1CCC(C{a})CC1', 'C1CCCC1CC{b}', 'C1CCC(=O)C({a})C1',
  'c1ccc({a})cc1', 'c1cc({a})ccc1{b}', 'c1c({a})cc({c})cc1', 'c1ccccc1C{b}', 'c1ccccc1CC{b}', 'c1ccc({a})cc1CC{b}',
];
/** Groups written as branches on a carbon in SMILES; '' leaves hydrogen. */
const GROUPS: string[] = [
  '', 'O', 'N', 'Cl', 'Br', 'F', 'C', 'CC', 'OC', 'OCC', 'NC', 'N(C)C', 'C#N', 'C=O', 'C(=O)O', 'C(=O)OC', 'C(=O)OCC',
  'C(=O)N', 'C(=O)NC', 'C(=O)Cl', 'C(C)=O', 'Oc9ccccc9', '[N+](=O)[O-]', 'C(O)C', 'CO', 'C=C', 'C#C', 'C(F)(F)F', 'S', 'OC(C)=O',
];

function* choices(seed: number): Generator<number> {
  let x = seed;
  for (;;) {
    x = (x * 48271) % 2147483647; // Park–Miller: products stay exact in doubles
    yield x;
  }
}

/** Sites are written `({x})` inside a core or `{x}` after its last atom; both become a branch. */
function fill(core: string, site: string, group: string): string {
  const branch = group ? `(${group})` : '';
  return core.replace(`({${site}})`, branch).replace(`{${site}}`, branch);
}

/** About `count` distinct SMILES, the same on every run. */
export function functionalisedSmiles(count: number, seed = 4242): string[] {
  const out = new Set<string>();
  const random = choices(seed);
  let attempts = 0;
  while (out.size < count && attempts < count * 20) {
    attempts += 1;
    const core = CORES[random.next().value! % CORES.length];
    let smiles = core;
    for (const site of ['a', 'b', 'c']) smiles = fill(smiles, site, GROUPS[random.next().value! % GROUPS.length]);
    // Sometimes a ketone: the last-but-one carbon becomes C=O where it is a CH2.
    if (random.next().value! % 5 === 0) smiles = smiles.replace(/([^=#])CC$/, '$1C(=O)C');
    out.add(smiles);
  }
  return [...out];
}
