import { bondBetween } from '../graph/rings';
import type { Attachment, NamingContext, Prefix, Skeleton } from './context';
import { suffixIncludesCarbon, type PrincipalGroup } from '../groups/principal';
import { N_LOCANT } from './context';
import { nameSubstituent } from '../substituents/substituent';

/** What the seniority and numbering rules look at, for one candidate parent in one numbering. */
export interface Evaluated {
  skeleton: Skeleton;
  attachment: Attachment | null;
  /** Locant of the free valence (substituent groups only). */
  freeValence: number[];
  multiple: { locant: number; order: 2 | 3 }[];
  prefixes: Prefix[];
  /** Principal characteristic groups expressed as the parent's suffix (parents only). */
  principal: { locant: number; group: PrincipalGroup }[];
  /** Set when a multiple bond closes the ring between the last and the first atom. */
  closesRing: boolean;
  /** Sorted locant sets the numbering rules compare, computed once. */
  keys: { principal: number[]; multiple: number[]; double: number[]; prefixes: number[]; citation: number[] | null };
}

export function evaluate(ctx: NamingContext, skeleton: Skeleton, attachment: Attachment | null): Evaluated {
  const { graph } = ctx;
  const atoms = skeleton.atoms;
  const inSkeleton = new Set(atoms);
  const multiple: Evaluated['multiple'] = [];
  let closesRing = false;
  const bondCount = skeleton.kind === 'chain' ? atoms.length - 1 : atoms.length;
  if (skeleton.kind !== 'benzene') {
    for (let i = 0; i < bondCount; i++) {
      const order = graph.bonds[bondBetween(graph, atoms[i], atoms[(i + 1) % atoms.length])].order;
      if (order === 1) continue;
      multiple.push({ locant: i + 1, order });
      if (i === atoms.length - 1) closesRing = true;
    }
  }
  const prefixes: Prefix[] = [];
  const principal: Evaluated['principal'] = [];
  for (let i = 0; i < atoms.length; i++) {
    const atom = atoms[i];
    for (const { atom: next } of graph.adjacency[atom]) {
      if (inSkeleton.has(next)) continue;
      if (attachment && atom === attachment.atom && next === attachment.from) continue;
      const suffix = attachment ? undefined : suffixGroup(ctx, skeleton, atom, next);
      if (suffix) {
        // A group with two atoms on the carbon (COOH) is one suffix.
        if (principal.some((p) => p.group === suffix)) continue;
        principal.push({ locant: i + 1, group: suffix });
        prefixes.push(...nPrefixes(ctx, suffix, atom));
        continue;
      }
      prefixes.push({ locant: i + 1, substituent: nameSubstituent(ctx, next, atom) });
    }
  }
  const freeValence = attachment ? [atoms.indexOf(attachment.atom) + 1] : [];
  const keys = {
    principal: ascendingLocants(principal),
    multiple: ascendingLocants(multiple),
    double: ascendingLocants(multiple.filter((m) => m.order === 2)),
    prefixes: ascendingLocants(prefixes),
    citation: null,
  };
  return { skeleton, attachment, freeValence, multiple, prefixes, principal, closesRing, keys };
}

function ascendingLocants(items: { locant: number }[]): number[] {
  const locants = new Array<number>(items.length);
  for (let i = 0; i < items.length; i++) locants[i] = items[i].locant;
  return locants.sort((x, y) => x - y);
}

/**
 * P-62.2.1.1, P-66.1.1.4: the carbon groups on the nitrogen of an amine or amide (other than
 * the parent's own carbon) are N-prefixes, locant N kept as 0. Each group is seen once, from the
 * first of its atoms met.
 */
function nPrefixes(ctx: NamingContext, group: PrincipalGroup, skeletonAtom: number): Prefix[] {
  if (group.kind !== 'amine' && group.kind !== 'amide') return [];
  const nitrogen = group.atoms.find((a) => ctx.graph.atoms[a].element === 'N')!;
  const bondedTo = group.kind === 'amine' ? skeletonAtom : group.anchors[0];
  return ctx.graph.adjacency[nitrogen].filter((e) => e.atom !== bondedTo).map((e) => ({ locant: N_LOCANT, substituent: nameSubstituent(ctx, e.atom, nitrogen) }));
}

/**
 * The principal group reached from skeleton atom `atom` through its neighbour `next`, if any: the
 * group's heteroatoms on its own carbon (-ol, -one, and -al or -oic acid when that carbon is in
 * the chain), or, on rings, the whole CHO or COOH group hanging from a ring atom (-carbaldehyde,
 * -carboxylic acid, P-66.6.1.1.3, P-65.1.2.2).
 */
function suffixGroup(ctx: NamingContext, skeleton: Skeleton, atom: number, next: number): PrincipalGroup | undefined {
  for (const group of ctx.principal) {
    if (group.anchors.includes(atom) && group.atoms.includes(next)) return group;
    if (suffixIncludesCarbon(group.kind) && skeleton.kind !== 'chain' && group.anchors[0] === next) return group;
  }
  return undefined;
}
