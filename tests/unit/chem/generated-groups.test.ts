import { beforeAll, describe, expect, it } from 'vitest';
import { describeSync, loadChemistry, type NameStyle } from '../../../shared/chem/index';
import { functionalisedSmiles } from './support/functional';
import { canonicalSmiles } from './support/rdkit';
import { disagreementWithRdkit } from './support/rdkit-agreement';

/**
 * A generated mixed set of functionalised molecules (support/functional.ts). Names are not
 * predicted; instead the engine is held to facts that do not depend on it:
 *  - the same structure written in another atom order (RDKit's canonical SMILES, an independent
 *    library) gets the same name, or the same refusal;
 *  - distinct structures (by RDKit's canonical SMILES) never share a name;
 *  - formula and masses agree with RDKit;
 *  - preferred names use no general-only names (acetone, anisole, isopropyl, vinyl, xylene…, P-12).
 */
const set = functionalisedSmiles(2000);
const canonical = new Map<string, string>();

beforeAll(async () => {
  await loadChemistry();
  for (const smiles of set) canonical.set(smiles, await canonicalSmiles(smiles));
});

function naming(smiles: string, style: NameStyle) {
  return describeSync({ smiles }, { style }).naming;
}

describe(`generated functionalised molecules (${set.length})`, () => {
  it.each(['preferred', 'traditional'] as NameStyle[])('%s: the same name from another atom order, and no name for two structures', (style) => {
    const byName = new Map<string, string>();
    const refusals = new Map<string, number>();
    for (const smiles of set) {
      const ours = naming(smiles, style);
      const reordered = naming(canonical.get(smiles)!, style);
      expect(reordered.ok, `${smiles} vs ${canonical.get(smiles)}`).toBe(ours.ok);
      if (!ours.ok) {
        const reason = ours.reason.replace(/\d+/g, '#');
        refusals.set(reason, (refusals.get(reason) ?? 0) + 1);
        continue;
      }
      if (reordered.ok) expect(reordered.name, `${smiles} vs ${canonical.get(smiles)}`).toBe(ours.name);
      const owner = byName.get(ours.name);
      if (owner !== undefined) expect(owner, `${ours.name}: ${smiles}`).toBe(canonical.get(smiles));
      byName.set(ours.name, canonical.get(smiles)!);
    }
    const named = set.length - [...refusals.values()].reduce((a, b) => a + b, 0);
    console.log(`${style}: ${named} of ${set.length} named; refusals:\n${[...refusals].sort((a, b) => b[1] - a[1]).map(([r, n]) => `  ${n} ${r}`).join('\n')}`);
    expect(named / set.length).toBeGreaterThan(0.75);
  });

  it('preferred names contain no general-only names', () => {
    const generalOnly = /\b(acetone|anisole|xylene|mesitylene|cumene|styrene)\b|isopropyl|isobutyl|sec-butyl|vinyl|allyl|isopentyl|neopentyl|isopropoxy/;
    for (const smiles of set) {
      const ours = naming(smiles, 'preferred');
      if (ours.ok) expect(ours.name).not.toMatch(generalOnly);
    }
  });

  it('formula and masses agree with RDKit on every molecule', async () => {
    for (const smiles of set) expect(await disagreementWithRdkit(smiles), smiles).toEqual([]);
  });
});
