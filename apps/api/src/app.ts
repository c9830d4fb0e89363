import { existsSync } from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express, { type Express } from 'express';
import expressStaticGzip from 'express-static-gzip';
import helmet from 'helmet';
import type { Redis } from 'ioredis';
import { pinoHttp } from 'pino-http';
import { createLoginLimiter } from './auth/loginLimiter';
import { createPassport } from './auth/passport';
import { errorHandler, notFoundHandler } from './middleware/errorHandler';
import { requestId } from './middleware/requestId';
import { requireAuth as requireAuthWith } from './middleware/requireAuth';
import { authRoutes } from './routes/authRoutes';
import { healthRoutes } from './routes/healthRoutes';
import { invitationRoutes } from './routes/invitationRoutes';
import { meRoutes } from './routes/meRoutes';
import { awardRoutes } from './routes/awardRoutes';
import { bidRoutes } from './routes/bidRoutes';
import { fulfilmentRoutes } from './routes/fulfilmentRoutes';
import { invoiceRoutes } from './routes/invoiceRoutes';
import { fileRoutes } from './routes/fileRoutes';
import { notificationRoutes } from './routes/notificationRoutes';
import { libraryRoutes } from './routes/libraryRoutes';
import { openRequestRoutes } from './routes/openRequestRoutes';
import { pressRoutes } from './routes/pressRoutes';
import { organisationRoutes } from './routes/organisationRoutes';
import { rateCardRoutes } from './routes/rateCardRoutes';
import { holidayRoutes } from './routes/holidayRoutes';
import { priceHistoryRoutes } from './routes/priceHistoryRoutes';
import { requestRoutes } from './routes/requestRoutes';
import { userRoutes } from './routes/userRoutes';
import type { ServiceDeps } from './services/deps';
import { createServices } from './services';

export interface AppDeps extends ServiceDeps {
  redis: Redis;
}

export function createApp(deps: AppDeps): Express {
  const { config, knex, redis, logger } = deps;
  const app = express();
  app.disable('x-powered-by');
  // No ETag on the API's answers: hashing every JSON body cost CPU on each request, and the web
  // app refetches through its own query cache rather than the browser's.
  app.set('etag', false);
  app.set('trust proxy', config.trustProxy);
  app.use(requestId);
  app.use(
    helmet({
      contentSecurityPolicy: { directives: { 'upgrade-insecure-requests': null } },
      strictTransportSecurity: config.appUrl.startsWith('https:'),
    }),
  );
  if (process.env.NODE_ENV !== 'test')
    app.use(
      pinoHttp({
        logger,
        genReqId: (req) => req.id,
        redact: ['req.headers.authorization', 'req.headers.cookie'],
        autoLogging: { ignore: (req) => req.url?.startsWith('/api/health') ?? false },
      }),
    );

  const services = createServices(deps, createLoginLimiter(redis, config.login));
  const requireAuth = requireAuthWith(createPassport(config.jwtSecret, knex));

  const api = express.Router();
  api.use(express.json({ limit: '100kb' }));
  api.use('/health', healthRoutes({ knex, redis, storage: deps.storage }));
  api.use('/auth', authRoutes(services, requireAuth));
  api.use('/me', meRoutes(services, requireAuth));
  api.use('/users', userRoutes(services, requireAuth));
  api.use('/invitations', invitationRoutes(services, requireAuth));
  api.use('/presses', pressRoutes(services, requireAuth));
  api.use('/holidays', holidayRoutes(services, requireAuth));
  api.use('/organisation', organisationRoutes(services, requireAuth));
  api.use('/requests', requestRoutes(services, requireAuth, config.maxUploadBytes));
  api.use('/files', fileRoutes(services, requireAuth));
  api.use('/notifications', notificationRoutes(services, requireAuth));
  api.use('/price-history', priceHistoryRoutes(services, requireAuth));
  api.use(bidRoutes(services, requireAuth));
  api.use(rateCardRoutes(services, requireAuth));
  api.use(awardRoutes(services, requireAuth));
  api.use(fulfilmentRoutes(services, requireAuth));
  api.use(invoiceRoutes(services, requireAuth));
  api.use(libraryRoutes(services, requireAuth));
  api.use(openRequestRoutes(services, requireAuth));
  api.use(notFoundHandler);
  app.use('/api', api);

  // The built web app, with every other path answered by its index page (client-side routes).
  if (config.webDist && existsSync(path.join(config.webDist, 'index.html'))) {
    const dist = config.webDist;
    // The web app's files go out compressed: brotli (or gzip) files made once at build time at the highest
    // levels, else compressed on the fly; the API's JSON is left to the load balancer, so that the API
    // spends its CPU on answers.
    app.use(compression());
    app.use(
      expressStaticGzip(dist, {
        enableBrotli: true,
        orderPreference: ['br', 'gz'],
        index: false,
        serveStatic: {
          maxAge: '1h',
          // Vite names each file under assets/ by a hash of its content, so a browser may keep it for good.
          setHeaders: (res, file) => {
            if (path.relative(dist, file).startsWith(`assets${path.sep}`))
              res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
          },
        },
      }),
    );
    app.use((req, res, next) => {
      if (req.method !== 'GET' && req.method !== 'HEAD') return next();
      res.set('Cache-Control', 'no-cache').sendFile(path.join(dist, 'index.html'));
    });
  }

  app.use(errorHandler(logger));
  return app;
}
