import type { MolGraph } from '../graph/types';
import type { PrefixGroup } from './scope';

/** Characteristic groups the engine can express as a suffix, in descending seniority (P-41). */
export type SuffixKind = 'al' | 'one' | 'ol';
const SENIORITY: SuffixKind[] = ['al', 'one', 'ol'];

/**
 * One occurrence of the principal characteristic group. `carbon` is the carbon that carries the
 * group's heteroatom: the CHO carbon itself for aldehydes (P-66.6.1), the carbon bearing =O for
 * ketones (P-64.2) and -OH for alcohols and phenols (P-63.1). `oxygen` is that heteroatom.
 */
export interface PrincipalGroup {
  kind: SuffixKind;
  carbon: number;
  oxygen: number;
}

/** An oxo group on a carbon with at most one carbon neighbour is an aldehyde (or formaldehyde). */
export function isAldehydeCarbon(graph: MolGraph, c: number): boolean {
  const carbons = graph.adjacency[c].filter((e) => graph.atoms[e.atom].element === 'C').length;
  return carbons <= 1 && graph.atoms[c].hydrogens >= 1 && graph.adjacency[c].some((e) => graph.atoms[e.atom].element === 'O' && graph.bonds[e.bond].order === 2);
}

/**
 * The principal characteristic group (P-41 seniority of classes: aldehydes > ketones >
 * alcohols) and every occurrence of it; an empty list when the molecule has none of them.
 */
export function findPrincipalGroups(graph: MolGraph, groups: Map<number, PrefixGroup>): PrincipalGroup[] {
  const found: PrincipalGroup[] = [];
  for (const group of groups.values()) {
    if (group.kind !== 'hydroxy' && group.kind !== 'oxo') continue;
    const carbon = graph.adjacency[group.atom][0].atom;
    const kind: SuffixKind = group.kind === 'hydroxy' ? 'ol' : isAldehydeCarbon(graph, carbon) ? 'al' : 'one';
    found.push({ kind, carbon, oxygen: group.atom });
  }
  for (const kind of SENIORITY) {
    const chosen = found.filter((g) => g.kind === kind);
    if (chosen.length) return chosen;
  }
  return [];
}
