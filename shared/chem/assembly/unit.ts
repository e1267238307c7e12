import { N_LOCANT, type NamingContext } from '../numbering/context';
import type { Evaluated } from '../numbering/evaluate';
import { hydrideName, type FreeValenceKind } from './hydride';
import { citePrefixes, joinPrefixes } from './prefixes';
import { NamingRefusal } from './refusal';
import { suffixIncludesCarbon } from '../groups/principal';
import { principalLocantsOmitted, retainedPrincipalParent, withSuffix } from './suffixes';

const FREE_VALENCE: Record<1 | 2 | 3, FreeValenceKind> = { 1: 'yl', 2: 'ylidene', 3: 'ylidyne' };

/**
 * Whether P-31.1.4.2.4 lets the prefix locants go: mononuclear parents (chloromethane), a single
 * prefix on a two-atom chain (chloroethane), a single prefix on a ring whose atoms are all
 * alike (chlorocyclohexane, chlorobenzene).
 */
function omitPrefixLocants(e: Evaluated): boolean {
  const size = e.skeleton.atoms.length;
  if (e.prefixes.some((p) => p.locant === N_LOCANT)) return false;
  if (size === 1) return true;
  // Substituted acetic acid (and acetaldehyde, traditional style): every prefix sits on C-2.
  if (e.principal.length) return principalLocantsOmitted(e) || (e.skeleton.kind === 'chain' && size === 2 && suffixIncludesCarbon(e.principal[0].group.kind));
  if (e.attachment) return false;
  if (e.prefixes.length !== 1) return false;
  if (e.skeleton.kind === 'chain') return size === 2;
  return e.multiple.length === 0;
}

/** Name of a parent (no attachment) or a substituent group (with attachment), from its evaluation. */
export function renderUnit(ctx: NamingContext, e: Evaluated): string {
  return joinPrefixes(citePrefixes(e.prefixes, omitPrefixLocants(e))) + parentPart(e, ctx);
}

/** The parent hydride's own name with unsaturation and free-valence endings, without prefixes. */
export function parentPart(e: Evaluated, ctx: NamingContext): string {
  if (e.closesRing) throw new NamingRefusal('a ring numbering that puts a multiple bond between the last and first ring atoms is not handled yet');
  const size = e.skeleton.atoms.length;
  if (e.principal.length) {
    const kind = e.principal[0].group.kind;
    const twin = ({ al: 'formyl', acid: 'carboxy' } as Record<string, string>)[kind];
    if (e.skeleton.kind === 'chain' && e.prefixes.some((p) => p.substituent.name === twin)) {
      throw new NamingRefusal(`more than two ${kind === 'al' ? 'CHO' : 'COOH'} groups on one chain: names such as propane-1,2,3-tricarboxylic acid (P-65.1.2.2) are not built yet`);
    }
    // P-103.1: common α-amino acids have retained names (glycine, alanine…) that are not given here.
    if (kind === 'acid' && e.skeleton.kind === 'chain' && e.prefixes.some((p) => p.locant === 2 && p.substituent.name === 'amino')) {
      throw new NamingRefusal('α-amino acids have retained names (P-103) that the engine does not give yet');
    }
    if (kind === 'amine' && e.principal.length > 1 && e.prefixes.some((p) => p.locant === N_LOCANT)) {
      throw new NamingRefusal('N-substituted polyamines need N1/N2 locants (P-62.2.1.1.2), which are not built yet');
    }
    const retained = retainedPrincipalParent(e, ctx.style);
    if (retained) return retained;
    const cite = !principalLocantsOmitted(e);
    const hydride = e.skeleton.kind === 'benzene' ? 'benzene' : hydrideName({ size, ring: e.skeleton.kind === 'ring', multiple: e.multiple, freeValence: null, citeMultipleBondLocants: cite });
    return withSuffix(e, hydride, cite);
  }
  const fv = e.attachment ? { locant: e.freeValence[0], kind: FREE_VALENCE[e.attachment.order] } : null;
  let parent: string;
  if (e.skeleton.kind === 'benzene') {
    if (fv && fv.kind !== 'yl') throw new NamingRefusal('a benzene ring attached by a multiple bond cannot be named');
    parent = fv ? 'phenyl' : 'benzene';
  } else {
    const citeMultiple = !(e.skeleton.kind === 'chain' && size === 2) && !(e.skeleton.kind === 'ring' && !fv && e.multiple.length === 1 && e.prefixes.length === 0);
    parent = hydrideName({ size, ring: e.skeleton.kind === 'ring', multiple: e.multiple, freeValence: fv, citeMultipleBondLocants: citeMultiple });
  }
  return parent;
}

export function prefixLocantsOmitted(e: Evaluated): boolean {
  return omitPrefixLocants(e);
}
