import type { Atom, MolGraph } from '../graph/types';
import { NamingRefusal } from './refusal';

const VALENCE: Record<string, number> = { C: 4 };

/** Refusals that do not depend on the parent: several components, ions, radicals, isotopes, odd valences. */
export function checkScope(graph: MolGraph): void {
  if (graph.atoms.length === 0) throw new NamingRefusal('the structure has no atoms');
  if (!graph.atoms.some((a) => a.element === 'C')) throw new NamingRefusal('compounds without carbon are not named (inorganic nomenclature)');
  if (componentCount(graph) > 1) throw new NamingRefusal('the structure has several disconnected parts (salts and mixtures are not named yet)');
  for (const atom of graph.atoms) {
    if (atom.isotope !== null) throw new NamingRefusal(`isotope label at ${where(atom)}: isotopically modified compounds (P-8) are not named yet`);
    if (atom.radicalElectrons > 0) throw new NamingRefusal(`unpaired electrons at ${where(atom)}: radicals are not named yet`);
    if (atom.element === 'C') {
      if (atom.charge !== 0) throw new NamingRefusal(`charged carbon at ${where(atom)}: ions are not named yet`);
      let bonds = 0;
      for (const e of graph.adjacency[atom.index]) bonds += graph.bonds[e.bond].order;
      if (bonds + atom.hydrogens !== VALENCE.C) throw new NamingRefusal(`${where(atom)} has ${bonds + atom.hydrogens} bonds; only tetravalent carbon is named`);
    }
  }
}

function where(atom: Atom): string {
  return `atom ${atom.index + 1} (${atom.element})`;
}

function componentCount(graph: MolGraph): number {
  const seen = new Uint8Array(graph.atoms.length);
  let count = 0;
  for (let start = 0; start < graph.atoms.length; start++) {
    if (seen[start]) continue;
    count += 1;
    const stack = [start];
    seen[start] = 1;
    while (stack.length) for (const { atom } of graph.adjacency[stack.pop()!]) if (!seen[atom]) (seen[atom] = 1), stack.push(atom);
  }
  return count;
}
