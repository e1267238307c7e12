import { describe, expect, it } from 'vitest';
import {
  classifyStructureText,
  structureFromFile,
  StructureTextProblem,
} from '../../../src/features/page-editor/structure/structureText';

// A V2000 molfile for ethanol, written by hand following the published CTfile Formats
// specification of the MDL molfile (counts line and atom/bond blocks); the first header line is
// blank, as is common.
const ethanolMolfile = [
  '',
  '  hand-written',
  '',
  '  3  2  0  0  0  0  0  0  0  0999 V2000',
  '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '    0.8660    0.5000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '    1.7321    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0',
  '  1  2  1  0  0  0  0',
  '  2  3  1  0  0  0  0',
  'M  END',
].join('\n');

describe('classifyStructureText', () => {
  it('reads one SMILES, dropping a title after white space as .smi lines carry one', () => {
    expect(classifyStructureText('  CCO ethanol \n')).toEqual({ smiles: 'CCO' });
  });

  it('keeps a molfile whole, including its blank first header line', () => {
    const found = classifyStructureText(ethanolMolfile);
    expect(found).toEqual({ molfile: `${ethanolMolfile}\n` });
  });

  it('takes the first record of an SD file ($$$$ separates records)', () => {
    const sd = `${ethanolMolfile}\n> <NAME>\nethanol\n\n$$$$\n${ethanolMolfile.replace('hand-written', 'second')}\nM  END\n$$$$\n`;
    const found = classifyStructureText(sd);
    expect('molfile' in found && found.molfile).toBe(`${ethanolMolfile}\n`);
  });

  it('normalises Windows line ends', () => {
    const found = classifyStructureText(ethanolMolfile.replace(/\n/g, '\r\n'));
    expect(found).toEqual({ molfile: `${ethanolMolfile}\n` });
  });

  it('refuses empty text, several SMILES lines, and a molfile cut short', () => {
    expect(() => classifyStructureText('  \n ')).toThrow(/SMILES string or a molfile/);
    expect(() => classifyStructureText('CCO\nCCC')).toThrow(/several lines but not a molfile/);
    expect(() => classifyStructureText(ethanolMolfile.replace('M  END', ''))).toThrow(/no "M {2}END" line/);
    expect(() => classifyStructureText('C'.repeat(200_001))).toThrow(StructureTextProblem);
  });
});

describe('structureFromFile', () => {
  it('reads .mol files by content and .smi files by their first line', () => {
    expect(structureFromFile('ethanol.MOL', ethanolMolfile)).toEqual({ molfile: `${ethanolMolfile}\n` });
    expect(structureFromFile('list.smi', '\nCC(C)CCO isoamyl alcohol\nCCO\n')).toEqual({ smiles: 'CC(C)CCO' });
  });

  it('refuses other files and a .mol file without a molfile in it', () => {
    expect(() => structureFromFile('spectrum.jdx', '##TITLE=x')).toThrow(/not a structure file/);
    expect(() => structureFromFile('odd.mol', 'CCO')).toThrow(/does not hold a molfile/);
  });
});
