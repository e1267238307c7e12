import type { MolGraph } from '../graph/types';
import { ChemInputError } from '../parsing/errors';
import { ATOMIC_WEIGHT, MOST_ABUNDANT, NUCLIDE_MASS } from './elements';

/** Element counts, hydrogens included (isotope labels counted under their element). */
function elementCounts(graph: MolGraph): Map<string, number> {
  const counts = new Map<string, number>();
  for (const atom of graph.atoms) {
    counts.set(atom.element, (counts.get(atom.element) ?? 0) + 1);
    if (atom.hydrogens > 0) counts.set('H', (counts.get('H') ?? 0) + atom.hydrogens);
  }
  return counts;
}

/**
 * Hill formula (Hill, J. Am. Chem. Soc. 22 (1900) 478): carbon first, then hydrogen, then the
 * other elements alphabetically; without carbon, all elements alphabetically. Counts of 1 are
 * not written. A net charge is appended as "+", "2-" etc.
 */
export function hillFormula(graph: MolGraph): string {
  const counts = elementCounts(graph);
  const hasCarbon = counts.has('C');
  const others: string[] = [];
  for (const element of counts.keys()) if (!(hasCarbon && (element === 'C' || element === 'H'))) others.push(element);
  others.sort();
  const order = hasCarbon ? (counts.has('H') ? ['C', 'H'] : ['C']).concat(others) : others;
  let text = '';
  for (const element of order) {
    const count = counts.get(element)!;
    text += count > 1 ? element + count : element;
  }
  let charge = 0;
  for (const atom of graph.atoms) charge += atom.charge;
  const chargeText = charge === 0 ? '' : `${Math.abs(charge) > 1 ? Math.abs(charge) : ''}${charge > 0 ? '+' : '-'}`;
  return text + chargeText;
}

function nuclideMass(element: string, massNumber: number): number {
  const mass = NUCLIDE_MASS[element]?.[massNumber];
  if (mass === undefined) throw new ChemInputError('unsupported_feature', `isotope ${massNumber}${element} is not in the engine's nuclide table`);
  return mass;
}

/**
 * Average molar mass (g/mol) from the CIAAW standard atomic weights; an isotope-labelled atom
 * contributes its nuclide mass instead (the label fixes the isotope). Electron mass is ignored.
 */
export function averageMass(graph: MolGraph): number {
  let sum = 0;
  for (const atom of graph.atoms) {
    sum += atom.isotope === null ? ATOMIC_WEIGHT[atom.element] : nuclideMass(atom.element, atom.isotope);
    sum += atom.hydrogens * ATOMIC_WEIGHT.H;
  }
  return withoutFloatNoise(sum);
}

/** Monoisotopic mass (Da): the most abundant isotope of every unlabelled atom. */
export function monoisotopicMass(graph: MolGraph): number {
  let sum = 0;
  for (const atom of graph.atoms) {
    sum += nuclideMass(atom.element, atom.isotope ?? MOST_ABUNDANT[atom.element]);
    sum += atom.hydrogens * nuclideMass('H', 1);
  }
  return withoutFloatNoise(sum);
}

/**
 * Summing binary floating-point numbers leaves noise in the last digits (130.18699999999998);
 * nine decimals keep every digit the atomic-weight and isotopic-mass tables give and drop it.
 */
function withoutFloatNoise(mass: number): number {
  return Math.round(mass * 1e9) / 1e9;
}
