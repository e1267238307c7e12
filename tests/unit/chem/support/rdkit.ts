/** @rdkit/rdkit (an independent library) loaded once for the reference checks. */
type RDKitModule = Awaited<ReturnType<typeof import('@rdkit/rdkit')['default']>>;

let module: Promise<RDKitModule> | null = null;

export function rdkit(): Promise<RDKitModule> {
  module ??= import('@rdkit/rdkit').then((m) => (m.default as unknown as () => Promise<RDKitModule>)());
  return module;
}

export interface Reference {
  amw: number;
  exactmw: number;
  /** Element counts read from RDKit's molblock (hydrogens made explicit). */
  counts: Map<string, number>;
  canonicalSmiles: string;
}

export async function reference(smiles: string): Promise<Reference> {
  const rd = await rdkit();
  const mol = rd.get_mol(smiles);
  if (!mol) throw new Error(`RDKit cannot read ${smiles}`);
  try {
    const descriptors = JSON.parse(mol.get_descriptors());
    const withH = rd.get_mol(mol.add_hs());
    const counts = new Map<string, number>();
    const block = withH!.get_molblock().split('\n');
    const [atoms] = block[3].trim().split(/\s+/).map(Number);
    for (const line of block.slice(4, 4 + atoms)) {
      const symbol = line.slice(31, 34).trim();
      counts.set(symbol, (counts.get(symbol) ?? 0) + 1);
    }
    withH!.delete();
    return { amw: descriptors.amw, exactmw: descriptors.exactmw, counts, canonicalSmiles: mol.get_smiles() };
  } finally {
    mol.delete();
  }
}

export async function canonicalSmiles(smiles: string): Promise<string> {
  const rd = await rdkit();
  const mol = rd.get_mol(smiles);
  if (!mol) throw new Error(`RDKit cannot read ${smiles}`);
  const text = mol.get_smiles();
  mol.delete();
  return text;
}

/** RDKit's weight for one atom of an element (its own table), read from the isolated atom. */
export async function rdkitAtomWeight(symbol: string): Promise<number> {
  const rd = await rdkit();
  const mol = rd.get_mol(`[${symbol}]`)!;
  const weight = JSON.parse(mol.get_descriptors()).amw as number;
  mol.delete();
  return weight;
}
