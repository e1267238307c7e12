/**
 * Writes a spectrum sampled at equal x steps as JCAMP-DX 4.24 (McDonald & Wilks, Appl. Spectrosc.
 * 42 (1988) 151) in the plain AFFN X++(Y..Y) table: each line starts with its abscissa, then ten
 * integer ordinates that ##YFACTOR scales back.
 */
export interface EvenlySampledSpectrum {
  title: string;
  dataType: string;
  xUnits: string;
  yUnits: string;
  firstX: number;
  deltaX: number;
  y: number[];
  yFactor: number;
  /** Further labelled records, e.g. { ORIGIN: '...', OWNER: '...' }. */
  records?: Record<string, string>;
}

const VALUES_PER_LINE = 10;

export function writeJcampDx(spectrum: EvenlySampledSpectrum): string {
  const { y, firstX, deltaX, yFactor } = spectrum;
  const ordinates = y.map((v) => Math.round(v / yFactor));
  const lines = [
    `##TITLE= ${spectrum.title}`,
    '##JCAMP-DX= 4.24',
    `##DATA TYPE= ${spectrum.dataType}`,
    ...Object.entries(spectrum.records ?? {}).map(([label, value]) => `##${label}= ${value}`),
    `##XUNITS= ${spectrum.xUnits}`,
    `##YUNITS= ${spectrum.yUnits}`,
    '##XFACTOR= 1',
    `##YFACTOR= ${yFactor}`,
    `##FIRSTX= ${firstX}`,
    `##LASTX= ${firstX + deltaX * (y.length - 1)}`,
    `##DELTAX= ${deltaX}`,
    `##NPOINTS= ${y.length}`,
    `##FIRSTY= ${ordinates[0] * yFactor}`,
    '##XYDATA= (X++(Y..Y))',
  ];
  for (let i = 0; i < ordinates.length; i += VALUES_PER_LINE) {
    lines.push(`${firstX + deltaX * i} ${ordinates.slice(i, i + VALUES_PER_LINE).join(' ')}`);
  }
  lines.push('##END=', '');
  return lines.join('\n');
}
