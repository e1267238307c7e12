import type { MolGraph } from '../graph/types';
import type { RingSystems } from '../graph/rings';
import type { StereoUnit } from './configurations';
import { StereoRefusal } from './refusal';

/**
 * Refuses what the engine cannot decide with certainty before any ranking starts:
 * - mancude rings with heteroatoms or charges, whose duplicate atoms need averaged atomic numbers
 *   (P-92.1.4.4); all-carbon aromatic rings are exact with Kekulé duplicates (every duplicate is C);
 * - tetrahedral marks on atoms without four ligands (allenes' axial marks, sulfoxides, phosphines);
 * - double bonds that are part of a cumulene (axial chirality, P-93.5.7).
 */
export function checkSupported(graph: MolGraph, rings: RingSystems, units: StereoUnit[]): void {
  for (const bond of graph.bonds) {
    // Ring systems are the connected pieces of ring bonds, so a bond is in a ring when both ends share one.
    const system = rings.systemOf[bond.from];
    if (system < 0 || system !== rings.systemOf[bond.to]) continue;
    for (const end of [bond.from, bond.to]) {
      const atom = graph.atoms[end];
      if (atom.charge !== 0) throw new StereoRefusal('charged ring atoms (mancude ring duplicates) are not handled');
      if (bond.order === 2 && atom.element !== 'C') {
        throw new StereoRefusal('rings with a double bond to a heteroatom (mancude heterocycles) are not handled');
      }
    }
  }
  for (const unit of units) {
    if (unit.kind === 'tetrahedral') {
      const expected = graph.adjacency[unit.atom].length + graph.atoms[unit.atom].hydrogens;
      if (unit.mark.neighbours.length !== 4 || expected !== 4) {
        throw new StereoRefusal(`stereo mark at atom ${unit.atom + 1} is not a tetrahedral centre with four ligands (allene, sulfoxide or similar); not handled`);
      }
      if (graph.adjacency[unit.atom].some(({ bond }) => graph.bonds[bond].order > 1)) {
        throw new StereoRefusal(`stereo centre at atom ${unit.atom + 1} carries a multiple bond; not handled`);
      }
    } else {
      for (const end of [unit.bond.from, unit.bond.to]) {
        if (graph.adjacency[end].some(({ bond }) => bond !== unit.bond.index && graph.bonds[bond].order > 1)) {
          throw new StereoRefusal(`double bond ${unit.bond.from + 1}=${unit.bond.to + 1} is cumulated (allene/cumulene); not handled`);
        }
      }
    }
  }
}
