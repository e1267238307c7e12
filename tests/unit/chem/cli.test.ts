import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { alkaneIsomerSmiles } from './support/alkanes';

function runCli(input: string, args: string[] = []): { stdout: string; status: number | null } {
  const result = spawnSync('npx', ['tsx', 'scripts/name.ts', ...args], { input, encoding: 'utf8', cwd: process.cwd(), timeout: 120_000 });
  return { stdout: result.stdout, status: result.status };
}

describe('npm run -s name (scripts/name.ts)', () => {
  it('writes exactly one line per input line, errors included, and keeps going', () => {
    const lines = ['CC(C)C', '', 'C(C', 'CC[Fe]', 'C'.repeat(1200), 'CC(=O)OC(C)=O', 'ClC(Cl)Cl', 'CC(C)CC1CCCCC1'];
    const { stdout, status } = runCli(lines.join('\n') + '\n');
    expect(status).toBe(0);
    // Names (IUPAC 2013, written from memory): 2-methylpropane P-21.2 (substituent on the longest
    // chain); trichloromethane P-61.3 (halogen prefixes); (2-methylpropyl)cyclohexane P-44.1.2.2
    // (a ring is senior to a chain). The error lines are this engine's own wording (no source).
    expect(stdout.split('\n').slice(0, -1)).toEqual([
      '2-methylpropane',
      'error: the SMILES is empty',
      "error: SMILES: '(' at position 2 is never closed",
      'error: element Fe at position 3 is not supported (accepted: H, B, C, N, O, P, S, F, Cl, Br, I)',
      'error: the molecule has 1200 non-hydrogen atoms; at most 999 are accepted',
      expect.stringMatching(/^error: /),
      'trichloromethane',
      '(2-methylpropyl)cyclohexane',
    ]);
  });

  it('switches to traditional names with --style traditional', () => {
    const { stdout } = runCli('CC(C)CC1CCCCC1\nCC(C)(C)CC\n', ['--style', 'traditional']);
    // 'isobutyl' is a traditional prefix kept for general nomenclature (IUPAC 2013 P-29.6, written
    // from memory); 2,2-dimethylbutane has no traditional alternative and stays systematic.
    expect(stdout).toBe('isobutylcyclohexane\n2,2-dimethylbutane\n');
  });

  it('handles thousands of lines in one process', () => {
    const smiles = alkaneIsomerSmiles(13).flat();
    const { stdout, status } = runCli(smiles.join('\n'));
    expect(status).toBe(0);
    const out = stdout.split('\n').slice(0, -1);
    // One answer per input line is the tool's own contract, no outside source.
    expect(out.length).toBe(smiles.length);
    expect(out.filter((l) => l.startsWith('error'))).toEqual([]);
  });
});
