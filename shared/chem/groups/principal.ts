import type { MolGraph } from '../graph/types';
import { isCarbonyl, type PrefixGroup } from './scope';

/** Characteristic groups the engine can express as a suffix, in descending seniority (P-41). */
export type SuffixKind = 'acid' | 'ester' | 'acylHalide' | 'amide' | 'nitrile' | 'al' | 'one' | 'ol' | 'amine';
const SENIORITY: SuffixKind[] = ['acid', 'ester', 'acylHalide', 'amide', 'nitrile', 'al', 'one', 'ol', 'amine'];

/** Suffix kinds of the groups keyed by their own carbon in the prefix-group map. */
const CARBON_GROUPS: Record<string, SuffixKind> = { carboxy: 'acid', ester: 'ester', acylHalide: 'acylHalide', carbamoyl: 'amide', cyano: 'nitrile' };

/**
 * Groups whose suffix includes a carbon atom: inside a chain that carbon is a chain atom (-oic
 * acid, -oate, -oyl halide, -amide, -nitrile, -al); on a ring it hangs outside (-carboxylic acid,
 * -carboxylate, -carbonyl halide, -carboxamide, -carbonitrile, -carbaldehyde), P-65, P-66.
 */
export function suffixIncludesCarbon(kind: SuffixKind): boolean {
  return kind !== 'one' && kind !== 'ol' && kind !== 'amine';
}

/**
 * One occurrence of the principal characteristic group. `anchors` are the carbons that can carry
 * it on a parent: the COOH or CHO carbon itself for acids and aldehydes, the carbon bearing =O
 * for ketones (P-64.2) and -OH for alcohols and phenols (P-63.1), and every carbon on an amine
 * nitrogen (P-62.2.1.1: the parent is chosen among them, the others become N-prefixes).
 * `atoms` are the heteroatoms.
 */
export interface PrincipalGroup {
  kind: SuffixKind;
  anchors: number[];
  atoms: number[];
}

/** An oxo group on a carbon with at most one carbon neighbour is an aldehyde (or formaldehyde). */
export function isAldehydeCarbon(graph: MolGraph, c: number): boolean {
  const carbons = graph.adjacency[c].filter((e) => graph.atoms[e.atom].element === 'C').length;
  return carbons <= 1 && graph.atoms[c].hydrogens >= 1 && isCarbonyl(graph, c);
}

/**
 * The principal characteristic group (P-41 seniority of classes: acids > esters > acid halides >
 * amides > nitriles > aldehydes > ketones > alcohols > amines) and every occurrence of it; an empty list when the molecule has none of them.
 */
export function findPrincipalGroups(graph: MolGraph, groups: Map<number, PrefixGroup>): PrincipalGroup[] {
  const found: PrincipalGroup[] = [];
  for (const group of groups.values()) {
    const carbonKind = CARBON_GROUPS[group.kind];
    if (carbonKind) {
      found.push({ kind: carbonKind, anchors: [group.atom], atoms: group.atoms.filter((a) => a !== group.atom) });
      continue;
    }
    if (group.kind === 'amino') {
      found.push({ kind: 'amine', anchors: graph.adjacency[group.atom].map((e) => e.atom), atoms: [group.atom] });
      continue;
    }
    if (group.kind !== 'hydroxy' && group.kind !== 'oxo') continue;
    const carbon = graph.adjacency[group.atom][0].atom;
    const kind: SuffixKind = group.kind === 'hydroxy' ? 'ol' : isAldehydeCarbon(graph, carbon) ? 'al' : 'one';
    found.push({ kind, anchors: [carbon], atoms: [group.atom] });
  }
  for (const kind of SENIORITY) {
    const chosen = found.filter((g) => g.kind === kind);
    if (chosen.length) return chosen;
  }
  return [];
}
