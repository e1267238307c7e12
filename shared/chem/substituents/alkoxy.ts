import { enclose } from '../assembly/enclosing';
import type { NamingContext, SubstituentName } from '../numbering/context';
import { nameSubstituent } from './substituent';

/** Unsubstituted retained alkoxy prefixes, per style (P-63.2.2.2; written from memory). */
const RETAINED: Record<'preferred' | 'traditional', Record<string, string>> = {
  preferred: { 'tert-butyl': 'tert-butoxy' },
  traditional: { isopropyl: 'isopropoxy', isobutyl: 'isobutoxy', 'sec-butyl': 'sec-butoxy', 'tert-butyl': 'tert-butoxy' },
};

/** Parents whose 'yl' contracts with 'oxy' (methoxy, ethoxy, propoxy, butoxy, phenoxy), substituted or not. */
const CONTRACTED = new Set(['methyl', 'ethyl', 'propyl', 'butyl', 'phenyl']);

/**
 * An ether oxygen seen from the parent: the group on its far side plus 'oxy' (P-63.2.2.2). The
 * contracted forms methoxy, ethoxy, propoxy, butoxy and phenoxy keep their contraction when
 * substituted (2-chloroethoxy, 4-nitrophenoxy); every other group is cited as a compound prefix
 * '(alkyl)oxy': pentyloxy, cyclohexyloxy, (propan-2-yl)oxy, benzyloxy.
 */
export function alkoxy(ctx: NamingContext, oxygen: number, from: number, atoms: number[]): SubstituentName {
  const far = ctx.graph.adjacency[oxygen].find((e) => e.atom !== from)!.atom;
  const group = nameSubstituent(ctx, far, oxygen);
  const retained = RETAINED[ctx.style][group.name];
  if (retained) return { name: retained, compound: false, enclose: false, atoms };
  if (group.hydride && CONTRACTED.has(group.hydride)) {
    return { name: `${group.name.slice(0, -2)}oxy`, compound: group.compound, enclose: group.enclose, atoms };
  }
  const inner = group.enclose ? enclose(group.name) : group.name;
  return { name: `${inner}oxy`, compound: true, enclose: true, atoms };
}
