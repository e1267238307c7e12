import { sql } from 'drizzle-orm';
import { Router } from 'express';
import type { AppDeps } from '../context';
import { storageHealthy } from '../storage/s3';

export function healthRoutes(deps: AppDeps): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const database = await deps.db
      .execute(sql`select 1`)
      .then(() => 'ok' as const)
      .catch(() => 'unavailable' as const);
    const storage = (await storageHealthy(deps.storage)) ? 'ok' : 'unavailable';
    const mail = (await deps.mailer.healthy()) ? 'ok' : 'unavailable';
    const healthy = database === 'ok' && storage === 'ok' && mail === 'ok';
    res.status(healthy ? 200 : 503).json({ status: healthy ? 'ok' : 'degraded', database, storage, mail });
  });
  return router;
}
