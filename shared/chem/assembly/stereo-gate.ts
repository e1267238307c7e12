import type { MolGraph } from '../graph/types';

/**
 * Stereodescriptors (P-91, P-93) are not placed yet, and a name without the descriptors the
 * input asks for would describe a different substance: such input is refused.
 */
export function stereoGate(graph: MolGraph): string | null {
  if (graph.stereoNotes?.length) return `stereo feature not handled: ${graph.stereoNotes[0]}`;
  const centre = graph.atoms.find((a) => a.tetrahedral);
  if (centre) return `stereodescriptors (CIP R/S) are not assigned yet; the input specifies a configuration at atom ${centre.index + 1}`;
  const bond = graph.bonds.find((b) => b.doubleBondStereo);
  if (bond) return `stereodescriptors (E/Z) are not assigned yet; the input specifies a double-bond configuration between atoms ${bond.from + 1} and ${bond.to + 1}`;
  return null;
}
