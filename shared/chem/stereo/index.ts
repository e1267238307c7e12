/**
 * CIP stereodescriptors (IUPAC 2013 Recommendations, P-92/P-93) for the stereo marks of a MolGraph.
 *
 * Interface agreed with the naming engine. Beyond the first agreement, centre labels may be the
 * lowercase 'r'/'s' of pseudo-asymmetric centres (P-93.5.1.3; Rule 4c/5), which a name must keep
 * lowercase. When `refusal` is set, `centres` and `doubleBonds` are empty: the structure must not
 * be named with partial stereodescriptors.
 */
import type { MolGraph } from '../graph/types';
import { findRingSystems, type RingSystems } from '../graph/rings';
import { bondInRing, focusAtoms, labelDoubleBond, labelTetrahedral, type StereoUnit } from './configurations';
import { Digraph, type Descriptor, type Node } from './digraph';
import { ALL_RULES, CONSTITUTIONAL, Ranker } from './rules';
import { StereoRefusal } from './refusal';
import { checkSupported } from './scope';

export interface StereoAssignment {
  centres: { atom: number; label: 'R' | 'S' | 'r' | 's' }[];
  doubleBonds: { from: number; to: number; label: 'E' | 'Z' }[];
  refusal?: string;
}

export function assignStereo(graph: MolGraph): StereoAssignment {
  try {
    return assign(graph);
  } catch (error) {
    if (error instanceof StereoRefusal) return { centres: [], doubleBonds: [], refusal: error.message };
    throw error;
  }
}

function findUnits(graph: MolGraph, rings: RingSystems): StereoUnit[] {
  const units: StereoUnit[] = [];
  for (const atom of graph.atoms) {
    if (atom.tetrahedral) units.push({ kind: 'tetrahedral', atom: atom.index, mark: atom.tetrahedral, inRing: rings.systemOf[atom.index] >= 0 });
  }
  for (const bond of graph.bonds) {
    // A double bond in a ring of fewer than eight atoms can only be cis: no descriptor (common
    // practice, no source; matches P-93.5.1.4.1 cycloalkenes named without E/Z below C8).
    if (bond.doubleBondStereo && bond.order === 2 && !bondInRing(graph, bond.index, 7)) {
      units.push({ kind: 'doubleBond', bond, mark: bond.doubleBondStereo });
    }
  }
  return units;
}

function assign(graph: MolGraph): StereoAssignment {
  // The parser notes stereo it could not carry into the graph (axial marks, odd centres).
  if (graph.stereoNotes?.length) throw new StereoRefusal(`stereo feature not handled: ${graph.stereoNotes[0]}`);
  const rings = findRingSystems(graph);
  const units = findUnits(graph, rings);
  const result: StereoAssignment = { centres: [], doubleBonds: [] };
  if (units.length === 0) return result;
  checkSupported(graph, rings, units);
  for (const unit of units) {
    if (unit.kind === 'tetrahedral') {
      const label = labelUnit(graph, units, unit, unit.atom);
      if (label === 'R' || label === 'S' || label === 'r' || label === 's') result.centres.push({ atom: unit.atom, label });
      else if (label !== 'none') throw new StereoRefusal(`unexpected descriptor ${label} at atom ${unit.atom + 1}`);
    } else {
      // The hierarchical digraph of a double bond may be rooted at either end; where the two roots
      // disagree the 2013 rules leave the choice open, so we refuse instead of picking one.
      const a = labelUnit(graph, units, unit, unit.bond.from);
      const b = labelUnit(graph, units, unit, unit.bond.to);
      if (a !== b) throw new StereoRefusal(`double bond ${unit.bond.from + 1}=${unit.bond.to + 1} ranks differently from its two ends`);
      if (a === 'seqCis' || a === 'seqTrans') {
        throw new StereoRefusal(`double bond ${unit.bond.from + 1}=${unit.bond.to + 1} is pseudo-asymmetric (seqCis/seqTrans); not handled`);
      }
      if (a === 'E' || a === 'Z') result.doubleBonds.push({ from: unit.bond.from, to: unit.bond.to, label: a });
    }
  }
  return result;
}

function labelOnce(dg: Digraph, ranker: Ranker, unit: StereoUnit, node: Node): Descriptor {
  return unit.kind === 'tetrahedral' ? labelTetrahedral(dg, ranker, node, unit) : labelDoubleBond(dg, ranker, node, unit);
}

/** Labels one unit: constitutional rules first; if they leave ties, auxiliary descriptors and Rules 3–5. */
function labelUnit(graph: MolGraph, units: StereoUnit[], unit: StereoUnit, rootAtom: number): Descriptor {
  const dg = new Digraph(graph, rootAtom);
  const first = labelOnce(dg, new Ranker(dg, CONSTITUTIONAL), unit, dg.origin);
  if (first !== 'none') return first;
  if (units.length === 1) return 'none';
  const all = new Ranker(dg, ALL_RULES);
  assignAuxiliary(dg, all, units, unit);
  dg.setRoot(dg.origin);
  return labelOnce(dg, all, unit, dg.origin);
}

/**
 * Auxiliary descriptors (P-92.1.4.3 / P-92.5): every other marked unit met in the digraph gets a
 * descriptor from its own branches, farthest from the root first; descriptors of one sphere are
 * published together so nodes of a sphere never see each other's.
 */
function assignAuxiliary(dg: Digraph, ranker: Ranker, units: StereoUnit[], centre: StereoUnit): void {
  const pending: { node: Node; unit: StereoUnit }[] = [];
  const nodes = dg.all();
  for (const unit of units) {
    if (unit === centre) continue;
    const [f1, f2] = focusAtoms(unit);
    for (const node of nodes) {
      if (node.kind !== 'atom' || node.atom !== f1) continue;
      let low = node;
      if (f2 !== undefined) {
        const partner = dg.neighbours(node).find((n) => n.kind === 'atom' && n.atom === f2);
        if (partner && partner.dist < node.dist) low = partner;
      }
      pending.push({ node: low, unit });
    }
  }
  pending.sort((a, b) => b.node.dist - a.node.dist);
  let batch = new Map<Node, Descriptor>();
  let sphere = Infinity;
  for (const { node, unit } of pending) {
    if (node.dist < sphere) {
      dg.setAux(batch);
      batch = new Map();
      sphere = node.dist;
    }
    batch.set(node, labelOnce(dg, ranker, unit, node));
  }
  dg.setAux(batch);
}
