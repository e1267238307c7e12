/**
 * `npm run bench:names`: names every acyclic alkane isomer C1–C14 (3,324 structures) and a mixed
 * set of generated functionalised molecules (acids, esters, amides, nitriles, aldehydes, ketones,
 * alcohols, ethers, amines on chains and rings), and has @rdkit/rdkit canonicalise the same SMILES;
 * prints rates and the time ratio for each set. Also times single large molecules (the aim: under
 * 20 ms each below 200 heavy atoms).
 */
import { performance } from 'node:perf_hooks';
import { describeSync, loadChemistry } from '../shared/chem/index';
import { alkaneIsomerSmiles } from '../tests/unit/chem/support/alkanes';
import { functionalisedSmiles } from '../tests/unit/chem/support/functional';

type RDKitModule = { get_mol(smiles: string): { get_smiles(): string; delete(): void } | null };

function timeNaming(set: string[]): { ms: number; refused: number } {
  let refused = 0;
  const start = performance.now();
  for (const smiles of set) if (!describeSync({ smiles }).naming.ok) refused += 1;
  return { ms: performance.now() - start, refused };
}

function timeRdkit(rd: RDKitModule, set: string[]): number {
  const start = performance.now();
  for (const smiles of set) {
    const mol = rd.get_mol(smiles)!;
    mol.get_smiles();
    mol.delete();
  }
  return performance.now() - start;
}

function report(label: string, set: string[], rd: RDKitModule): void {
  // One full warm-up pass each, so both are measured as in a long-running server or CLI.
  timeNaming(set);
  timeRdkit(rd, set);
  const naming = timeNaming(set);
  const rdkit = timeRdkit(rd, set);
  const rate = (n: number, ms: number) => ((n / ms) * 1000).toFixed(0);
  console.log(`${label}: ${set.length} structures, ${naming.refused} refused`);
  console.log(`  naming (parse + formula + masses + name): ${naming.ms.toFixed(0)} ms, ${rate(set.length, naming.ms)} per second`);
  console.log(`  RDKit canonical SMILES:                  ${rdkit.toFixed(0)} ms, ${rate(set.length, rdkit)} per second`);
  console.log(`  ratio naming / RDKit: ${(naming.ms / rdkit).toFixed(2)} (aim ≤ 1)`);
}

function largest(label: string, smiles: string): void {
  const start = performance.now();
  const { naming } = describeSync({ smiles });
  const ms = performance.now() - start;
  console.log(`  ${label}: ${ms.toFixed(1)} ms (${naming.ok ? 'named' : `refused: ${naming.reason}`})`);
}

async function main(): Promise<void> {
  await loadChemistry();
  const rd = (await (await import('@rdkit/rdkit')).default()) as unknown as RDKitModule;
  const alkanes = alkaneIsomerSmiles(14).flat();
  report('acyclic alkanes C1–C14', alkanes, rd);
  report('generated functionalised molecules', functionalisedSmiles(4000), rd);
  console.log('single large molecules (aim < 20 ms below 200 heavy atoms):');
  largest('C199 unbranched', 'C'.repeat(199));
  largest('C199 comb (methyl on every other carbon)', 'C' + 'C(C)'.repeat(66));
  largest('C100 chain with 50 OH and COOH ends', 'OC(=O)' + 'C(O)C'.repeat(49) + 'C(=O)O');
  largest('C190 branched dendrimer-like', 'C(C(C(C)(C)C)(C(C)(C)C)C(C)(C)C)'.repeat(1) + 'CCCC(C(C)(C)CC(C)C)'.repeat(10));
}

void main();
