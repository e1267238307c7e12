/**
 * `npm run -s name [-- --style traditional]`: reads SMILES, one per line, from standard input and
 * writes exactly one line per input line: the name, or "error: <reason>".
 */
import { createInterface } from 'node:readline';
import { ChemInputError, describeSync, loadChemistry, type NameStyle } from '../shared/chem/index';

function parseStyle(argv: string[]): NameStyle {
  const i = argv.indexOf('--style');
  const value = i >= 0 ? argv[i + 1] : argv.find((a) => a.startsWith('--style='))?.slice('--style='.length);
  if (value === undefined) return 'preferred';
  if (value === 'preferred' || value === 'traditional') return value;
  process.stderr.write(`unknown style "${value}" (use preferred or traditional)\n`);
  process.exit(2);
}

function nameLine(line: string, style: NameStyle): string {
  try {
    const { naming } = describeSync({ smiles: line }, { style });
    return naming.ok ? naming.name : `error: ${naming.reason}`;
  } catch (error) {
    if (error instanceof ChemInputError) return `error: ${error.message}`;
    return `error: internal problem while naming (${(error as Error).message})`;
  }
}

async function main(): Promise<void> {
  const style = parseStyle(process.argv.slice(2));
  await loadChemistry();
  const lines = createInterface({ input: process.stdin, crlfDelay: Infinity });
  const out: string[] = [];
  for await (const line of lines) {
    out.push(nameLine(line, style));
    if (out.length >= 256) process.stdout.write(out.splice(0).join('\n') + '\n');
  }
  if (out.length) process.stdout.write(out.join('\n') + '\n');
}

void main();
