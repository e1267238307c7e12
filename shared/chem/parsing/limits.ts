import { ELEMENT_SYMBOLS } from '../formula/elements';

/** Largest molecule accepted, counted in non-hydrogen atoms. */
export const MAX_HEAVY_ATOMS = 999;

/** Longest input accepted before any parsing (guards the parser against pathological input). */
export const MAX_INPUT_CHARACTERS = 100_000;

/**
 * Elements the engine accepts: the SMILES "organic subset" (OpenSMILES specification, section 3.1)
 * plus hydrogen. Anything else is refused before naming.
 */
export const ORGANIC_ELEMENTS: ReadonlySet<string> = new Set(['H', 'B', 'C', 'N', 'O', 'P', 'S', 'F', 'Cl', 'Br', 'I']);

/** Every element symbol, so that an unknown symbol and an unsupported element get different messages. */
export const ALL_ELEMENTS: ReadonlySet<string> = new Set(ELEMENT_SYMBOLS);
