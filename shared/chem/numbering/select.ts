import { compareAlphanumerical, compareNumberLists } from '../assembly/alphanumeric';
import type { Evaluated } from './evaluate';

type Comparator = (a: Evaluated, b: Evaluated) => number;

const more = (count: (e: Evaluated) => number): Comparator => (a, b) => count(b) - count(a);
/** `locants` must return an ascending list. */
const lower = (locants: (e: Evaluated) => number[]): Comparator => (a, b) => compareNumberLists(locants(a), locants(b));

/**
 * Locants of the prefixes in order of citation (alphanumerical order of their names), for
 * P-31.1.4.3.4 / P-45.2.3: lowest locants to the prefix cited first.
 */
function locantsInCitationOrder(e: Evaluated): number[] {
  e.keys.citation ??= [...e.prefixes]
    .sort((x, y) => compareAlphanumerical(x.substituent.name, y.substituent.name) || x.locant - y.locant)
    .map((p) => p.locant);
  return e.keys.citation;
}

/**
 * The criteria deciding between candidate parents and their numberings, in the order of the
 * 2013 rules. Chain choice and numbering interleave exactly as below, so both are decided by one
 * pass over (chain, direction) candidates:
 *  P-44.1.1 greater number of principal characteristic groups (rings before chains, P-44.1.2.2, is
 *  decided before these criteria, when the candidates are gathered);
 *  P-44.3 (b) greater number of skeletal atoms;
 *  P-44.4.1.1 greater number of multiple bonds; P-44.4.1.2 greater number of double bonds;
 *  P-31.1.4.2.4 lowest locants for principal characteristic groups and free valences;
 *  P-31.1.4.2.4 / P-44.4.1.4 lowest locants for multiple bonds together, then for double bonds;
 *  P-45.2.1 greater number of prefixes; P-45.2.2 / P-31.1.4.3 lowest locants for all prefixes;
 *  P-45.2.3 / P-31.1.4.3.4 lowest locants for the prefix cited first in alphanumerical order.
 * The last resort, P-45.5 (the name first in alphanumerical order), needs the rendered names and
 * is applied by the caller.
 */
const CRITERIA: Comparator[] = [
  more((e) => e.principal.length),
  more((e) => e.skeleton.atoms.length),
  more((e) => e.multiple.length),
  more((e) => e.keys.double.length),
  lower((e) => e.freeValence),
  lower((e) => e.keys.principal),
  lower((e) => e.keys.multiple),
  lower((e) => e.keys.double),
  more((e) => e.prefixes.length),
  lower((e) => e.keys.prefixes),
  (a, b) => compareNumberLists(locantsInCitationOrder(a), locantsInCitationOrder(b)),
];

export function bestCandidates(candidates: Evaluated[], extra: Comparator[] = []): Evaluated[] {
  let survivors = candidates;
  for (const criterion of extra) if (survivors.length > 1) survivors = keepBest(survivors, criterion);
  for (const criterion of CRITERIA) if (survivors.length > 1) survivors = keepBest(survivors, criterion);
  return survivors;
}

function keepBest(candidates: Evaluated[], criterion: Comparator): Evaluated[] {
  let best = candidates[0];
  for (const c of candidates) if (criterion(c, best) < 0) best = c;
  return candidates.filter((c) => criterion(c, best) === 0);
}

/** P-45.5: among candidates the rules cannot separate, the name first in alphanumerical order. */
export function firstByName<T>(items: T[], render: (item: T) => string): { item: T; name: string } {
  let best = items[0];
  let bestName = render(best);
  for (const item of items.slice(1)) {
    const name = render(item);
    if (compareAlphanumerical(name, bestName) < 0) (best = item), (bestName = name);
  }
  return { item: best, name: bestName };
}
