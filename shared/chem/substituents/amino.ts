import { NamingRefusal } from '../assembly/refusal';
import { multipliedParts } from '../assembly/prefixes';
import type { NamingContext, SubstituentName } from '../numbering/context';
import { nameSubstituent } from './substituent';

/**
 * An amine nitrogen cited as a prefix (P-62.2.1.1 and P-62.2.2, written from memory): amino;
 * with one group on N, that group plus 'amino' (methylamino, (propan-2-yl)amino), anilino for
 * C6H5-NH- (the preferred prefix); with two identical groups, dimethylamino or bis(2-chloroethyl)amino.
 * Two different groups on N would need nested N-prefixes and are refused.
 */
export function amino(ctx: NamingContext, nitrogen: number, from: number, atoms: number[]): SubstituentName {
  const groups = ctx.graph.adjacency[nitrogen].filter((e) => e.atom !== from).map((e) => nameSubstituent(ctx, e.atom, nitrogen));
  if (groups.length === 0) return { name: 'amino', compound: false, enclose: false, atoms };
  const [first] = groups;
  if (groups.length === 1 && first.name === 'phenyl') return { name: 'anilino', compound: false, enclose: false, atoms };
  if (groups.some((g) => g.name !== first.name)) {
    throw new NamingRefusal(`the nitrogen atom ${nitrogen + 1} carries two different groups; such amino prefixes (P-62.2.2) are not named yet`);
  }
  return { name: `${multipliedParts(first, groups.length).join('')}amino`, compound: true, enclose: true, atoms };
}
