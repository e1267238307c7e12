import type { StoredSpectrum } from '../../db/schema';
import type { SpectrumData } from '../../../shared/schemas/attachments';
import { parseDelimited } from './delimited';
import { SpectrumParseError } from './errors';
import { parseJcampDx } from './jcamp';
import { previewOf } from './preview';

export type SpectrumCandidate = 'jcamp-dx' | 'csv' | 'tsv';

/** Points sorted by rising x, whatever order the file used; the display decides the direction. */
function ascending(spectrum: SpectrumData): SpectrumData {
  const { x, y } = spectrum.data;
  if (x.every((v, i) => i === 0 || x[i - 1] <= v)) return spectrum;
  const order = x.map((_, i) => i).sort((a, b) => x[a] - x[b]);
  return { ...spectrum, data: { x: order.map((i) => x[i]), y: order.map((i) => y[i]) } };
}

export type SpectrumReading = { spectrum: StoredSpectrum | null; parseError: string | null };

/**
 * Reads a file that may be a spectrum. Never throws for bad content: a spectrum that cannot be
 * read comes back as a parse error so the file is still kept as a plain attachment.
 */
export function readSpectrum(text: string, candidate: SpectrumCandidate): SpectrumReading {
  try {
    const parsed = candidate === 'jcamp-dx' ? parseJcampDx(text) : parseDelimited(text, candidate);
    if (!parsed) return { spectrum: null, parseError: null };
    const spectrum = ascending(parsed);
    return { spectrum: { ...spectrum, preview: previewOf(spectrum.data) }, parseError: null };
  } catch (error) {
    // Whatever the parser trips over is about the file's content, never a reason to lose the file.
    const reason = error instanceof SpectrumParseError ? error.message : `The file could not be read as a spectrum: ${(error as Error).message}`;
    return { spectrum: null, parseError: reason };
  }
}
