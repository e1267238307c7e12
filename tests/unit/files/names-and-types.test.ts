import { describe, expect, it } from 'vitest';
import { displayNameFor } from '../../../server/files/displayName';
import { detectMediaType, JCAMP_MEDIA_TYPE } from '../../../server/files/mediaType';

describe('display names', () => {
  it('keeps only the last path part and drops control and bidirectional characters', () => {
    expect(displayNameFor('C:\\Users\\x\\spectra\\ir.jdx')).toBe('ir.jdx');
    expect(displayNameFor('../../etc/passwd')).toBe('passwd');
    // U+202E (right-to-left override, Unicode Standard Annex #9) would make "fdp.exe" read "exe.pdf".
    expect(displayNameFor('report\u202Efdp.exe')).toBe('reportfdp.exe');
    expect(displayNameFor('a\u0000b\u0007c.txt')).toBe('abc.txt');
  });

  it('replaces characters reserved in file systems and headers, and never returns an empty name', () => {
    expect(displayNameFor('yield: 87% <final>?.csv')).toBe('yield_ 87% _final__.csv');
    expect(displayNameFor('...')).toBe('file');
    expect(displayNameFor('')).toBe('file');
  });

  it('shortens very long names but keeps the extension', () => {
    const name = displayNameFor(`${'x'.repeat(400)}.jdx`);
    expect(name.length).toBe(180);
    expect(name.endsWith('.jdx')).toBe(true);
  });

  it('keeps non-Latin letters, normalised to NFC', () => {
    expect(displayNameFor('Ester-Spektrum Mu\u0308ller.jdx')).toBe('Ester-Spektrum Müller.jdx');
  });
});

describe('media types from content', () => {
  it('recognises binary formats by their signatures whatever the name says', async () => {
    // The "%PDF-" file header (ISO 32000-1, 7.5.2).
    expect((await detectMediaType(Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj\n'), 'spectrum.jdx')).mediaType).toBe('application/pdf');
  });

  it('sniffs JCAMP-DX text by its labels and delimited text by consistent columns', async () => {
    expect(await detectMediaType(Buffer.from('##TITLE= x\n##JCAMP-DX= 4.24\n'), 'noname')).toEqual({ mediaType: JCAMP_MEDIA_TYPE, spectrum: 'jcamp-dx' });
    expect(await detectMediaType(Buffer.from('1\t2\n3\t4\n'), 'data.txt')).toEqual({ mediaType: 'text/tab-separated-values', spectrum: 'tsv' });
    expect(await detectMediaType(Buffer.from('a,b\n1,2\n'), 'data.txt')).toEqual({ mediaType: 'text/csv', spectrum: 'csv' });
    expect(await detectMediaType(Buffer.from('Dear group,\nthe rotavap is free.\n'), 'note')).toEqual({ mediaType: 'text/plain', spectrum: null });
  });

  it('still treats a damaged .jdx as a spectrum candidate, so its parse error is reported', async () => {
    expect(await detectMediaType(Buffer.from('garbled'), 'ir.jdx')).toEqual({ mediaType: 'text/plain', spectrum: 'jcamp-dx' });
  });
});
