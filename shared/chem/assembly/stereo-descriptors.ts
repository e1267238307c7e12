import type { MolGraph } from '../graph/types';
import { assignStereo, type StereoAssignment } from '../stereo/index';
import type { Evaluated } from '../numbering/evaluate';
import { NamingRefusal } from './refusal';

export interface PlacedDescriptors {
  /** e.g. "(2R,3S)-", or "" when the input specifies no configuration. */
  prefix: string;
  /** Descriptors in locant order, for choosing between otherwise equal numberings. */
  ranked: string[];
}

/** True when the input carries stereo marks (and so needs descriptors or a refusal). */
export function hasStereoMarks(graph: MolGraph): boolean {
  return Boolean(graph.stereoNotes?.length) || graph.atoms.some((a) => a.tetrahedral) || graph.bonds.some((b) => b.doubleBondStereo);
}

/** CIP descriptors of the whole structure; they do not depend on the parent, so are assigned once. */
export function stereoDescriptors(graph: MolGraph): StereoAssignment {
  const stereo = assignStereo(graph);
  if (stereo.refusal) throw new NamingRefusal(stereo.refusal);
  return stereo;
}

/**
 * CIP descriptors from the stereo module (`stereoDescriptors`), placed per P-91.3/P-93.5: each with the locant of its
 * centre or of its double bond on the parent, in ascending locant order, in parentheses before
 * the complete name: (2R,3S)-…, (2E)-…. Where the parent's own locants are not cited (ethene,
 * methane), the descriptor goes without a locant: (E)-1,2-dichloroethene. Descriptors of atoms
 * inside substituent groups need the substituent's own placement and are refused for now.
 */
export function placeDescriptors(stereo: StereoAssignment, parent: Evaluated): PlacedDescriptors {
  const locantOf = new Map(parent.skeleton.atoms.map((atom, i) => [atom, i + 1]));
  const entries: { locant: number; label: string }[] = [];
  for (const centre of stereo.centres) {
    const locant = locantOf.get(centre.atom);
    if (locant === undefined) throw new NamingRefusal(`the stereo centre at atom ${centre.atom + 1} lies in a substituent group; descriptors there are not placed yet`);
    entries.push({ locant, label: centre.label });
  }
  const size = parent.skeleton.atoms.length;
  for (const bond of stereo.doubleBonds) {
    const a = locantOf.get(bond.from);
    const b = locantOf.get(bond.to);
    const adjacent = a !== undefined && b !== undefined && (Math.abs(a - b) === 1 || (parent.skeleton.kind !== 'chain' && Math.abs(a - b) === size - 1));
    if (!adjacent) throw new NamingRefusal(`the stereogenic double bond between atoms ${bond.from + 1} and ${bond.to + 1} is not in the parent chain or ring; its descriptor is not placed yet`);
    entries.push({ locant: Math.abs(a! - b!) === 1 ? Math.min(a!, b!) : Math.max(a!, b!), label: bond.label });
  }
  if (entries.length === 0) return { prefix: '', ranked: [] };
  entries.sort((x, y) => x.locant - y.locant);
  const citeLocants = size > 2;
  const text = entries.map((e) => (citeLocants ? `${e.locant}${e.label}` : e.label)).join(',');
  return { prefix: `(${text})-`, ranked: entries.map((e) => e.label) };
}

/**
 * P-31.1.4.3.4 (last criterion): when numberings still tie, lower locants go to Z before E and
 * to R before S (r before s). Compares descriptor sequences in locant order.
 */
export function compareDescriptorSequences(a: string[], b: string[]): number {
  const rank = (label: string) => ({ Z: 0, E: 1, R: 0, S: 1, r: 0, s: 1 })[label] ?? 2;
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (rank(a[i]) !== rank(b[i])) return rank(a[i]) - rank(b[i]);
  return 0;
}
