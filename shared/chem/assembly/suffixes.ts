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
 * -carboxylic acid likewise for COOH (P-65.1.2).
 */
export function suffixWord(kind: SuffixKind, skeleton: Skeleton['kind']): string {
  if (kind === 'al') return skeleton === 'chain' ? 'al' : 'carbaldehyde';
  if (kind === 'acid') return skeleton === 'chain' ? 'oic acid' : 'carboxylic acid';
  return kind;
}

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
 * Retained names with principal groups (P-63.1.1, P-64.2.1.3, P-65.1.1.1, P-66.6.1.1.1; written
 * from memory): phenol, aniline (P-62.2.1.1.1), benzaldehyde and benzoic acid are preferred IUPAC names and take ring
 * substituents (4-chlorophenol, N-methylaniline); acetic acid is a preferred name that takes substituents on C-2
 * (chloroacetic acid, phenylacetic acid); formic acid, oxalic acid, formaldehyde and acetaldehyde
 * are preferred names of the bare compounds (substituted acetaldehydes are named only in the
 * traditional style, e.g. phenylacetaldehyde); acetone is a general name only (the preferred name
 * is propan-2-one).
 */
export function retainedPrincipalParent(e: Evaluated, style: NameStyle): string | null {
  const kind = e.principal[0].group.kind;
  const count = e.principal.length;
  const size = e.skeleton.atoms.length;
  const bare = e.prefixes.length === 0 && e.multiple.length === 0;
  if (e.skeleton.kind === 'benzene' && count === 1) return ({ ol: 'phenol', al: 'benzaldehyde', acid: 'benzoic acid', amine: 'aniline' } as Record<string, string>)[kind] ?? null;
  if (e.skeleton.kind !== 'chain') return null;
  if (size === 1 && (kind === 'al' || kind === 'acid')) {
    if (!bare) throw new NamingRefusal('a substituted formaldehyde or formic acid is another class (acid, ester, amide…), not named here');
    return kind === 'al' ? 'formaldehyde' : 'formic acid';
  }
  if (size === 2 && kind === 'acid') return count === 2 ? 'oxalic acid' : 'acetic acid';
  if (size === 2 && kind === 'al' && count === 1) {
    if (!bare && style === 'preferred') {
      throw new NamingRefusal('substituted acetaldehydes: the preferred name is not settled in this engine (the traditional style names them, e.g. phenylacetaldehyde)');
    }
    return 'acetaldehyde';
  }
  if (style === 'traditional' && kind === 'one' && size === 3 && bare) return 'acetone';
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
