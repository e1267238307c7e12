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
  return { skeleton, attachment, freeValence, multiple, prefixes, closesRing };
}
