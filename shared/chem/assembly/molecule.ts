import type { MolGraph } from '../graph/types';
import { findRingSystems } from '../graph/rings';
import { findPrefixGroups } from '../groups/scope';
import { longestParentChains } from '../chain/paths';
import type { NamingContext, Skeleton } from '../numbering/context';
import { evaluate, type Evaluated } from '../numbering/evaluate';
import { bestCandidates, firstByName } from '../numbering/select';
import { isMancudeNonBenzene, ringNumberings } from '../rings/numberings';
import { NamingRefusal } from './refusal';
import type { NameStyle } from './style';
import { parentPart, renderUnit } from './unit';
import { checkScope } from './scope';
import { compareDescriptorSequences, hasStereoMarks, placeDescriptors } from './stereo-descriptors';
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
  const ctx: NamingContext = { graph, style, rings, groups: findPrefixGroups(graph), substituents: new Map() };
  const candidates = parentCandidates(ctx).map((s) => evaluate(ctx, s, null));
  const survivors = bestCandidates(candidates);
  const { name } = firstByName(survivors, (e) => renderUnit(ctx, e));
  const tied = survivors.filter((e) => renderUnit(ctx, e) === name);
  const retained = retainedBenzeneName(tied[0], style);
  if (retained) return { ok: true, name: retained, explanation: explainRetained(tied[0], retained) };
  if (!hasStereoMarks(graph)) return { ok: true, name, explanation: explain(tied[0]) };
  // Numberings that give the same name may still place descriptors differently.
  const placed = tied.map((e) => ({ e, descriptors: placeDescriptors(graph, e) }));
  placed.sort((x, y) => compareDescriptorSequences(x.descriptors.ranked, y.descriptors.ranked));
  const chosen = placed[0];
  return { ok: true, name: chosen.descriptors.prefix + name, explanation: explain(chosen.e) };
}

/**
 * P-44.1.2.2 (2013): a ring is senior to a chain, so any ring makes the parent a ring. Among
 * monocycles, the larger ring (P-44.2.1.2.5), then the one with more multiple bonds
 * (P-44.4.1.1). Two rings that still tie would call for multiplicative or ring-assembly names
 * (P-15.3, P-28), which are not built yet.
 */
function parentCandidates(ctx: NamingContext): Skeleton[] {
  const { graph, rings } = ctx;
  if (rings.systems.length === 0) {
    const firstCarbon = graph.atoms.findIndex((a) => a.element === 'C');
    return longestParentChains(ctx, firstCarbon).map((atoms) => ({ kind: 'chain', atoms }));
  }
  const ranked = rings.systems.map((system) => {
    const numberings = ringNumberings(graph, system.atoms, null);
    const multiple = numberings[0].kind === 'benzene' ? system.atoms.length / 2 : evaluateMultipleBonds(ctx, numberings[0]);
    return { numberings, size: system.atoms.length, multiple };
  });
  ranked.sort((a, b) => b.size - a.size || b.multiple - a.multiple);
  if (ranked.length > 1 && ranked[1].size === ranked[0].size && ranked[1].multiple === ranked[0].multiple) {
    throw new NamingRefusal('two or more equally senior rings: multiplicative and ring-assembly names (P-15.3, P-28) are not built yet');
  }
  return ranked[0].numberings;
}

function evaluateMultipleBonds(ctx: NamingContext, skeleton: Skeleton): number {
  const atoms = skeleton.atoms;
  let count = 0;
  for (let i = 0; i < atoms.length; i++) {
    const edge = ctx.graph.adjacency[atoms[i]].find((e) => e.atom === atoms[(i + 1) % atoms.length])!;
    if (ctx.graph.bonds[edge.bond].order > 1) count += 1;
  }
  return count;
}

/** A retained name (toluene, xylene…) covers its alkyl groups: they belong to the parent. */
function explainRetained(e: Evaluated, name: string): Explanation {
  const atoms = [...e.skeleton.atoms, ...e.prefixes.flatMap((p) => p.substituent.atoms)];
  return { parent: { kind: e.skeleton.kind, name, atoms }, substituents: [] };
}

function explain(e: Evaluated): Explanation {
  return {
    parent: { kind: e.skeleton.kind, name: parentPart(e), atoms: [...e.skeleton.atoms] },
    substituents: e.prefixes
      .map((p) => ({ locant: String(p.locant), name: p.substituent.name, atoms: p.substituent.atoms }))
      .sort((a, b) => Number(a.locant) - Number(b.locant)),
  };
}
