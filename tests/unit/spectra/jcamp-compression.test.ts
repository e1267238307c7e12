import { describe, expect, it } from 'vitest';
import { readSpectrum } from '../../../server/files/spectrum';

/*
 * JCAMP-DX compression forms: R. S. McDonald and P. A. Wilks, "JCAMP-DX: A Standard Form for
 * Exchange of Infrared Spectra in Computer Readable Form", Applied Spectroscopy 42 (1988) 151–162.
 * The paper writes the same run of ordinates in each ASCII Squeezed Difference Form (ASDF) to show
 * that they all decode to the same numbers. The ordinates and encodings below were written from
 * memory following the paper's rules, not copied from its table; every encoding was derived by hand
 * from its character sets:
 *   PAC    — the sign (+ or -) separates values, no spaces needed
 *   SQZ    — the sign and first digit become one letter: @=0, A–I = +1…+9, a–i = −1…−9
 *   DIF    — each value after the first is the difference from the one before: %=0, J–R = +1…+9,
 *            j–r = −1…−9 (first digit; further digits follow plainly)
 *   DUP    — S–Z = repeat count 1…8 and s = 9, applied to the preceding value (here to differences)
 * Each line starts with its abscissa in plain AFFN (the X++(Y..Y) table form); in the DIF forms the
 * first ordinate of a continuation line repeats the last ordinate of the line before (Y check).
 */

const ORDINATES = [1000, 1020, 1020, 1020, 1015, 990, 990, -5, -5, -5, -5, 12];
const FIRST_X = 4000;
const DELTA_X = -2;

const FORMS: Record<string, string[]> = {
  AFFN: ['4000 1000 1020 1020 1020 1015 990 990 -5 -5 -5 -5 12'],
  PAC: ['4000+1000+1020+1020+1020+1015+990+990-5-5-5-5+12'],
  SQZ: ['4000A000A020A020A020A015I90I90eeeeA2'],
  DIF: ['4000A000K0%%nk5%r95%%%J7', '3978A2'],
  DIFDUP: ['4000A000K0%Tnk5%r95%UJ7', '3978A2'],
  'DIFDUP over two lines with the Y check': ['4000A000K0%Tnk5', '3990I90%r95%UJ7', '3978A2'],
};

/** An infrared file as an instrument would write it; YFACTOR scales the integers to absorbance. */
function jcampFile(lines: string[]): string {
  return [
    '##TITLE= Compression forms check',
    '##JCAMP-DX= 4.24',
    '##DATA TYPE= INFRARED SPECTRUM',
    '##XUNITS= 1/CM',
    '##YUNITS= ABSORBANCE',
    '##XFACTOR= 1',
    '##YFACTOR= 0.001',
    `##FIRSTX= ${FIRST_X}`,
    `##LASTX= ${FIRST_X + DELTA_X * (ORDINATES.length - 1)}`,
    `##DELTAX= ${DELTA_X}`,
    `##NPOINTS= ${ORDINATES.length}`,
    '##FIRSTY= 1.000',
    '##XYDATA= (X++(Y..Y))',
    ...lines,
    '##END=',
    '',
  ].join('\n');
}

describe('JCAMP-DX compression forms (McDonald & Wilks 1988)', () => {
  for (const [form, lines] of Object.entries(FORMS)) {
    it(`${form} decodes to the same ordinates and abscissae`, () => {
      const { spectrum, parseError } = readSpectrum(jcampFile(lines), 'jcamp-dx');
      expect(parseError).toBeNull();
      // Stored with rising x; the axis direction is a display matter (reverseX).
      const expected = ORDINATES.map((y, i) => ({ x: FIRST_X + DELTA_X * i, y: y * 0.001 })).reverse();
      expect(spectrum!.data.x).toEqual(expected.map((p) => p.x));
      spectrum!.data.y.forEach((y, i) => expect(y).toBeCloseTo(expected[i].y, 12));
    });
  }

  it('takes the axis titles and units from ##XUNITS and ##YUNITS and runs wavenumbers high to low', () => {
    const { spectrum } = readSpectrum(jcampFile(FORMS.AFFN), 'jcamp-dx');
    expect(spectrum).toMatchObject({
      format: 'jcamp-dx',
      title: 'Compression forms check',
      dataType: 'INFRARED SPECTRUM',
      x: { title: 'Wavenumber', unit: 'cm⁻¹', raw: '1/CM' },
      y: { title: 'Absorbance', raw: 'ABSORBANCE' },
      reverseX: true,
      points: 12,
    });
    expect(spectrum!.preview.x).toEqual(spectrum!.data.x);
  });
});

describe('NMR files', () => {
  // JCAMP-DX NMR (Davies & Lancashire, Pure Appl. Chem. 65 (1993) 1645 — written from memory):
  // ##.OBSERVE FREQUENCY is in MHz, so a shift in Hz divided by it is the shift in ppm.
  const nmr = [
    '##TITLE= Proton test',
    '##JCAMP-DX= 5.01',
    '##DATA TYPE= NMR SPECTRUM',
    '##.OBSERVE FREQUENCY= 400.0',
    '##.OBSERVE NUCLEUS= ^1H',
    '##XUNITS= HZ',
    '##YUNITS= ARBITRARY UNITS',
    '##XFACTOR= 1',
    '##YFACTOR= 1',
    '##FIRSTX= 3200',
    '##LASTX= 0',
    '##NPOINTS= 5',
    '##XYDATA= (X++(Y..Y))',
    '3200 0 10 400 10 0',
    '##END=',
  ].join('\n');

  it('converts a Hz axis to chemical shift in ppm and runs it high to low', () => {
    const { spectrum, parseError } = readSpectrum(nmr, 'jcamp-dx');
    expect(parseError).toBeNull();
    expect(spectrum!.data.x.map((x) => Number(x.toFixed(6)))).toEqual([0, 2, 4, 6, 8]);
    expect(spectrum).toMatchObject({ x: { title: 'Chemical shift', unit: 'ppm' }, reverseX: true, observeFrequencyMHz: 400, nucleus: '1H' });
  });
});
