/**
 * Public API of the naming engine (contract: notes CHEM_API.md). Plain TypeScript: runs the same
 * in the browser, on the server and in the command line.
 */
import { averageMass, hillFormula, monoisotopicMass } from './formula/formula';
import { nameGraph, type Naming } from './assembly/molecule';
import type { NameStyle } from './assembly/style';
import { loadChemistry, parseInput, type ChemInput } from './parsing/openchemlib';

export { ChemInputError } from './parsing/errors';
export type { ChemInputErrorCode } from './parsing/errors';
export type { Explanation, Naming } from './assembly/molecule';
export type { NameStyle } from './assembly/style';
export { loadChemistry };

export interface Description {
  formula: string;
  averageMass: number;
  monoisotopicMass: number;
  canonical: string;
  smiles: string;
  naming: Naming;
}

export async function describe(input: ChemInput, options?: { style?: NameStyle }): Promise<Description> {
  await loadChemistry();
  return describeSync(input, options);
}

export function describeSync(input: ChemInput, options?: { style?: NameStyle }): Description {
  const { graph, canonical, smiles } = parseInput(input);
  const style = options?.style ?? 'preferred';
  let canonicalText: string | undefined;
  let smilesText: string | undefined;
  // canonical and smiles cost more than naming itself; they are computed when first read.
  return {
    formula: hillFormula(graph),
    averageMass: averageMass(graph),
    monoisotopicMass: monoisotopicMass(graph),
    get canonical() {
      return (canonicalText ??= canonical());
    },
    get smiles() {
      return (smilesText ??= smiles());
    },
    naming: nameGraph(graph, style),
  };
}
