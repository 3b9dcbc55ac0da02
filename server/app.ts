import fs from 'node:fs';
import path from 'node:path';
import cookieParser from 'cookie-parser';
import express, { type Request } from 'express';
import helmet from 'helmet';
import type { Config } from './config';
import { createReportQueue, type ReportQueue } from './jobs/report-queue';
import { notFound } from './errors';
import type { Mailer } from './mail/transport';
import { authenticate, requireAuth } from './middleware/auth';
import { errorHandler } from './middleware/error-handler';
import { loadMembership } from './middleware/workshop';
import { authRoutes } from './routes/auth';
import { decisionRoutes } from './routes/decisions';
import { devRoutes } from './routes/dev';
import { findingRoutes } from './routes/findings';
import { invitationPublicRoutes } from './routes/invitations';
import { photoRoutes } from './routes/photos';
import { publicRoutes } from './routes/public';
import { recheckRoutes } from './routes/rechecks';
import { reportRoutes } from './routes/reports';
import { surveyRoutes } from './routes/surveys';
import { treatmentRoutes } from './routes/treatments';
import { vehicleRoutes } from './routes/vehicles';
import { workshopRoutes } from './routes/workshops';
import type { StorageAdapter } from './storage';

export type AppDeps = {
  config: Config;
  storage: StorageAdapter;
  mailer: Mailer;
  /** startServer passes the one it starts and stops; otherwise (tests) the app makes its own. */
  reportQueue?: ReportQueue;
};

export function depsOf(req: Request): AppDeps {
  return req.app.locals.deps as AppDeps;
}

/** Where links in e-mails point: PUBLIC_URL behind a proxy, else the request's own origin. */
export const appUrlOf = (req: Request) =>
  depsOf(req).config.publicUrl ?? `${req.protocol}://${req.get('host')}`;

/** Builds the Express app (no listen): `/api` JSON routes, then the web export with an SPA fallback. */
export function createApp(deps: AppDeps) {
  const { config } = deps;
  const app = express();
  app.locals.deps = deps;
  app.locals.reportQueue =
    deps.reportQueue ??
    createReportQueue({
      storage: deps.storage,
      concurrency: config.reports.concurrency,
      instanceId: config.instanceId,
      verifyUrl: () => (config.publicUrl ? `${config.publicUrl}/verify` : null),
    });
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // react-native-web writes its styles into <style> tags at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: config.production ? [] : null,
        },
      },
      hsts: config.production,
    }),
  );

  const api = express.Router();
  // Share links and verification answer the same with or without a session: mounted before it.
  api.use('/public', publicRoutes());
  api.use(express.json({ limit: '256kb' }), cookieParser(), authenticate(config));
  api.use('/auth', authRoutes());
  api.use('/invitations', invitationPublicRoutes());
  api.use('/dev', devRoutes());

  const scoped = express.Router({ mergeParams: true });
  scoped.use(requireAuth, loadMembership);
  scoped.use(workshopRoutes());
  scoped.use(vehicleRoutes());
  scoped.use(surveyRoutes());
  scoped.use(findingRoutes());
  scoped.use(photoRoutes());
  scoped.use(decisionRoutes());
  scoped.use(treatmentRoutes());
  scoped.use(recheckRoutes());
  scoped.use(reportRoutes());
  api.use('/workshops/:workshopId', scoped);

  api.use((_req, _res, next) => next(notFound('API route')));
  app.use('/api', api);

  serveWebExport(app, config.webDist);
  app.use(errorHandler);
  return app;
}

/** Static files of the Expo web export, and index.html for client-side routes. */
function serveWebExport(app: express.Express, dist: string) {
  const index = path.join(dist, 'index.html');
  app.use(express.static(dist, { index: false, maxAge: '1h' }));
  app.use((req, res, next) => {
    if (req.method !== 'GET' || path.extname(req.path) || !req.accepts('html')) return next();
    // A share link is for the person it was sent to: keep its page out of search engines.
    if (req.path.startsWith('/shared/')) res.setHeader('X-Robots-Tag', 'noindex, nofollow');
    if (!fs.existsSync(index))
      return res
        .status(503)
        .type('text/plain')
        .send('The web app has not been built yet. Run npm start, which builds it.');
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
