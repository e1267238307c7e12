/**
 * Telling what a chemist pasted or dropped apart, before any chemistry runs: one SMILES string or
 * one MDL molfile (V2000/V3000; the first record of an SD file). Pure, so it is unit-tested.
 */
import { MAX_STRUCTURE_TEXT } from '../../../../shared/schemas/chem';

export type StructureText = { smiles: string } | { molfile: string };

export class StructureTextProblem extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'StructureTextProblem';
  }
}

const MOLFILE_END = /^M {2}END\s*$/m;
const CTAB_VERSION = /\b(V2000|V3000)\b/;

export function looksLikeMolfile(text: string): boolean {
  return CTAB_VERSION.test(text) || MOLFILE_END.test(text);
}

export function classifyStructureText(raw: string): StructureText {
  if (raw.length > MAX_STRUCTURE_TEXT) throw new StructureTextProblem('That text is too long for one structure.');
  const text = raw.replace(/\r\n?/g, '\n');
  if (text.trim() === '') throw new StructureTextProblem('Paste a SMILES string or a molfile first.');
  if (looksLikeMolfile(text)) return { molfile: firstMolfileRecord(text) };
  const lines = text.split('\n').map((line) => line.trim()).filter(Boolean);
  if (lines.length > 1) {
    throw new StructureTextProblem('That is several lines but not a molfile: paste one SMILES on one line, or a whole molfile.');
  }
  // A SMILES line may carry a title after white space ("CCO ethanol"), as in .smi files.
  const [smiles] = lines[0].split(/\s+/);
  return { smiles };
}

/** An SD file holds records separated by `$$$$`; a block holds one structure, so take the first. */
function firstMolfileRecord(text: string): string {
  const end = text.search(MOLFILE_END);
  if (end < 0) throw new StructureTextProblem('This molfile has no "M  END" line; it looks cut short.');
  const endLine = text.indexOf('\n', end);
  // The three header lines may be blank (the first one often is), so the start is kept as it is.
  return (endLine < 0 ? text : text.slice(0, endLine)) + '\n';
}

export const STRUCTURE_FILE_TYPES = ['.mol', '.sdf', '.sd', '.smi'] as const;

export function isStructureFileName(name: string): boolean {
  const lower = name.toLowerCase();
  return STRUCTURE_FILE_TYPES.some((ending) => lower.endsWith(ending));
}

/** Reads a dropped or chosen file: molfile/SD files by content, .smi files by their first line. */
export function structureFromFile(name: string, text: string): StructureText {
  if (!isStructureFileName(name)) {
    throw new StructureTextProblem(`"${name}" is not a structure file. Use a .mol, .sdf or .smi file.`);
  }
  if (name.toLowerCase().endsWith('.smi')) {
    const firstLine = text.replace(/\r\n?/g, '\n').split('\n').find((line) => line.trim() !== '') ?? '';
    return classifyStructureText(firstLine);
  }
  const found = classifyStructureText(text);
  if (!('molfile' in found)) throw new StructureTextProblem(`"${name}" does not hold a molfile.`);
  return found;
}
