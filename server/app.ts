import express from 'express';
import fs from 'node:fs';
import path from 'node:path';
import helmet from 'helmet';
import { sessionMiddleware } from './auth/middleware';
import type { AppDeps } from './context';
import { errorHandler, HttpError } from './http/errors';
import { originCheck } from './http/originCheck';
import { authRoutes } from './routes/auth';
import { healthRoutes } from './routes/health';
import { notebookRoutes } from './routes/notebooks';
import { pageRoutes } from './routes/pages';
import { peopleRoutes } from './routes/people';
import { signingRoutes } from './routes/signing';
import { auditRoutes } from './routes/audit';
import { attachmentRoutes } from './routes/attachments';
import { historyRoutes } from './routes/history';
import { chemRoutes } from './routes/chem';

/** The HTTP application without a listening socket, so tests can run it on any port. */
export function createApp(deps: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // openchemlib's drawing editor and depictions use inline styles and data/blob images.
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'connect-src': ["'self'", 'ws:', 'wss:'],
          'worker-src': ["'self'", 'blob:'],
          'upgrade-insecure-requests': deps.config.publicUrl.startsWith('https:') ? [] : null,
        },
      },
      strictTransportSecurity: deps.config.publicUrl.startsWith('https:'),
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: deps.config.JSON_BODY_LIMIT }));
  api.use(originCheck(deps.config.PUBLIC_URL));
  api.use(sessionMiddleware(deps.auth));
  api.use(healthRoutes(deps));
  api.use(authRoutes(deps));
  api.use(peopleRoutes(deps));
  api.use(notebookRoutes(deps));
  api.use(pageRoutes(deps));
  api.use(signingRoutes(deps));
  api.use(auditRoutes(deps));
  api.use(attachmentRoutes(deps));
  api.use(historyRoutes(deps));
  api.use(chemRoutes());
  api.use(() => {
    throw new HttpError(404, 'not_found', 'No such API route');
  });
  api.use(errorHandler);
  app.use('/api', api);

  const clientDir = path.resolve(deps.config.CLIENT_DIST);
  if (fs.existsSync(path.join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client-side routes: every other GET gets the app shell.
    app.get(/^(?!\/api\/|\/collab\/).*/, (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }
  app.use(errorHandler);
  return app;
}
