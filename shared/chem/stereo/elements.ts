import { ATOMIC_WEIGHT, ELEMENT_SYMBOLS, MOST_ABUNDANT } from '../formula/elements';
import { StereoRefusal } from './refusal';

// Atomic numbers (CIP Rule 1a, IUPAC 2013 P-92.1.4.1).
const ATOMIC_NUMBER = new Map(ELEMENT_SYMBOLS.map((symbol, i) => [symbol, i + 1]));

export function atomicNumber(symbol: string): number {
  const z = ATOMIC_NUMBER.get(symbol);
  if (z === undefined) throw new StereoRefusal(`element ${symbol} is not handled by the stereo engine`);
  return z;
}

/**
 * Rule 2 (P-92.1.4.2, higher mass number first) needs a value for atoms without an isotope label:
 * the standard atomic weight (the engine's CIAAW 2021 table) stands for the natural mixture, and
 * the mass number of the most abundant isotope marks the one comparison that weight cannot settle
 * (a label naming that isotope against the unlabelled element), which we refuse.
 * Returns a positive number when the labelled isotope ranks higher than the unlabelled element.
 */
export function compareLabelledWithNatural(element: string, massNumber: number): number {
  const weight = ATOMIC_WEIGHT[element];
  if (weight === undefined || MOST_ABUNDANT[element] === massNumber) {
    throw new StereoRefusal(
      `ranking [${massNumber}${element}] against unlabelled ${element} (Rule 2) is not decided with certainty`,
    );
  }
  return Math.sign(massNumber - weight);
}
