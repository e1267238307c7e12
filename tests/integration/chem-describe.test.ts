import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, signedIn } from '../support/api';
import { startServer, type TestServer } from '../support/server';

let server: TestServer;
let chemist: ApiClient;
beforeAll(async () => {
  server = await startServer();
  chemist = await signedIn(server.url, 'chemist@saltmarsh.test');
});
afterAll(() => server.close());

describe('POST /api/chem/describe', () => {
  it('names a structure and gives its formula and masses', async () => {
    // 2-methylbutane, C5H12: IUPAC 2013 P-21.2.2 (longest chain, lowest locants; written from memory).
    // Masses: CIAAW 2021 standard atomic weights, C 12.011, H 1.008 → 72.151; monoisotopic
    // 5 × 12 + 12 × 1.00782503 = 72.0939 (AME 2020 isotopic masses).
    const response = await chemist.post('/api/chem/describe', { smiles: 'CC(C)CC' });
    expect(response.status).toBe(200);
    expect(response.body.name).toBe('2-methylbutane');
    expect(response.body.formula).toBe('C5H12');
    expect(response.body.averageMass).toBeCloseTo(72.151, 2);
    expect(response.body.monoisotopicMass).toBeCloseTo(72.0939, 3);
    expect(response.body.explanation.parent.atoms).toHaveLength(4);
  });

  it('accepts a molfile and the traditional style', async () => {
    // isopropyl: a general (non-preferred) substituent name kept by IUPAC 2013 P-29.6 (written from memory).
    const molfile = [
      '',
      '  hand-written',
      '',
      '  3  2  0  0  0  0  0  0  0  0999 V2000',
      '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    2.5981    0.0000    0.0000 Cl  0  0  0  0  0  0  0  0  0  0  0  0',
      '  1  2  1  0',
      '  2  3  1  0',
      'M  END',
    ].join('\n');
    const response = await chemist.post('/api/chem/describe', { molfile });
    expect(response.status).toBe(200);
    expect(response.body.name).toBe('chloroethane');
    expect(response.body.formula).toBe('C2H5Cl');
  });

  it('refuses unparsable SMILES with 422 and says why', async () => {
    const response = await chemist.post('/api/chem/describe', { smiles: 'C1CC(' });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/SMILES/);
  });

  it('refuses a name it cannot give but still reports formula and masses', async () => {
    // Naphthalene: fused rings are outside the engine's scope, so no name — never a guess.
    // C10H8, 128.174 g/mol from CIAAW 2021 standard atomic weights (C 12.011, H 1.008).
    const response = await chemist.post('/api/chem/describe', { smiles: 'c1ccc2ccccc2c1' });
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('not_named');
    expect(response.body.error.message.length).toBeGreaterThan(10);
    expect(response.body.error.details.formula).toBe('C10H8');
    expect(response.body.error.details.averageMass).toBeCloseTo(128.174, 2);
  });

  it('validates the request body and needs a session', async () => {
    expect((await chemist.post('/api/chem/describe', { smiles: 42 })).status).toBe(400);
    expect((await chemist.post('/api/chem/describe', { smiles: 'C', molfile: 'x' })).status).toBe(400);
    expect((await chemist.post('/api/chem/describe', { smiles: 'C', style: 'fancy' })).status).toBe(400);
    const anonymous = new ApiClient(server.url);
    expect((await anonymous.post('/api/chem/describe', { smiles: 'C' })).status).toBe(401);
  });
});
