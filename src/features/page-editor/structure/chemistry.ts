import type { Description, NameStyle } from '../../../../shared/chem';

/**
 * The browser's door to chemistry. openchemlib (several MB) and the naming engine load on first
 * use, so a page without structures opens without them.
 */
type Ocl = typeof import('openchemlib');

let ocl: Promise<Ocl> | null = null;
export function loadOcl(): Promise<Ocl> {
  ocl ??= import('openchemlib');
  return ocl;
}

export async function describeMolfile(molfile: string, style: NameStyle): Promise<Description> {
  const { describe } = await import('../../../../shared/chem');
  return describe({ molfile }, { style });
}

export async function describeInput(input: { smiles: string } | { molfile: string }): Promise<Description> {
  const { describe } = await import('../../../../shared/chem');
  return describe(input);
}

/** A molfile with 2D coordinates for a SMILES the engine has already accepted. */
export async function molfileFromSmiles(smiles: string): Promise<string> {
  const { Molecule } = await loadOcl();
  return Molecule.fromSmiles(smiles).toMolfile();
}

export async function depictMolfile(molfile: string, svgId: string, width: number, height: number): Promise<string> {
  const { Molecule } = await loadOcl();
  const molecule = Molecule.fromMolfile(molfile);
  // Small molecules are drawn with longer bonds than the depictor's default so they read at a glance.
  return molecule.toSVG(width, height, svgId, { maxAVBL: 36, inflateToMaxAVBL: true, suppressChiralText: true });
}

/** Whether an error is the engine's typed refusal of bad input (its message is meant for chemists). */
export async function isChemInputError(error: unknown): Promise<boolean> {
  const { ChemInputError } = await import('../../../../shared/chem');
  return error instanceof ChemInputError;
}
