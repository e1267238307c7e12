import { describeInput, isChemInputError, molfileFromSmiles } from './chemistry';
import { StructureTextProblem, type StructureText } from './structureText';

/**
 * Turns accepted input into block fields. The naming engine reads it first: input it cannot read
 * becomes a StructureTextProblem with the engine's own chemist-readable message, and nothing is
 * inserted. A structure the engine reads but does not name is still accepted (the block says so).
 */
export async function prepareStructure(input: StructureText): Promise<{ molfile: string; smiles: string }> {
  let smiles: string;
  try {
    smiles = (await describeInput(input)).smiles;
  } catch (error) {
    if (await isChemInputError(error)) throw new StructureTextProblem((error as Error).message);
    throw error;
  }
  const molfile = 'molfile' in input ? input.molfile : await molfileFromSmiles(input.smiles);
  return { molfile, smiles };
}
