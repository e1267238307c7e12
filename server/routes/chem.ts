import { Router } from 'express';
import { ChemInputError, describeSync, loadChemistry } from '../../shared/chem';
import { describeRequestSchema } from '../../shared/schemas/chem';
import { currentUser } from '../auth/middleware';
import { HttpError, parseInput } from '../http/errors';

/** POST /api/chem/describe: the naming engine behind the HTTP contract of DESIGN.md. */
export function chemRoutes(): Router {
  const router = Router();
  // openchemlib's first use takes about a second: warm it when the server starts.
  const ready = loadChemistry();

  router.post('/chem/describe', async (req, res) => {
    currentUser(res);
    const input = parseInput(describeRequestSchema, req.body);
    await ready;
    const structure = 'smiles' in input ? { smiles: input.smiles } : { molfile: input.molfile };
    let description;
    try {
      description = describeSync(structure, { style: input.style ?? 'preferred' });
    } catch (error) {
      if (error instanceof ChemInputError) throw new HttpError(422, error.code, error.message);
      throw error;
    }
    const { naming, ...facts } = description;
    if (!naming.ok) {
      throw new HttpError(422, 'not_named', naming.reason, { details: facts });
    }
    res.json({ name: naming.name, ...facts, explanation: naming.explanation });
  });
  return router;
}
