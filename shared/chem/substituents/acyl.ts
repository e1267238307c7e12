import { longestSubstituentChains } from '../chain/paths';
import { hydrideName } from '../assembly/hydride';
import { citePrefixes, joinPrefixes } from '../assembly/prefixes';
import { refuseRunTogetherPrefixes } from '../assembly/unit';
import type { NamingContext, Skeleton, SubstituentName } from '../numbering/context';
import { evaluate, type Evaluated } from '../numbering/evaluate';
import { bestCandidates, firstByName } from '../numbering/select';
import { ringNumberings } from '../rings/numberings';

/**
 * An acyl group cited as a prefix, attached through its carbonyl carbon (P-65.1.7, written from
 * memory): on a chain the acid's name with -oyl (acetyl, propanoyl, but-2-enoyl, chloroacetyl,
 * 2-methylpropanoyl; the carbonyl carbon is C-1); on a ring the ring's name with -carbonyl
 * (cyclohexanecarbonyl, 4-chlorocyclohexane-1-carbonyl) and benzoyl for benzene.
 */
export function acylPrefix(ctx: NamingContext, carbon: number, from: number, atoms: number[]): SubstituentName {
  const { graph } = ctx;
  const oxygen = graph.adjacency[carbon].find((e) => graph.atoms[e.atom].element === 'O' && graph.bonds[e.bond].order === 2)!.atom;
  const next = graph.adjacency[carbon].find((e) => e.atom !== from && e.atom !== oxygen)!.atom;
  const system = ctx.rings.systemOf[next];
  if (system >= 0) {
    const numberings = ringNumberings(graph, ctx.rings.systems[system].atoms, next);
    const best = bestCandidates(numberings.map((s) => evaluate(ctx, s, { atom: next, from: carbon, order: 1 })));
    const { item, name } = firstByName(best, (e) => ringAcylName(e));
    const compound = item.skeleton.kind !== 'benzene' || item.prefixes.length > 0;
    return { name, compound, enclose: compound, atoms };
  }
  const chains: Skeleton[] = longestSubstituentChains(ctx, carbon, from, true).map((a) => ({ kind: 'chain', atoms: a }));
  const best = bestCandidates(chains.map((s) => withoutOxo(evaluate(ctx, s, { atom: carbon, from, order: 1 }), oxygen)));
  const { item, name } = firstByName(best, (e) => chainAcylName(e));
  return { name, compound: item.prefixes.length > 0, enclose: item.prefixes.length > 0 || /\d/.test(name), atoms };
}

/** The =O of C-1 belongs to the -oyl ending, not to the prefixes. */
function withoutOxo(e: Evaluated, oxygen: number): Evaluated {
  const prefixes = e.prefixes.filter((p) => !p.substituent.atoms.includes(oxygen));
  return { ...e, prefixes, keys: { ...e.keys, prefixes: prefixes.map((p) => p.locant).sort((a, b) => a - b), citation: null } };
}

function chainAcylName(e: Evaluated): string {
  const size = e.skeleton.atoms.length;
  if (size === 2 && e.multiple.length === 0) {
    // Acetyl takes substituents on C-2 without locants, like acetic acid (chloroacetyl).
    refuseRunTogetherPrefixes(e);
    return joinPrefixes(citePrefixes(e.prefixes, true)) + 'acetyl';
  }
  const hydride = hydrideName({ size, ring: false, multiple: e.multiple, freeValence: null, citeMultipleBondLocants: true });
  return joinPrefixes(citePrefixes(e.prefixes, false)) + hydride.replace(/e$/, '') + 'oyl';
}

function ringAcylName(e: Evaluated): string {
  const prefixes = joinPrefixes(citePrefixes(e.prefixes, false));
  if (e.skeleton.kind === 'benzene') return `${prefixes}benzoyl`;
  const plain = e.prefixes.length === 0 && e.multiple.length === 0;
  const hydride = hydrideName({ size: e.skeleton.atoms.length, ring: true, multiple: e.multiple, freeValence: null, citeMultipleBondLocants: !plain });
  return `${prefixes}${hydride}${plain ? '' : '-1-'}carbonyl`;
}
