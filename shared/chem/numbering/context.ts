import type { MolGraph } from '../graph/types';
import type { RingSystems } from '../graph/rings';
import type { PrefixGroup } from '../groups/scope';
import { suffixIncludesCarbon, type PrincipalGroup } from '../groups/principal';
import type { NameStyle } from '../assembly/style';

/** A named substituent prefix (P-29, P-61), independent of the parent's numbering. */
export interface SubstituentName {
  /** As cited, without multiplying prefix or enclosing marks: 'methyl', '2-methylpropyl', 'tert-butyl'. */
  name: string;
  /** Substituted (compound or complex) prefix: multiplied with bis/tris, always enclosed. */
  compound: boolean;
  /** Needs enclosing marks when cited (compound prefixes and prefixes containing locants). */
  enclose: boolean;
  atoms: number[];
  /** The group's own parent with its free-valence ending ('ethyl', 'phenyl'), for alkoxy contraction. */
  hydride?: string;
}

export interface NamingContext {
  graph: MolGraph;
  style: NameStyle;
  rings: RingSystems;
  groups: Map<number, PrefixGroup>;
  /** Every occurrence of the principal characteristic group (empty when there is none). */
  principal: PrincipalGroup[];
  /** Memo of substituent names, keyed by attachment atom and the parent atom it hangs from. */
  substituents: Map<number, SubstituentName>;
}

/** A candidate parent hydride (or substituent parent) in locant order: atoms[0] has locant 1. */
export interface Skeleton {
  kind: 'chain' | 'ring' | 'benzene';
  atoms: number[];
}

/** The free valence of a substituent: `atom` bonds to `from` (outside) with bond `order`. */
export interface Attachment {
  atom: number;
  from: number;
  order: 1 | 2 | 3;
}

/**
 * The italic locant N of a substituent on an amine nitrogen, held as 0: it is the same in every
 * numbering, and P-14.3.5 ranks letter locants below numerals.
 */
export const N_LOCANT = 0;

export function locantText(locant: number): string {
  return locant === N_LOCANT ? 'N' : String(locant);
}

export interface Prefix {
  locant: number;
  substituent: SubstituentName;
}

/**
 * Acyclic carbons can be chain atoms, except the carbon of a COOH, CN, CONH2… group cited as a
 * prefix (carboxy, cyano, carbamoyl include their carbon); as a principal group it is a chain atom.
 */
export function isChainCarbon(ctx: NamingContext, atom: number): boolean {
  if (ctx.graph.atoms[atom].element !== 'C' || ctx.rings.systemOf[atom] >= 0) return false;
  return !ctx.groups.has(atom) || ctx.principal.some((g) => g.anchors[0] === atom && suffixIncludesCarbon(g.kind));
}
