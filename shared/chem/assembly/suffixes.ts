import { suffixIncludesCarbon, type SuffixKind } from '../groups/principal';
import type { Skeleton } from '../numbering/context';
import type { Evaluated } from '../numbering/evaluate';
import { multiplier } from './numerals';
import { N_LOCANT } from '../numbering/context';
import { NamingRefusal } from './refusal';
import type { NameStyle } from './style';

/**
 * The suffix word of a principal group: -ol (P-63.1.2), -one (P-64.2.1), -al for a CHO carbon
 * inside a chain and -carbaldehyde for a CHO group on a ring (P-66.6.1.1), -oic acid and
 * -carboxylic acid likewise for COOH (P-65.1.2), and the same pairs for esters (-oate,
 * -carboxylate), acid halides (-oyl, -carbonyl + halide), amides and nitriles.
 */
export function suffixWord(kind: SuffixKind, skeleton: Skeleton['kind']): string {
  const [chain, ring] = SUFFIXES[kind];
  return skeleton === 'chain' ? chain : ring;
}

/** [in a chain, on a ring] for each kind (P-65.1.2, P-65.5.1, P-65.6.3.2, P-66.1.1, P-66.5.1, P-66.6.1). */
const SUFFIXES: Record<SuffixKind, [string, string]> = {
  acid: ['oic acid', 'carboxylic acid'],
  ester: ['oate', 'carboxylate'],
  acylHalide: ['oyl', 'carbonyl'],
  amide: ['amide', 'carboxamide'],
  nitrile: ['nitrile', 'carbonitrile'],
  al: ['al', 'carbaldehyde'],
  one: ['one', 'one'],
  ol: ['ol', 'ol'],
  amine: ['amine', 'amine'],
};

/**
 * P-31.1.4.2.4: with a principal group, locants go only where nothing else could be meant: one
 * carbon (methanol, diphenylmethanone), or a single suffix and nothing else on a two-carbon chain
 * (ethanol) or on a ring without ring multiple bonds (cyclohexanol, cyclohexanecarbaldehyde).
 * Otherwise every locant is cited (2-chloroethan-1-ol, cyclohex-2-en-1-one).
 */
export function principalLocantsOmitted(e: Evaluated): boolean {
  const size = e.skeleton.atoms.length;
  if (size === 1) return true;
  // N-prefixes (N-methylethanamine) leave the carbon locants unambiguous.
  if (e.principal.length !== 1 || e.prefixes.some((p) => p.locant !== N_LOCANT)) return false;
  if (e.skeleton.kind === 'chain') return size === 2;
  return e.multiple.length === 0;
}

/**
 * Retained names with principal groups (P-62.2.1.1.1, P-63.1.1, P-65.1.1.1, P-65.1.7.2, P-66.1.1.1,
 * P-66.5.1.1, P-66.6.1.1.1; written from memory), as the stem the suffix would replace:
 * on benzene phenol, aniline, benzoic acid, benzoate, benzoyl, benzamide, benzonitrile,
 * benzaldehyde, all substitutable on the ring; the one- and two-carbon chains formic/acetic acid
 * (formate, acetate, formyl/acetyl halides, formamide, acetamide, formonitrile, acetonitrile,
 * formaldehyde, acetaldehyde) and oxalic acid (oxalate, oxalyl). Acetic acid and its esters and
 * acid halides take substituents on C-2 (chloroacetic acid); for the acetaldehyde, acetonitrile
 * and acetamide names the engine does not settle that and names substituted ones only in the
 * traditional style. Acetone is a general name only (the preferred name is propan-2-one).
 */
const BENZENE: Partial<Record<SuffixKind, string>> = {
  ol: 'phenol', amine: 'aniline', acid: 'benzoic acid', ester: 'benzoate', acylHalide: 'benzoyl', amide: 'benzamide', nitrile: 'benzonitrile', al: 'benzaldehyde',
};
const ONE_CARBON: Partial<Record<SuffixKind, string>> = {
  acid: 'formic acid', ester: 'formate', acylHalide: 'formyl', amide: 'formamide', nitrile: 'formonitrile', al: 'formaldehyde',
};
const TWO_CARBONS: Partial<Record<SuffixKind, string>> = {
  acid: 'acetic acid', ester: 'acetate', acylHalide: 'acetyl', amide: 'acetamide', nitrile: 'acetonitrile', al: 'acetaldehyde',
};
const OXALIC: Partial<Record<SuffixKind, string>> = { acid: 'oxalic acid', ester: 'oxalate', acylHalide: 'oxalyl' };

export function retainedPrincipalParent(e: Evaluated, style: NameStyle): string | null {
  const kind = e.principal[0].group.kind;
  const count = e.principal.length;
  const size = e.skeleton.atoms.length;
  const carbonPrefixes = e.prefixes.filter((p) => p.locant !== N_LOCANT).length;
  if (e.skeleton.kind === 'benzene') return count === 1 ? BENZENE[kind] ?? null : null;
  if (e.skeleton.kind !== 'chain' || e.multiple.length > 0) return null;
  if (size === 1 && ONE_CARBON[kind]) {
    if (carbonPrefixes > 0) throw new NamingRefusal('a substituted one-carbon acid derivative is another class, not named here');
    return ONE_CARBON[kind]!;
  }
  if (size === 2 && count === 2 && suffixIncludesCarbon(kind)) {
    if (OXALIC[kind]) return OXALIC[kind]!;
    throw new NamingRefusal('two-carbon diamides, dinitriles and dialdehydes: the retained-name status is not settled in this engine');
  }
  if (size === 2 && TWO_CARBONS[kind]) {
    const acidLike = kind === 'acid' || kind === 'ester' || kind === 'acylHalide';
    if (carbonPrefixes > 0 && !acidLike && (style === 'preferred' || e.prefixes.length > carbonPrefixes)) {
      throw new NamingRefusal(`substituted ${TWO_CARBONS[kind]}: the preferred name is not settled in this engine (the traditional style names C-substituted ones, e.g. phenyl${TWO_CARBONS[kind]})`);
    }
    return TWO_CARBONS[kind]!;
  }
  if (style === 'traditional' && kind === 'one' && size === 3 && e.prefixes.length === 0) return 'acetone';
  return null;
}

/** The parent hydride name `hydride` (ending in 'e') with the principal groups as suffix. */
export function withSuffix(e: Evaluated, hydride: string, citeLocants: boolean): string {
  const kind = e.principal[0].group.kind;
  const word = multiplier(e.principal.length) + suffixWord(kind, e.skeleton.kind);
  // -al and -oic acid on a chain always sit on chain ends: their locants are never cited (propanal, hexanedioic acid).
  const locants = citeLocants && !(suffixIncludesCarbon(kind) && e.skeleton.kind === 'chain') ? `-${e.keys.principal.join(',')}-` : '';
  // The final 'e' of the hydride name is elided before a vowel (propan-2-ol, but butane-1,4-diol).
  const stem = /^[aeiouy]/.test(word) ? hydride.replace(/e$/, '') : hydride;
  return stem + locants + word;
}
