import { describe, expect, it } from 'vitest';
import { describeSync, type NameStyle } from '../../../../shared/chem/index';
import { disagreementWithRdkit } from './rdkit-agreement';

/** The engine's name for a SMILES, or a thrown error with the refusal reason. */
export function nameOf(smiles: string, style: NameStyle = 'preferred'): string {
  const { naming } = describeSync({ smiles }, { style });
  if (!naming.ok) throw new Error(`${smiles}: ${naming.reason}`);
  return naming.name;
}

/** Table of worked examples: [SMILES, expected name, rule cited]; each also checked against RDKit's formula and masses. */
export function namesExamples(title: string, rows: [string, string, string][], style: NameStyle = 'preferred'): void {
  describe(title, () => {
    it.each(rows)('%s → %s (%s)', async (smiles, expected) => {
      expect(nameOf(smiles, style)).toBe(expected);
      expect(await disagreementWithRdkit(smiles)).toEqual([]);
    });
  });
}

/** Table of structures that must be refused whole, with a pattern the reason must match. */
export function refusesExamples(title: string, rows: [string, RegExp][], style: NameStyle = 'preferred'): void {
  describe(title, () => {
    it.each(rows)('%s is refused', (smiles, reason) => {
      const { naming } = describeSync({ smiles }, { style });
      expect(naming.ok, smiles).toBe(false);
      if (!naming.ok) expect(naming.reason).toMatch(reason);
    });
  });
}
