import type { NamingContext } from '../numbering/context';
import { N_LOCANT } from '../numbering/context';
import type { Evaluated } from '../numbering/evaluate';
import { nameSubstituent } from '../substituents/substituent';
import { hydrideName } from './hydride';
import { multiplier } from './numerals';
import { multipliedParts } from './prefixes';
import { NamingRefusal } from './refusal';
import { principalLocantsOmitted, retainedPrincipalParent, withSuffix } from './suffixes';

/** Prefix names that would be the principal group again, seen on a chain (a third COOH, CN…). */
const TWINS: Record<string, string> = { acid: 'carboxy', nitrile: 'cyano', al: 'formyl', amide: 'carbamoyl' };
const HALIDES: Record<string, string> = { F: 'fluoride', Cl: 'chloride', Br: 'bromide', I: 'iodide' };

/**
 * The parent with its principal groups: suffix (propan-2-ol, hexanedioic acid), retained name
 * (benzoic acid, acetamide) or functional class name of an acid halide (P-65.5.1: acetyl
 * chloride, butanedioyl dichloride). Cases the engine cannot yet name are refused here.
 */
export function principalParent(ctx: NamingContext, e: Evaluated): string {
  const kind = e.principal[0].group.kind;
  const count = e.principal.length;
  if (e.skeleton.kind === 'chain' && e.prefixes.some((p) => p.substituent.name === TWINS[kind])) {
    throw new NamingRefusal('more than two of the principal groups on one chain: names such as propane-1,2,3-tricarboxylic acid (P-65.1.2.2) are not built yet');
  }
  // P-103.1: common α-amino acids have retained names (glycine, alanine…) that are not given here.
  if (kind === 'acid' && e.skeleton.kind === 'chain' && e.prefixes.some((p) => p.locant === 2 && p.substituent.name === 'amino')) {
    throw new NamingRefusal('α-amino acids have retained names (P-103) that the engine does not give yet');
  }
  if ((kind === 'amine' || kind === 'amide') && count > 1 && e.prefixes.some((p) => p.locant === N_LOCANT)) {
    throw new NamingRefusal('N-substituted polyamines and polyamides need N1/N2 locants (P-62.2.1.1.2), which are not built yet');
  }
  let core = retainedPrincipalParent(e, ctx.style);
  if (!core) {
    const cite = !principalLocantsOmitted(e);
    const size = e.skeleton.atoms.length;
    const hydride = e.skeleton.kind === 'benzene' ? 'benzene' : hydrideName({ size, ring: e.skeleton.kind === 'ring', multiple: e.multiple, freeValence: null, citeMultipleBondLocants: cite });
    core = withSuffix(e, hydride, cite);
  }
  if (kind !== 'acylHalide') return core;
  const elements = new Set(e.principal.map(({ group }) => ctx.graph.atoms[group.atoms.find((a) => HALIDES[ctx.graph.atoms[a].element])!].element));
  if (elements.size > 1) throw new NamingRefusal('acid halides with different halogens are not named yet');
  return `${core} ${multiplier(count)}${HALIDES[[...elements][0]]}`;
}

/**
 * P-65.6.3.2.1: an ester is named as the alkyl (or aryl) group on the oxygen, then the anion name
 * of the acid: ethyl acetate, dimethyl butanedioate, propan-2-yl benzoate. Only esters whose ester
 * groups all belong to the parent acid and whose alkyl groups are identical are named; the alkyl
 * part must not hold another ester group.
 */
export function esterAlkyl(ctx: NamingContext, e: Evaluated): { text: string; atoms: number[] } {
  if (ctx.principal.length !== e.principal.length) throw new NamingRefusal('esters of polyols or of several acids are not named yet');
  const groups = e.principal.map(({ group }) => {
    const oxygen = group.atoms.find((a) => ctx.graph.atoms[a].element === 'O' && ctx.graph.adjacency[a].length === 2)!;
    const alkyl = ctx.graph.adjacency[oxygen].find((x) => x.atom !== group.anchors[0])!.atom;
    return nameSubstituent(ctx, alkyl, oxygen);
  });
  const [first] = groups;
  if (groups.some((g) => g.name !== first.name)) throw new NamingRefusal('esters with different alkyl groups need O-locants (P-65.6.3.2.2), which are not built yet');
  const atoms = groups.flatMap((g) => g.atoms);
  // A single alkyl word stands alone, without enclosing marks: propan-2-yl benzoate.
  return { text: groups.length === 1 ? first.name : multipliedParts(first, groups.length).join(''), atoms };
}
