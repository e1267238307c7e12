/**
 * `npm run bench:names`: names every acyclic alkane isomer C1–C14 (3,324 structures) and a mixed
 * set of generated functionalised molecules (acids, esters, amides, nitriles, aldehydes, ketones,
 * alcohols, ethers, amines on chains and rings), and has @rdkit/rdkit canonicalise the same SMILES;
 * prints rates and the time ratio for each set (medians of several alternating runs). Also times
 * single large molecules (the aim: under 20 ms each below 200 heavy atoms).
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

/** Runs per side; the median damps noise from other processes on a shared machine. */
const RUNS = 5;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function report(label: string, set: string[], rd: RDKitModule): void {
  // One full warm-up pass each, so both are measured as in a long-running server or CLI.
  const { refused } = timeNaming(set);
  timeRdkit(rd, set);
  // Alternating runs expose both sides to the same background load.
  const naming: number[] = [];
  const rdkit: number[] = [];
  for (let run = 0; run < RUNS; run++) {
    naming.push(timeNaming(set).ms);
    rdkit.push(timeRdkit(rd, set));
  }
  const [namingMs, rdkitMs] = [median(naming), median(rdkit)];
  const rate = (ms: number) => ((set.length / ms) * 1000).toFixed(0).padStart(6);
  const runs = (values: number[]) => values.map((ms) => ms.toFixed(0)).join(' ');
  console.log(`${label}: ${set.length} structures, ${refused} refused; median of ${RUNS} runs after one warm-up run each`);
  console.log(`  naming (parse + formula + masses + name): ${namingMs.toFixed(0).padStart(5)} ms, ${rate(namingMs)} per second  (runs: ${runs(naming)})`);
  console.log(`  RDKit canonical SMILES:                   ${rdkitMs.toFixed(0).padStart(5)} ms, ${rate(rdkitMs)} per second  (runs: ${runs(rdkit)})`);
  console.log(`  ratio naming / RDKit: ${(namingMs / rdkitMs).toFixed(2)} (aim ≤ 1)`);
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
