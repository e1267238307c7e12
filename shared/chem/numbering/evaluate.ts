import { bondBetween } from '../graph/rings';
import type { Attachment, NamingContext, Prefix, Skeleton } from './context';
import { nameSubstituent } from '../substituents/substituent';

/** What the seniority and numbering rules look at, for one candidate parent in one numbering. */
export interface Evaluated {
  skeleton: Skeleton;
  attachment: Attachment | null;
  /** Locant of the free valence (substituent groups only). */
  freeValence: number[];
  multiple: { locant: number; order: 2 | 3 }[];
  prefixes: Prefix[];
  /** Set when a multiple bond closes the ring between the last and the first atom. */
  closesRing: boolean;
  /** Sorted locant sets the numbering rules compare, computed once. */
  keys: { multiple: number[]; double: number[]; prefixes: number[]; citation: number[] | null };
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
  atoms.forEach((atom, i) => {
    for (const { atom: next } of graph.adjacency[atom]) {
      if (inSkeleton.has(next)) continue;
      if (attachment && atom === attachment.atom && next === attachment.from) continue;
      prefixes.push({ locant: i + 1, substituent: nameSubstituent(ctx, next, atom) });
    }
  });
  const freeValence = attachment ? [atoms.indexOf(attachment.atom) + 1] : [];
  const ascending = (values: number[]) => values.sort((x, y) => x - y);
  const keys = {
    multiple: ascending(multiple.map((m) => m.locant)),
    double: ascending(multiple.filter((m) => m.order === 2).map((m) => m.locant)),
    prefixes: ascending(prefixes.map((p) => p.locant)),
    citation: null,
  };
  return { skeleton, attachment, freeValence, multiple, prefixes, closesRing, keys };
}
