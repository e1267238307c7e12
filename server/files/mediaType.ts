import { fileTypeFromBuffer } from 'file-type';
import type { SpectrumCandidate } from './spectrum';

export const JCAMP_MEDIA_TYPE = 'chemical/x-jcamp-dx';
/** How much of the start of a file the detection looks at. */
export const SNIFF_BYTES = 64 * 1024;

const JCAMP_EXTENSIONS = /\.(jdx|dx|jcamp|jcm)$/i;

export interface Detection {
  mediaType: string;
  /** Set when the content (or, for JCAMP-DX, the name) says the file should be a spectrum. */
  spectrum: SpectrumCandidate | null;
}

/** Cheap early guess from the first bytes, so binary files are never held in memory for parsing. */
export function couldBeSpectrum(start: Buffer, fileName: string): boolean {
  return JCAMP_EXTENSIONS.test(fileName) || !start.subarray(0, 4096).includes(0);
}

function looksLikeText(head: Buffer): boolean {
  if (head.includes(0)) return false;
  // A multi-byte character may be cut at the end of the sample; judge the rest.
  const sample = head.subarray(0, Math.max(0, head.length - 4));
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(sample);
    return true;
  } catch {
    // Latin-1 exports from older instruments are text too, as long as control characters are rare.
    let controls = 0;
    for (const byte of sample) if (byte < 9 || (byte > 13 && byte < 32)) controls++;
    return controls < sample.length / 100;
  }
}

function delimitedKind(text: string): 'csv' | 'tsv' | null {
  const lines = text
    .split(/\r?\n/)
    .slice(0, 30)
    .filter((line) => line.trim() && !line.startsWith('#'));
  if (lines.length < 2) return null;
  const consistent = (separator: string) => {
    const counts = lines.map((line) => line.split(separator).length - 1);
    return counts[0] > 0 && counts.every((c) => c === counts[0]);
  };
  if (consistent('\t')) return 'tsv';
  if (consistent(',') || consistent(';')) return 'csv';
  return null;
}

/**
 * The media type comes from the bytes, not from the browser's claim or the extension: binary
 * formats by their signatures (file-type), text by sniffing for JCAMP-DX labels and delimited
 * columns. Only JCAMP-DX also trusts its extension, so that a damaged .jdx is still reported as
 * a spectrum that failed to parse rather than silently becoming a text file.
 */
export async function detectMediaType(head: Buffer, fileName: string): Promise<Detection> {
  const binary = await fileTypeFromBuffer(head);
  if (binary) return { mediaType: binary.mime, spectrum: null };
  if (!looksLikeText(head)) {
    return { mediaType: 'application/octet-stream', spectrum: JCAMP_EXTENSIONS.test(fileName) ? 'jcamp-dx' : null };
  }
  const text = head.toString('latin1');
  if (/^\s*##\s*TITLE\s*=/.test(text) || /^##\s*JCAMP-?DX\s*=/im.test(text)) return { mediaType: JCAMP_MEDIA_TYPE, spectrum: 'jcamp-dx' };
  if (JCAMP_EXTENSIONS.test(fileName)) return { mediaType: 'text/plain', spectrum: 'jcamp-dx' };
  const kind = delimitedKind(text);
  if (kind === 'tsv') return { mediaType: 'text/tab-separated-values', spectrum: 'tsv' };
  if (kind === 'csv') return { mediaType: 'text/csv', spectrum: 'csv' };
  return { mediaType: 'text/plain', spectrum: null };
}
