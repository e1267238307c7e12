import type { SpectrumAxis, SpectrumData } from '../../../shared/schemas/attachments';
import { axisFromUnits, runsHighToLow } from './axes';
import { SpectrumParseError } from './errors';

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** "Wavenumber (cm-1)" or "shift [ppm]" → the unit in brackets describes the axis. */
function axisFromHeader(header: string | undefined, fallbackTitle: string): SpectrumAxis {
  if (!header) return { title: fallbackTitle, unit: '', raw: '' };
  const match = header.match(/^(.*?)\s*[([]([^)\]]+)[)\]]\s*$/);
  const name = (match ? match[1] : header).trim();
  const unit = match ? match[2].trim() : '';
  const fromUnit = unit ? axisFromUnits(unit, name) : axisFromUnits(name, name);
  return { title: name || fromUnit.title, unit: fromUnit.raw === name ? '' : fromUnit.unit, raw: header.trim() };
}

function splitRow(line: string, delimiter: string): string[] {
  return line.split(delimiter).map((field) => field.trim().replace(/^"(.*)"$/, '$1'));
}

/**
 * Two-column spectra exported as CSV or TSV (x, y per row, an optional header row naming the
 * columns). A table with another shape is an ordinary data file, not a spectrum: null. A table
 * that starts as two numeric columns and then breaks is a damaged spectrum: an error.
 */
export function parseDelimited(text: string, format: 'csv' | 'tsv'): SpectrumData | null {
  const lines = text.split(/\r?\n/).map((line, index) => ({ line: line.trim(), number: index + 1 }));
  const rows = lines.filter(({ line }) => line && !line.startsWith('#'));
  if (rows.length < 2) return null;
  const delimiter = format === 'tsv' ? '\t' : rows.slice(0, 5).every(({ line }) => line.includes(';')) ? ';' : ',';

  const first = splitRow(rows[0].line, delimiter);
  const hasHeader = first.length === 2 && first.every((field) => !NUMBER.test(field));
  const body = hasHeader ? rows.slice(1) : rows;
  const opening = body[0] ? splitRow(body[0].line, delimiter) : [];
  if (opening.length !== 2 || !opening.every((field) => NUMBER.test(field))) return null;

  const x: number[] = [];
  const y: number[] = [];
  for (const { line, number } of body) {
    const fields = splitRow(line, delimiter);
    if (fields.length !== 2 || !fields.every((field) => NUMBER.test(field))) {
      throw new SpectrumParseError(`Line ${number} is not a pair of numbers: "${line.slice(0, 60)}"`);
    }
    x.push(Number(fields[0]));
    y.push(Number(fields[1]));
  }
  if (x.length < 2) throw new SpectrumParseError('The spectrum has fewer than two points');

  const xAxis = axisFromHeader(hasHeader ? first[0] : undefined, 'x');
  const yAxis = axisFromHeader(hasHeader ? first[1] : undefined, 'Intensity');
  return {
    format,
    title: '',
    dataType: '',
    x: xAxis,
    y: yAxis,
    reverseX: runsHighToLow(xAxis, ''),
    points: x.length,
    data: { x, y },
  };
}
