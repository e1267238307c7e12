import { StereoRefusal } from './refusal';

// Atomic numbers (CIP Rule 1a, IUPAC 2013 P-92.1.4.1).
const SYMBOLS =
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe';
const ATOMIC_NUMBER = new Map(SYMBOLS.split(' ').map((symbol, i) => [symbol, i + 1]));

export function atomicNumber(symbol: string): number {
  const z = ATOMIC_NUMBER.get(symbol);
  if (z === undefined) throw new StereoRefusal(`element ${symbol} is not handled by the stereo engine`);
  return z;
}

/**
 * Rule 2 (P-92.1.4.2, higher mass number first) needs a value for atoms without an isotope label:
 * the standard atomic weight (CIAAW 2021 conventional values) stands for the natural mixture, and
 * the mass number of the most abundant isotope marks the one comparison that weight cannot settle
 * (a label naming that isotope against the unlabelled element), which we refuse.
 */
const NATURAL: Record<string, { weight: number; commonest: number }> = {
  H: { weight: 1.008, commonest: 1 },
  B: { weight: 10.81, commonest: 11 },
  C: { weight: 12.011, commonest: 12 },
  N: { weight: 14.007, commonest: 14 },
  O: { weight: 15.999, commonest: 16 },
  F: { weight: 18.998, commonest: 19 },
  Si: { weight: 28.085, commonest: 28 },
  P: { weight: 30.974, commonest: 31 },
  S: { weight: 32.06, commonest: 32 },
  Cl: { weight: 35.45, commonest: 35 },
  Se: { weight: 78.971, commonest: 80 },
  Br: { weight: 79.904, commonest: 79 },
  I: { weight: 126.9, commonest: 127 },
};

/** Compares a labelled isotope with the unlabelled element: positive when the label ranks higher. */
export function compareLabelledWithNatural(element: string, massNumber: number): number {
  const natural = NATURAL[element];
  if (!natural || natural.commonest === massNumber) {
    throw new StereoRefusal(
      `ranking [${massNumber}${element}] against unlabelled ${element} (Rule 2) is not decided with certainty`,
    );
  }
  return Math.sign(massNumber - natural.weight);
}
