import { eq } from 'drizzle-orm';
import { Router, type Request } from 'express';
import type { User } from 'lucia';
import { addendumSchema, countersignSchema, returnSchema, signPageSchema } from '../../shared/schemas/signing';
import { pageAccess } from '../auth/access';
import { currentUser, requireRole } from '../auth/middleware';
import type { AppDeps } from '../context';
import { addenda } from '../db/schema';
import { notFound, parseInput } from '../http/errors';
import { idParam } from '../http/params';
import { signingHub } from '../signing/hub';
import { signingThrottle } from '../signing/identity';
import { recordPdf } from '../signing/pdf';
import { printRecord } from '../signing/print';
import { verifyPage } from '../signing/verify';
import { countersigners, countersignQueue, pageRecord } from '../signing/views';
import { addAddendum, countersign, returnWork, signPage } from '../signing/workflow';

/**
 * Signing, countersigning, returns, addenda, verification and the printable record
 * (21 CFR Part 11 subpart C: electronic signatures; the sections are cited where applied).
 */
export function signingRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();
  const throttle = signingThrottle(deps);
  const hub = () => signingHub(deps);

  const accessToPage = (req: Request, user: User) => pageAccess(db, user, idParam(req, 'id', 'Page'));

  /** An addendum and the caller's access to its page (non-members get 404 for both). */
  async function accessToAddendum(req: Request, user: User) {
    const [addendum] = await db.select().from(addenda).where(eq(addenda.id, idParam(req, 'id', 'Addendum')));
    if (!addendum) throw notFound('Addendum');
    const access = await pageAccess(db, user, addendum.pageId).catch(() => {
      throw notFound('Addendum');
    });
    return { addendum, access };
  }

  router.get('/pages/:id/record', async (req, res) => {
    const user = currentUser(res);
    res.json(await pageRecord(db, user, await accessToPage(req, user)));
  });

  router.get('/pages/:id/countersigners', async (req, res) => {
    const user = currentUser(res);
    const access = await accessToPage(req, user);
    res.json(await countersigners(db, access.notebookId, user.id));
  });

  router.post('/pages/:id/sign', throttle, async (req, res) => {
    const user = currentUser(res);
    const access = await accessToPage(req, user);
    const input = parseInput(signPageSchema, req.body);
    await signPage(deps, hub(), user, access, input);
    res.status(201).json(await pageRecord(db, user, await accessToPage(req, user)));
  });

  router.post('/pages/:id/countersign', throttle, async (req, res) => {
    const user = currentUser(res);
    const access = await accessToPage(req, user);
    const input = parseInput(countersignSchema, req.body);
    await countersign(deps, hub(), user, access, input, null);
    res.status(201).json(await pageRecord(db, user, await accessToPage(req, user)));
  });

  router.post('/pages/:id/return', async (req, res) => {
    const user = currentUser(res);
    const access = await accessToPage(req, user);
    const input = parseInput(returnSchema, req.body);
    await returnWork(deps, hub(), user, access, input, null);
    res.json(await pageRecord(db, user, await accessToPage(req, user)));
  });

  router.post('/pages/:id/addenda', throttle, async (req, res) => {
    const user = currentUser(res);
    const access = await accessToPage(req, user);
    const input = parseInput(addendumSchema, req.body);
    await addAddendum(deps, user, access, input);
    res.status(201).json(await pageRecord(db, user, access));
  });

  router.post('/addenda/:id/countersign', throttle, async (req, res) => {
    const user = currentUser(res);
    const { addendum, access } = await accessToAddendum(req, user);
    const input = parseInput(countersignSchema, req.body);
    await countersign(deps, hub(), user, access, input, addendum);
    res.status(201).json(await pageRecord(db, user, access));
  });

  router.post('/addenda/:id/return', async (req, res) => {
    const user = currentUser(res);
    const { addendum, access } = await accessToAddendum(req, user);
    const input = parseInput(returnSchema, req.body);
    await returnWork(deps, hub(), user, access, input, addendum);
    res.json(await pageRecord(db, user, access));
  });

  router.get('/signing/queue', requireRole('supervisor'), async (_req, res) => {
    res.json(await countersignQueue(db, currentUser(res).id));
  });

  router.get('/pages/:id/verify', async (req, res) => {
    const access = await accessToPage(req, currentUser(res));
    res.json(await verifyPage(db, access.page));
  });

  router.get('/pages/:id/print', async (req, res) => {
    const user = currentUser(res);
    res.json(await printRecord(db, user, await accessToPage(req, user)));
  });

  router.get('/pages/:id/record.pdf', async (req, res) => {
    const user = currentUser(res);
    const record = await printRecord(db, user, await accessToPage(req, user));
    const pdf = await recordPdf(record);
    const file = `notebook-page-${String(record.pageNumber).padStart(3, '0')}-record.pdf`;
    res.type('application/pdf').attachment(file).send(pdf);
  });

  return router;
}
