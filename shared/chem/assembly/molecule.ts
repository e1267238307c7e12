import type { MolGraph } from '../graph/types';
import { findRingSystems, type RingSystems } from '../graph/rings';
import { findPrefixGroups } from '../groups/scope';
import { chainTrees, longestParentChains, principalChains } from '../chain/paths';
import { findPrincipalGroups, suffixIncludesCarbon } from '../groups/principal';
import { locantText, type NamingContext, type Skeleton } from '../numbering/context';
import { evaluate, type Evaluated } from '../numbering/evaluate';
import { bestCandidates, firstByName } from '../numbering/select';
import { cycleBondOrders, isBenzene, isMancudeNonBenzene, ringNumberings } from '../rings/numberings';
import { NamingRefusal } from './refusal';
import type { NameStyle } from './style';
import { parentPart, renderUnit } from './unit';
import { suffixWord } from './suffixes';
import { esterAlkyl } from './principal-parent';
import { checkScope } from './scope';
import { compareDescriptorSequences, hasStereoMarks, placeDescriptors, stereoDescriptors } from './stereo-descriptors';
import { retainedBenzeneName } from './retained-benzenes';

export interface Explanation {
  parent: { kind: 'chain' | 'ring' | 'benzene'; name: string; atoms: number[] };
  substituents: { locant: string; name: string; atoms: number[] }[];
  principalGroups?: { locant: string; suffix: string; atoms: number[] }[];
}

export type Naming = { ok: true; name: string; explanation: Explanation } | { ok: false; reason: string };

export function nameGraph(graph: MolGraph, style: NameStyle): Naming {
  try {
    return nameOrRefuse(graph, style);
  } catch (error) {
    if (error instanceof NamingRefusal) return { ok: false, reason: error.message };
    throw error;
  }
}

function nameOrRefuse(graph: MolGraph, style: NameStyle): Naming {
  checkScope(graph);
  const rings = findRingSystems(graph);
  for (const system of rings.systems) {
    if (!system.monocycle) throw new NamingRefusal('fused, bridged and spiro ring systems are not named yet (only separate monocycles)');
    if (system.atoms.some((a) => graph.atoms[a].element !== 'C')) throw new NamingRefusal('heterocycles are not named yet');
    if (isMancudeNonBenzene(graph, system.atoms)) throw new NamingRefusal('fully conjugated rings other than benzene (annulenes) are not named yet');
  }
  refuseRingAssemblies(graph, rings);
  const groups = findPrefixGroups(graph);
  const ctx: NamingContext = { graph, style, rings, groups, principal: findPrincipalGroups(graph, groups), substituents: new Map() };
  const candidates = parentCandidates(ctx).map((s) => evaluate(ctx, s, null));
  const survivors = bestCandidates(candidates);
  refuseMultiplicativeCases(survivors);
  const names = new Map(survivors.map((e) => [e, renderUnit(ctx, e)]));
  const { name } = firstByName(survivors, (e) => names.get(e)!);
  const tied = survivors.filter((e) => names.get(e) === name);
  const retained = retainedBenzeneName(tied[0], style);
  if (retained) return { ok: true, name: retained, explanation: explainRetained(tied[0], retained) };
  if (!hasStereoMarks(graph)) return { ok: true, name, explanation: explain(ctx, tied[0]) };
  // Numberings that give the same name may still place descriptors differently.
  const stereo = stereoDescriptors(graph);
  const placed = tied.map((e) => ({ e, descriptors: placeDescriptors(stereo, e) }));
  placed.sort((x, y) => compareDescriptorSequences(x.descriptors.ranked, y.descriptors.ranked));
  const chosen = placed[0];
  return { ok: true, name: withDescriptors(chosen.e, chosen.descriptors.prefix, name), explanation: explain(ctx, chosen.e) };
}

/**
 * P-93.5: descriptors go in front of the part of the name they describe; in an ester name that is
 * the acid component, after the alkyl word: ethyl (2S)-2-chloropropanoate.
 */
function withDescriptors(e: Evaluated, prefix: string, name: string): string {
  if (!prefix || e.principal[0]?.group.kind !== 'ester') return prefix + name;
  const space = name.indexOf(' ');
  return `${name.slice(0, space + 1)}${prefix}${name.slice(space + 1)}`;
}

/**
 * Candidate parents in the order of the 2013 rules: the greatest number of principal
 * characteristic groups (P-44.1.1); then a ring is senior to a chain (P-44.1.2.2); among
 * monocycles, the larger ring (P-44.2.1.2.5), then the one with more multiple bonds (P-44.4.1.1).
 * Two rings that still tie would call for multiplicative or ring-assembly names (P-15.3, P-28),
 * which are not built yet. Chains (of every acyclic carbon tree) are left to the numbering criteria.
 */
function parentCandidates(ctx: NamingContext): Skeleton[] {
  const { graph, rings } = ctx;
  const weight = (atom: number) => ctx.principal.filter((g) => g.anchors.includes(atom)).length;
  const onRing = (atoms: Set<number>) =>
    ctx.principal.filter((g) => g.anchors.some((a) => atoms.has(a)) || (suffixIncludesCarbon(g.kind) && graph.adjacency[g.anchors[0]].some((e) => atoms.has(e.atom)))).length;
  const ranked = rings.systems.map((system) => {
    const numberings = ringNumberings(graph, system.atoms, null);
    const multiple = cycleBondOrders(graph, system.atoms).filter((order) => order > 1).length;
    return { numberings, size: system.atoms.length, multiple, groups: onRing(new Set(system.atoms)) };
  });
  const chains = chainTrees(ctx).flatMap((start) =>
    (ctx.principal.length ? principalChains(ctx, start, weight) : longestParentChains(ctx, start)).map((atoms) => ({
      atoms,
      groups: atoms.reduce((sum, a) => sum + weight(a), 0),
    })),
  );
  const most = Math.max(...ranked.map((r) => r.groups), ...chains.map((c) => c.groups));
  const senior = ranked.filter((r) => r.groups === most);
  if (senior.length === 0) return chains.filter((c) => c.groups === most).map((c) => ({ kind: 'chain', atoms: c.atoms }));
  senior.sort((a, b) => b.size - a.size || b.multiple - a.multiple);
  if (senior.length > 1 && senior[1].size === senior[0].size && senior[1].multiple === senior[0].multiple) {
    throw new NamingRefusal('two or more equally senior rings: multiplicative and ring-assembly names (P-15.3, P-28) are not built yet');
  }
  return senior[0].numberings;
}

/**
 * P-28: two identical rings joined directly form a ring assembly (biphenyl, 1,1'-bi(cyclohexane)),
 * a parent hydride of its own, also where a characteristic group would otherwise pick one ring as
 * the parent ([1,1'-biphenyl]-4-ol). Rings of equal size joined directly are refused unless exactly
 * one of them is benzene (cyclohexylbenzene).
 */
function refuseRingAssemblies(graph: MolGraph, rings: RingSystems): void {
  for (const bond of graph.bonds) {
    const [a, b] = [rings.systemOf[bond.from], rings.systemOf[bond.to]];
    if (a < 0 || b < 0 || a === b) continue;
    const [x, y] = [rings.systems[a].atoms, rings.systems[b].atoms];
    if (x.length === y.length && isBenzene(graph, x) === isBenzene(graph, y)) {
      throw new NamingRefusal('two identical rings joined directly form a ring assembly (biphenyl, bi(cyclohexane), P-28), which is not named yet');
    }
  }
}

/**
 * P-15.3, P-51.3: identical parents joined through a substituent group (HO-CH2CH2-O-CH2CH2-OH,
 * ClCH2CH2-O-CH2CH2Cl) take multiplicative names in preferred names (2,2'-oxydi(ethan-1-ol)),
 * which are not built. Equally senior chains that share no atom are such a case unless they share
 * their principal group (N-ethylethanamine) or carry nothing but the link (ethoxyethane).
 */
function refuseMultiplicativeCases(survivors: Evaluated[]): void {
  const first = survivors[0];
  const atoms = new Set(first.skeleton.atoms);
  const apart = survivors.find((e) => !e.skeleton.atoms.some((a) => atoms.has(a)));
  if (!apart) return;
  const shared = first.principal.length > 0 && first.principal.every((p) => apart.principal.some((q) => q.group === p.group));
  const bare = first.principal.length === 0 && survivors.every((e) => e.prefixes.length === 1);
  if (!shared && !bare) throw new NamingRefusal('identical parents joined through a linking group: multiplicative names (P-15.3) are not built yet');
}

/** A retained name (toluene, xylene…) covers its alkyl groups: they belong to the parent. */
function explainRetained(e: Evaluated, name: string): Explanation {
  const atoms = [...e.skeleton.atoms, ...e.prefixes.flatMap((p) => p.substituent.atoms)];
  return { parent: { kind: e.skeleton.kind, name, atoms }, substituents: [] };
}

function explain(ctx: NamingContext, e: Evaluated): Explanation {
  const explanation: Explanation = {
    parent: { kind: e.skeleton.kind, name: parentPart(e, ctx), atoms: [...e.skeleton.atoms] },
    substituents: e.prefixes
      .sort((a, b) => a.locant - b.locant)
      .map((p) => ({ locant: locantText(p.locant), name: p.substituent.name, atoms: p.substituent.atoms })),
  };
  if (e.principal[0]?.group.kind === 'ester') explanation.substituents.push({ locant: 'O', name: esterAlkyl(ctx, e).text, atoms: esterAlkyl(ctx, e).atoms });
  if (e.principal.length) {
    explanation.principalGroups = e.principal
      .map(({ locant, group }) => ({
        locant: String(locant),
        suffix: suffixWord(group.kind, e.skeleton.kind),
        atoms: suffixIncludesCarbon(group.kind) ? [group.anchors[0], ...group.atoms] : [...group.atoms],
      }))
      .sort((a, b) => Number(a.locant) - Number(b.locant));
  }
  return explanation;
}
