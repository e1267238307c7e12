import { describe, expect, it } from 'vitest';
import { readSpectrum } from '../../../server/files/spectrum';

const header = (npoints: number) =>
  ['##TITLE= damaged', '##JCAMP-DX= 4.24', '##XUNITS= 1/CM', '##YUNITS= TRANSMITTANCE', '##XFACTOR= 1', '##YFACTOR= 1',
    '##FIRSTX= 1', '##LASTX= 10', `##NPOINTS= ${npoints}`, '##XYDATA= (X++(Y..Y))'].join('\n');

describe('spectra that do not parse', () => {
  // Characters outside the ASDF sets (McDonald & Wilks 1988, written from memory): t–z are no code.
  it('reports a character that is no JCAMP-DX code instead of plotting a wrong curve', () => {
    const result = readSpectrum(`${header(10)}\n1 zz qq\n##END=\n`, 'jcamp-dx');
    expect(result.spectrum).toBeNull();
    expect(result.parseError).toMatch(/character "z" is not allowed/);
  });

  // McDonald & Wilks 1988 (written from memory): ##NPOINTS gives the number of points in the table,
  // a file begins with ##TITLE= and its data table follows a label such as ##XYDATA=.
  it('reports a file cut short (fewer points than ##NPOINTS declares)', () => {
    const result = readSpectrum(`${header(10)}\n1 5 6 7\n##END=\n`, 'jcamp-dx');
    expect(result.parseError).toMatch(/##NPOINTS says 10 points but the data hold 3/);
  });

  it('reports a file with labels but no data table', () => {
    const result = readSpectrum('##TITLE= only a title\n##JCAMP-DX= 4.24\n##END=\n', 'jcamp-dx');
    expect(result.parseError).toMatch(/no data table/);
  });

  it('reports a file named like a spectrum that is not JCAMP-DX at all', () => {
    expect(readSpectrum('just some notes', 'jcamp-dx').parseError).toMatch(/Not a JCAMP-DX file/);
  });
});

// Comma-separated fields per RFC 4180; a two-column x,y table with an optional header naming the
// axes and units in brackets is common practice for exported spectra, no source.
describe('two-column CSV and TSV spectra', () => {
  it('reads a CSV with a header naming axes and units in brackets', () => {
    const csv = 'Wavenumber (cm-1),Transmittance (%)\n4000,98.5\n3000,97.0\n1740,12.5\n1000,80\n';
    const { spectrum, parseError } = readSpectrum(csv, 'csv');
    expect(parseError).toBeNull();
    expect(spectrum).toMatchObject({ format: 'csv', x: { title: 'Wavenumber', unit: 'cm⁻¹' }, y: { title: 'Transmittance', unit: '%' }, reverseX: true, points: 4 });
    expect(spectrum!.data).toEqual({ x: [1000, 1740, 3000, 4000], y: [80, 12.5, 97, 98.5] });
  });

  it('reads a TSV without a header, in scientific notation', () => {
    const { spectrum } = readSpectrum('1.0e2\t3.5E-1\n2.0e2\t4\n', 'tsv');
    expect(spectrum).toMatchObject({ format: 'tsv', x: { title: 'x' }, reverseX: false, data: { x: [100, 200], y: [0.35, 4] } });
  });

  it('treats a table of another shape as an ordinary file, not as a broken spectrum', () => {
    const table = 'reagent,mass / g,amount / mmol\nisoamyl alcohol,8.82,100\nacetic acid,12.0,200\n';
    expect(readSpectrum(table, 'csv')).toEqual({ spectrum: null, parseError: null });
  });

  it('reports a two-column spectrum that breaks part way', () => {
    const result = readSpectrum('x,y\n1,2\n2,3\n3,oops\n', 'csv');
    expect(result.parseError).toBe('Line 4 is not a pair of numbers: "3,oops"');
  });
});
