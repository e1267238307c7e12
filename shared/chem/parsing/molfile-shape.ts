import { ChemInputError } from './errors';
import { MAX_HEAVY_ATOMS } from './limits';

/**
 * openchemlib reads almost anything as a molfile (garbage gives an empty molecule), so the
 * counts line is checked first: V2000 (MDL CTfile format, counts line on line 4) or V3000
 * ("M  V30 COUNTS"). Gives the chemist the line that is wrong.
 */
export function checkMolfileShape(text: string): void {
  const lines = text.split(/\r?\n/);
  if (lines.length < 4) throw new ChemInputError('unparsable', 'molfile: fewer than 4 lines; the counts line (line 4) is missing');
  const counts = lines[3];
  let atomCount: number;
  if (/V3000/.test(counts)) {
    const v3 = lines.find((line) => /^M {2}V30 COUNTS/.test(line));
    if (!v3) throw new ChemInputError('unparsable', 'molfile: V3000 file without an "M  V30 COUNTS" line');
    atomCount = Number(v3.trim().split(/\s+/)[3]);
  } else {
    if (!/V2000/.test(counts)) throw new ChemInputError('unparsable', `molfile: line 4 is not a V2000 or V3000 counts line: "${counts.trim()}"`);
    atomCount = Number(counts.slice(0, 3));
    const bondCount = Number(counts.slice(3, 6));
    if (!Number.isInteger(atomCount) || !Number.isInteger(bondCount)) {
      throw new ChemInputError('unparsable', `molfile: cannot read the atom and bond counts on line 4: "${counts.trim()}"`);
    }
    if (lines.length < 4 + atomCount + bondCount) {
      throw new ChemInputError('unparsable', `molfile: the counts line announces ${atomCount} atoms and ${bondCount} bonds but the file ends early`);
    }
  }
  if (!Number.isInteger(atomCount)) throw new ChemInputError('unparsable', 'molfile: cannot read the atom count');
  if (atomCount === 0) throw new ChemInputError('empty', 'molfile: the molecule has no atoms');
  // Hydrogens may be explicit in molfiles; the exact heavy-atom limit is applied after parsing.
  if (atomCount > MAX_HEAVY_ATOMS * 5) throw new ChemInputError('too_large', `molfile: ${atomCount} atoms is too large`);
}
