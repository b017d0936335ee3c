import path from 'node:path';
import { fileURLToPath } from 'node:url';
import express, { Router } from 'express';
import helmet from 'helmet';
import compression from 'compression';
import cookieParser from 'cookie-parser';
import { pinoHttp } from 'pino-http';
import { serveClient } from './client-files';
import { env } from './env';
import { logger } from './logger';
import { buildOpenApiDocument } from './openapi';
import { errorHandler, notFoundHandler } from './middlewares/error-handler';
import { jsonBodiesOnly, refuseCrossSiteWrites } from './middlewares/request-guard';
import { authRouter } from './routes/auth/auth.router';
import { accountRouter } from './routes/account/account.router';
import { organizationsRouter } from './routes/organizations/organizations.router';
import { membersRouter } from './routes/members/members.router';
import { devRouter } from './routes/dev/dev.router';
import { machinesRouter } from './routes/machines/machines.router';
import { hitchRouter } from './routes/hitch/hitch.router';
import { metersRouter } from './routes/machines/meters.router';
import { machinePhotoRouter } from './routes/machines/photo.router';
import { fleetImportRouter } from './routes/machines/fleet-import.router';
import { machineStatusRouter } from './routes/machines/status.router';
import { machineClassRouter } from './routes/machines/machine-class.router';
import { specSheetRouter } from './routes/machines/spec-sheet.router';
import { tasksRouter } from './routes/tasks/tasks.router';
import { taskHistoryRouter } from './routes/tasks/history.router';
import { firstRunRouter } from './routes/onboarding/first-run.router';
import { readingsRouter } from './routes/readings/readings.router';
import { dueRouter } from './routes/due/due.router';
import { serviceRecordsRouter } from './routes/service-records/shop.router';
import { walkaroundsRouter } from './routes/walkarounds/walkarounds.router';
import { defectsRouter } from './routes/defects/defects.router';
import { notificationsRouter } from './routes/notifications/notifications.router';
import { calendarRouter } from './routes/calendar/calendar.router';
import { dealersRouter } from './routes/dealers/dealers.router';
import { exportRouter } from './routes/export/export.router';
import { apiKeysRouter } from './routes/api-keys/api-keys.router';
import { telematicsRouter } from './routes/telematics/telematics.router';
import { seasonHoursRouter } from './routes/season-hours/season-hours.router';
import { shopOutlookRouter } from './routes/shop-outlook/shop-outlook.router';
import './models';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Builds the Express app (no listen): tests import this. */
export function createApp(options: { serveClient?: boolean; clientDist?: string } = {}) {
  const app = express();
  app.set('trust proxy', env.TRUST_PROXY);
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': env.CSP_UPGRADE_INSECURE === 'true' ? [] : null,
        },
      },
    }),
  );
  if (env.NODE_ENV !== 'test') {
    app.use(
      pinoHttp({
        logger,
        // One short line per API call; static files of the client are not logged.
        autoLogging: { ignore: (req) => !req.url?.startsWith('/api/') },
        serializers: {
          req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
          res: (res: { statusCode: number }) => ({ status: res.statusCode }),
        },
      }),
    );
  }
  // Text answers (JSON, HTML, scripts, CSV) go out compressed: brotli or gzip as the client asks.
  app.use(compression());
  app.use(cookieParser());
  // Before any body is read: cross-site writes answer 403, bodies other than JSON 415.
  app.use('/api/v1', refuseCrossSiteWrites(env.APP_URL), jsonBodiesOnly);
  app.use(express.json({ limit: '1mb' }));

  const api = Router();
  api.get('/health', (_req, res) => {
    res.json({ data: { ok: true } });
  });
  api.get('/openapi.json', (_req, res) => {
    res.json(buildOpenApiDocument());
  });
  api.use(authRouter());
  api.use(accountRouter());
  api.use(organizationsRouter());
  api.use(membersRouter());
  api.use(machinesRouter());
  api.use(metersRouter());
  api.use(hitchRouter());
  api.use(machinePhotoRouter());
  api.use(fleetImportRouter());
  api.use(machineStatusRouter());
  api.use(machineClassRouter());
  api.use(specSheetRouter());
  api.use(tasksRouter());
  api.use(taskHistoryRouter());
  api.use(firstRunRouter());
  api.use(readingsRouter());
  api.use(dueRouter());
  api.use(serviceRecordsRouter());
  api.use(walkaroundsRouter());
  api.use(defectsRouter());
  api.use(notificationsRouter());
  api.use(calendarRouter());
  api.use(dealersRouter());
  api.use(exportRouter());
  api.use(apiKeysRouter());
  api.use(telematicsRouter());
  api.use(seasonHoursRouter());
  api.use(shopOutlookRouter());
  api.use(devRouter());
  api.use(notFoundHandler);
  app.use('/api/v1', api);

  if (options.serveClient ?? env.SERVE_CLIENT === '1') {
    serveClient(app, options.clientDist ?? path.join(root, env.CLIENT_DIST));
  }
  app.use(notFoundHandler);
  app.use(errorHandler);
  return app;
}
