import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiClient } from '../support/api';
import { signedIn } from '../support/api';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';
import { uploadFiles } from '../support/uploads';

// Spectra uploaded through the real app: parsed on arrival, kept as files whatever happens.

let server: TestServer;
let chemist: ApiClient;
let pageId: string;

beforeAll(async () => {
  server = await startServer();
  chemist = await signedIn(server.url, 'chemist@saltmarsh.test');
  const notebooks = await chemist.get('/api/notebooks');
  const notebookId = notebooks.body.find((n: { title: string }) => n.title === 'Solvent and reagent checks').id;
  pageId = await newPage(chemist, notebookId, 'Spectra upload checks');
});

afterAll(async () => {
  await server?.close();
});

// An infrared file written here in DIFDUP form (McDonald & Wilks, Appl. Spectrosc. 42 (1988) 151;
// encoding derived by hand, written from memory of the rules): ordinates 90 90 90 85 40 85 90.
const irFile = [
  '##TITLE= Test ester film',
  '##JCAMP-DX= 4.24',
  '##DATA TYPE= INFRARED SPECTRUM',
  '##XUNITS= 1/CM',
  '##YUNITS= TRANSMITTANCE',
  '##XFACTOR= 1',
  '##YFACTOR= 0.01',
  '##FIRSTX= 1760',
  '##LASTX= 1730',
  '##DELTAX= -5',
  '##NPOINTS= 7',
  '##XYDATA= (X++(Y..Y))',
  '1760I0%Tnm5M5N',
  '1730I0',
  '##END=',
  '',
].join('\n');

describe('spectrum files', () => {
  it('parses a JCAMP-DX upload: the list carries a preview, the spectrum endpoint the full data with units', async () => {
    const uploaded = await uploadFiles(chemist, pageId, [{ name: 'ester film.jdx', content: Buffer.from(irFile) }]);
    expect(uploaded.status).toBe(201);
    const [meta] = uploaded.body;
    expect(meta).toMatchObject({
      mediaType: 'chemical/x-jcamp-dx',
      parseError: null,
      spectrum: { format: 'jcamp-dx', title: 'Test ester film', x: { title: 'Wavenumber', unit: 'cm⁻¹' }, y: { title: 'Transmittance' }, reverseX: true, points: 7 },
    });
    expect(meta.spectrum.preview.x).toHaveLength(7);
    expect(meta.spectrum.data).toBeUndefined();

    const spectrum = await chemist.get(`/api/attachments/${meta.id}/spectrum`);
    expect(spectrum.status).toBe(200);
    expect(spectrum.body.data.x).toEqual([1730, 1735, 1740, 1745, 1750, 1755, 1760]);
    expect(spectrum.body.data.y.map((y: number) => Number(y.toFixed(2)))).toEqual([0.9, 0.85, 0.4, 0.85, 0.9, 0.9, 0.9]);
  });

  it('keeps a spectrum that does not parse as a plain file with its parse error, bytes intact', async () => {
    const damaged = irFile.replace('1730I0', '1730I0\n1725 ??? zz');
    const uploaded = await uploadFiles(chemist, pageId, [{ name: 'damaged.jdx', content: Buffer.from(damaged) }]);
    expect(uploaded.status).toBe(201);
    const [meta] = uploaded.body;
    expect(meta.spectrum).toBeNull();
    expect(meta.parseError).toMatch(/Line 15: the character "z" is not allowed in JCAMP-DX data/);

    const spectrum = await chemist.get(`/api/attachments/${meta.id}/spectrum`);
    expect(spectrum.status).toBe(404);
    expect(spectrum.body.error).toMatchObject({ code: 'not_a_spectrum', message: expect.stringContaining('not allowed') });
    const content = await fetch(`${server.url}/api/attachments/${meta.id}/content`, { headers: { cookie: chemist.sessionCookie } });
    expect(await content.text()).toBe(damaged);
  });

  it('parses a two-column CSV export and leaves other tables alone', async () => {
    const uploaded = await uploadFiles(chemist, pageId, [
      { name: 'shift.csv', content: Buffer.from('Chemical shift (ppm),Intensity\n0.9,10\n1.5,4\n2.0,30\n4.1,20\n') },
      { name: 'reagents.csv', content: Buffer.from('name,g,mmol\nacid,1,2\nalcohol,3,4\n') },
    ]);
    expect(uploaded.status).toBe(201);
    expect(uploaded.body[0]).toMatchObject({ mediaType: 'text/csv', spectrum: { x: { title: 'Chemical shift', unit: 'ppm' }, reverseX: true } });
    expect(uploaded.body[1]).toMatchObject({ mediaType: 'text/csv', spectrum: null, parseError: null });
  });
});
