import { describeSync } from '../../../../shared/chem/index';
import { ATOMIC_WEIGHT } from '../../../../shared/chem/formula/elements';
import { parseInput } from '../../../../shared/chem/parsing/openchemlib';
import { rdkitAtomWeight, reference } from './rdkit';

const rdkitWeight: Record<string, number> = {};

function countsFromFormula(formula: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const [, symbol, n] of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) counts[symbol] = n ? Number(n) : 1;
  return counts;
}

/**
 * Differences between our formula and masses and @rdkit/rdkit's for one SMILES (empty when they
 * agree). RDKit's average mass is first brought to the CIAAW 2021 conventional weights element by
 * element, as in formula-masses.test.ts; tolerances 1e-6 (average) and 1e-5 Da (monoisotopic) per atom.
 */
export async function disagreementWithRdkit(smiles: string): Promise<string[]> {
  for (const symbol of Object.keys(ATOMIC_WEIGHT)) rdkitWeight[symbol] ??= await rdkitAtomWeight(symbol);
  const ours = describeSync({ smiles });
  const ref = await reference(smiles);
  const problems: string[] = [];
  const mine = countsFromFormula(ours.formula);
  const theirs = Object.fromEntries(ref.counts);
  if (JSON.stringify(Object.entries(mine).sort()) !== JSON.stringify(Object.entries(theirs).sort())) problems.push(`formula ${ours.formula} vs ${JSON.stringify(theirs)}`);
  const { graph } = parseInput({ smiles });
  let corrected = ref.amw;
  let atoms = 0;
  for (const atom of graph.atoms) {
    atoms += 1 + atom.hydrogens;
    corrected += atom.hydrogens * (ATOMIC_WEIGHT.H - rdkitWeight.H) + (ATOMIC_WEIGHT[atom.element] - rdkitWeight[atom.element]);
  }
  if (Math.abs(ours.averageMass - corrected) > 1e-6 * atoms) problems.push(`average mass ${ours.averageMass} vs ${corrected}`);
  if (Math.abs(ours.monoisotopicMass - ref.exactmw) > 1e-5 * atoms) problems.push(`monoisotopic mass ${ours.monoisotopicMass} vs ${ref.exactmw}`);
  return problems;
}
