import { convert } from 'jcampconverter';
import type { SpectrumData } from '../../../shared/schemas/attachments';
import { axisFromUnits, runsHighToLow } from './axes';
import { SpectrumParseError } from './errors';

/**
 * Characters allowed in JCAMP-DX tabular data (McDonald & Wilks, Appl. Spectrosc. 42 (1988) 151;
 * JCAMP-DX 4.24): AFFN digits, signs, decimal point, exponent and separators; SQZ @ A–I a–i;
 * DIF % J–R j–r; DUP S–Z s; ? for a missing value. The converter skips anything else silently,
 * which would turn a damaged file into a wrong curve, so we refuse such files first.
 */
const ASDF_LINE = /^[0-9\s.,;+\-?@A-Za-s%]*$/;
const TABLE_START = /^##\s*(XYDATA|XYPOINTS|PEAK\s*TABLE|DATA\s*TABLE)\s*=/i;

function checkTableCharacters(text: string): void {
  const lines = text.split(/\r?\n/);
  let inTable = false;
  for (const [index, line] of lines.entries()) {
    if (line.startsWith('##')) {
      inTable = TABLE_START.test(line);
      continue;
    }
    if (!inTable) continue;
    const data = line.replace(/\$\$.*$/, '');
    if (!ASDF_LINE.test(data)) {
      const bad = [...data].find((c) => !ASDF_LINE.test(c));
      throw new SpectrumParseError(`Line ${index + 1}: the character "${bad}" is not allowed in JCAMP-DX data`);
    }
  }
}

function infoText(info: Record<string, unknown>, key: string): string {
  const value = info[key];
  return value === undefined || value === null ? '' : String(value).trim();
}

export function parseJcampDx(text: string): SpectrumData {
  if (!/^\s*##\s*TITLE\s*=/im.test(text)) throw new SpectrumParseError('Not a JCAMP-DX file: it does not start with ##TITLE=');
  if (!text.split(/\r?\n/).some((line) => TABLE_START.test(line))) {
    throw new SpectrumParseError('The JCAMP-DX file holds no data table (##XYDATA, ##XYPOINTS or ##PEAK TABLE)');
  }
  checkTableCharacters(text);

  let result: ReturnType<typeof convert>;
  try {
    result = convert(text, { keepRecordsRegExp: /.*/ });
  } catch (error) {
    throw new SpectrumParseError(`The JCAMP-DX file could not be read: ${(error as Error).message}`);
  }
  const block = result.flatten.find((entry) => (entry.spectra?.[0]?.data?.x?.length ?? 0) > 0);
  if (!block) throw new SpectrumParseError('The JCAMP-DX file holds no readable spectrum');
  if (block.twoD) throw new SpectrumParseError('Two-dimensional spectra are kept as files but not plotted');
  const spectrum = block.spectra[0];
  const { x, y } = spectrum.data as { x: number[]; y: number[] };

  if (x.length < 2 || x.length !== y.length) throw new SpectrumParseError('The spectrum has fewer than two points');
  const firstBad = x.findIndex((v, i) => !Number.isFinite(v) || !Number.isFinite(y[i]));
  if (firstBad >= 0) throw new SpectrumParseError(`Point ${firstBad + 1} is not a number`);
  const declared = Number(spectrum.nbPoints);
  if (Number.isFinite(declared) && declared > 0 && declared !== x.length) {
    throw new SpectrumParseError(`##NPOINTS says ${declared} points but the data hold ${x.length}; the file looks damaged`);
  }

  const info = (block.info ?? {}) as Record<string, unknown>;
  const dataType = String(block.dataType ?? infoText(info, 'DATATYPE')).trim();
  const xAxis = axisFromUnits(String(spectrum.xUnits ?? ''), 'x');
  const yAxis = axisFromUnits(String(spectrum.yUnits ?? ''), 'Intensity');
  const observeFrequencyMHz = Number(spectrum.observeFrequency ?? info['.OBSERVEFREQUENCY']);
  const nucleus = infoText(info, '.OBSERVENUCLEUS').replace(/^\^/, '');
  return {
    format: 'jcamp-dx',
    title: String(block.title ?? '').trim(),
    dataType,
    x: xAxis,
    y: yAxis,
    reverseX: runsHighToLow(xAxis, dataType),
    points: x.length,
    ...(Number.isFinite(observeFrequencyMHz) ? { observeFrequencyMHz } : {}),
    ...(nucleus ? { nucleus } : {}),
    data: { x: Array.from(x), y: Array.from(y) },
  };
}
