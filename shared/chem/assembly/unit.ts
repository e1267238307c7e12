import { N_LOCANT, type NamingContext } from '../numbering/context';
import type { Evaluated } from '../numbering/evaluate';
import { hydrideName, type FreeValenceKind } from './hydride';
import { citePrefixes, joinPrefixes } from './prefixes';
import { NamingRefusal } from './refusal';
import { suffixIncludesCarbon } from '../groups/principal';
import { principalLocantsOmitted } from './suffixes';
import { esterAlkyl, principalParent } from './principal-parent';

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

const ATOMIC_PREFIXES = new Set(['fluoro', 'chloro', 'bromo', 'iodo', 'nitro']);

/**
 * Without locants, different prefixes such as chloro and phenyl would run together
 * ('chlorophenylacetic acid' reads as (chlorophenyl)); the 2013 rules separate them with
 * parentheses (P-16.5.1.3: chloro(phenyl)acetic acid, cyclohexyl(phenyl)methanone), which the
 * engine does not write yet. Prefixes already in enclosing marks after the first
 * ((4-chlorophenyl)(4-hydroxyphenyl)methanone) and halogen and nitro prefixes alone
 * (bromochlorofluoromethane) are unambiguous.
 */
export function refuseRunTogetherPrefixes(e: Evaluated): void {
  const names = new Set(e.prefixes.map((p) => p.substituent.name));
  if (names.size < 2 || [...names].every((n) => ATOMIC_PREFIXES.has(n))) return;
  const cited = citePrefixes(e.prefixes, true);
  if (cited.slice(1).some((c) => !/^[a-z]*[([{]/.test(c.text))) {
    throw new NamingRefusal(`prefixes ${[...names].join(', ')} without locants need separating parentheses (P-16.5.1.3), which are not written yet`);
  }
}

/** Name of a parent (no attachment) or a substituent group (with attachment), from its evaluation. */
export function renderUnit(ctx: NamingContext, e: Evaluated): string {
  const omit = omitPrefixLocants(e);
  if (omit) refuseRunTogetherPrefixes(e);
  const name = joinPrefixes(citePrefixes(e.prefixes, omit)) + parentPart(e, ctx);
  return e.principal[0]?.group.kind === 'ester' ? `${esterAlkyl(ctx, e).text} ${name}` : name;
}

/** The parent hydride's own name with unsaturation and free-valence endings, without prefixes. */
export function parentPart(e: Evaluated, ctx: NamingContext): string {
  if (e.closesRing) throw new NamingRefusal('a ring numbering that puts a multiple bond between the last and first ring atoms is not handled yet');
  const size = e.skeleton.atoms.length;
  if (e.principal.length) return principalParent(ctx, e);
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
