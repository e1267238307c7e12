import { Router, type Response } from 'express';
import { auditCsv } from '../audit/csv';
import { verifyChain } from '../audit/chain';
import { notebookTrail, pageTrail } from '../audit/trail';
import { notebookAccess, pageAccess } from '../auth/access';
import { currentUser } from '../auth/middleware';
import type { AppDeps } from '../context';
import { idParam } from '../http/params';
import type { AuditEventView } from '../../shared/schemas/signing';

function sendCsv(res: Response, name: string, events: AuditEventView[]) {
  res.type('text/csv; charset=utf-8').attachment(`${name}.csv`).send(auditCsv(events));
}

/**
 * The audit trail per page and per notebook, with the whole chain re-verified on each read
 * (21 CFR 11.10(e): secure, computer-generated, time-stamped audit trails, available for review
 * and copying). Every member of the notebook may read it; nobody can change it.
 */
export function auditRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get('/pages/:id/audit', async (req, res) => {
    const access = await pageAccess(db, currentUser(res), idParam(req, 'id', 'Page'));
    const [events, chain] = await Promise.all([pageTrail(db, access.page.id), verifyChain(db)]);
    res.json({ events, chain });
  });

  router.get('/pages/:id/audit.csv', async (req, res) => {
    const access = await pageAccess(db, currentUser(res), idParam(req, 'id', 'Page'));
    sendCsv(res, `page-${String(access.page.number).padStart(3, '0')}-audit-trail`, await pageTrail(db, access.page.id));
  });

  router.get('/notebooks/:id/audit', async (req, res) => {
    const access = await notebookAccess(db, currentUser(res), idParam(req, 'id', 'Notebook'));
    const [events, chain] = await Promise.all([notebookTrail(db, access.notebookId), verifyChain(db)]);
    res.json({ events, chain });
  });

  router.get('/notebooks/:id/audit.csv', async (req, res) => {
    const access = await notebookAccess(db, currentUser(res), idParam(req, 'id', 'Notebook'));
    sendCsv(res, 'notebook-audit-trail', await notebookTrail(db, access.notebookId));
  });

  return router;
}
