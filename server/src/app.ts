import { createJobRunner } from './modules/jobs/job-runner.ts';
import { createVisitorDataRetention } from './modules/retention/visitor-data-retention.ts';
import { SEND_MAIL_JOB, sendMailJobHandler } from './modules/mail/order-mail.ts';
import { purgeExpiredSessions } from './modules/people/session-sweep-repo.ts';
import { createHealthRouter } from './modules/health/routes.ts';
import { createHealthService } from './modules/health/health-service.ts';
import express, { type Express, type Request } from 'express';
import cookieParser from 'cookie-parser';
import compression from 'compression';
import expressStaticGzip from 'express-static-gzip';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type Stripe from 'stripe';
import type { AppConfig } from './config.ts';
import type { Db } from './db/knex.ts';
import type { Mailer } from './integrations/mailer.ts';
import type { HeavyWork } from './integrations/heavy-work.ts';
import { requireRole } from './auth/roles.ts';
import { sessionWhereNeeded, type SessionLayer } from './auth/session.ts';
import { createLetteringFontLoader } from './integrations/lettering-fonts.ts';
import { requestId } from './middleware/request-id.ts';
import { securityHeaders } from './middleware/security-headers.ts';
import { accessLog } from './middleware/access-log.ts';
import { requireSameOrigin } from './middleware/same-origin.ts';
import { createRateLimits } from './middleware/rate-limit.ts';
import { createErrorHandler, notFoundHandler } from './middleware/error-handler.ts';
import { createUserService } from './modules/people/user-service.ts';
import { createPeopleService } from './modules/people/people-service.ts';
import { createSignIn } from './modules/people/sign-in.ts';
import { createAuthRouter } from './modules/people/auth-routes.ts';
import { createMeRouter } from './modules/people/me-routes.ts';
import { createAdminUsersRouter } from './modules/people/admin-routes.ts';
import { createCatalogueService } from './modules/catalogue/catalogue-service.ts';
import { createCatalogueVersionWatch } from './modules/catalogue/catalogue-version.ts';
import { createCatalogueGarmentService } from './modules/catalogue/garment-service.ts';
import { createCatalogueMotifService } from './modules/catalogue/motif-service.ts';
import { createFontService } from './modules/catalogue/font-service.ts';
import { createThreadService } from './modules/catalogue/thread-service.ts';
import { createHoopService } from './modules/catalogue/hoop-service.ts';
import { createCatalogueRouter } from './modules/catalogue/routes.ts';
import { createAdminCatalogueRouter } from './modules/catalogue/admin-routes.ts';
import { createQuoteService } from './modules/quotes/quote-service.ts';
import { createStoredQuoteService } from './modules/quotes/stored-quote-service.ts';
import { createQuotesRouter } from './modules/quotes/routes.ts';
import { createDesignService } from './modules/designs/design-service.ts';
import { createDesignSharingService } from './modules/designs/design-sharing-service.ts';
import { createDesignsRouter } from './modules/designs/routes.ts';
import { createSharedDesignsRouter } from './modules/designs/shared-routes.ts';
import { createArtworkService } from './modules/artwork/artwork-service.ts';
import { createArtworkRouter } from './modules/artwork/routes.ts';
import { createCheckoutService } from './modules/orders/checkout-service.ts';
import { createCustomerOrderService } from './modules/orders/customer-order-service.ts';
import { createStudioOrderService } from './modules/orders/studio-order-service.ts';
import { createOrderProductionSteps } from './modules/orders/order-production-steps.ts';
import { createOrdersRouter } from './modules/orders/routes.ts';
import { createAddressesRouter } from './modules/orders/address-routes.ts';
import { createCustomerAddressService } from './modules/orders/customer-address-service.ts';
import { createAdminOrdersRouter } from './modules/orders/admin-routes.ts';
import { createOrderPaymentService } from './modules/orders/order-payment-service.ts';
import { createPaymentWebhookService } from './modules/orders/payment-webhook-service.ts';
import { createPaymentWebhookRouter } from './modules/orders/payment-webhook-routes.ts';
import { createProofService } from './modules/orders/proof-service.ts';
import { createOrderRepricing } from './modules/orders/order-repricing.ts';
import { createOrderDesignService } from './modules/orders/order-design-service.ts';
import { createProductionSheetService } from './modules/production/production-sheet-service.ts';
import { createProductionSheetRouter } from './modules/production/admin-routes.ts';
import { createPricingService } from './modules/pricing/pricing-service.ts';
import { createAdminPricingRouter } from './modules/pricing/admin-routes.ts';
import { createSettingsService } from './modules/settings/settings-service.ts';
import { createAdminSettingsRouter } from './modules/settings/admin-routes.ts';
import { createShippingSettingsService } from './modules/settings/shipping-settings-service.ts';
import { createOverviewService } from './modules/studio/overview-service.ts';
import { createAdminOverviewRouter } from './modules/studio/admin-overview-routes.ts';
import { createOutboxService } from './modules/mail/outbox-service.ts';
import { createAdminOutboxRouter } from './modules/mail/admin-outbox-routes.ts';

export interface AppDeps {
  config: AppConfig;
  db: Db;
  sessions: SessionLayer;
  stripe: Stripe;
  mailer: Mailer;
  /** Worker threads for uploads, SVG measuring, proofs and PDFs (`createHeavyWork`); the caller closes it. */
  heavyWork: HeavyWork;
  now: () => Date;
  log: (line: string) => void;
  /** True once the process has begun to shut down: readiness then says no, so a proxy stops sending work. */
  isDraining?: () => boolean;
}

/** Vite names the files under assets/ by their content's hash, so a browser may keep them for good. */
const HASHED_ASSET_CACHE = 'public, max-age=31536000, immutable';
const OTHER_FILE_CACHE = 'public, max-age=3600';
/** JSON answers at least this long go out compressed to clients that accept it; shorter ones gain too little. */
const COMPRESS_FROM_BYTES = 1024;

/**
 * Serves a built single-page app at `base`, falling back to its index.html (never kept without asking again) for
 * client-side routes. Files go out as the build's brotli or gzip copy when the browser accepts one.
 */
function mountSinglePageApp(app: Express, base: string, dir: string): void {
  const index = join(dir, 'index.html');
  if (!existsSync(index)) return;
  const assets = join(dir, 'assets');
  app.use(
    base,
    expressStaticGzip(dir, {
      index: false,
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      serveStatic: {
        cacheControl: false,
        setHeaders: (res, path) => {
          res.setHeader('Cache-Control', path.startsWith(assets) ? HASHED_ASSET_CACHE : OTHER_FILE_CACHE);
        },
      },
    }),
  );
  const pattern = base === '/' ? '/{*splat}' : `${base}{/*splat}`;
  app.get(pattern, (_req, res) => {
    res.set('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}

/**
 * Routes (under /api) that read nothing but a signed-in user or a visitor's uploads from the session and never
 * write it, so a visitor without a session cookie gets them without a session.
 */
function isSessionFree(req: Request): boolean {
  if (req.method === 'GET' || req.method === 'HEAD')
    return (
      req.path === '/health' ||
      req.path.startsWith('/catalogue/') ||
      req.path.startsWith('/shared-designs/') ||
      req.path === '/quotes/ready-dates'
    );
  return req.method === 'POST' && req.path === '/quotes/preview';
}

/**
 * Builds the Express app: middleware, one router per URL prefix, the two apps and the error handler. It does not
 * listen. This is the one place services are made and handed to the routers that answer for them.
 */
export function createApp(deps: AppDeps): Express {
  const { config, db, now, mailer, stripe, heavyWork } = deps;
  const { appOrigin, uploadMaxBytes } = config;
  const users = createUserService({ db, ownerEmails: config.ownerEmails });
  const signIn = createSignIn(config, users);
  // One font loader, so each lettering font is parsed once for quotes, saved designs, proofs and production sheets.
  const fonts = createLetteringFontLoader();
  const artwork = createArtworkService({ db, now, heavyWork });
  // One watch of the catalogue's change count for every in-memory copy of the catalogue this instance keeps.
  const versions = createCatalogueVersionWatch(db, config.catalogueRecheckMs);
  const catalogue = createCatalogueService({ db, versions });
  const quotes = createQuoteService({ db, fonts, versions });
  const storedQuotes = createStoredQuoteService({ db, quotes, now });
  const sharing = createDesignSharingService({ db });
  const holdWindowDays = config.stripe.holdWindowDays;
  const money = { db, stripe, mailer, now, appOrigin, holdWindowDays };

  const app = express();
  app.disable('x-powered-by');
  // API answers are Cache-Control: no-store, so an ETag (a hash of every body) would never be used; the apps'
  // files get theirs from the static file server.
  app.disable('etag');
  if (config.isBehindProxy) app.set('trust proxy', 1);
  app.use(requestId);
  app.use('/api', accessLog(deps.log));
  app.use(securityHeaders(config));

  // Webhooks authenticate by signature, not by session or origin, and need the raw body.
  app.use(
    '/api/webhooks/stripe',
    createPaymentWebhookRouter({
      stripe,
      webhookSecret: config.stripe.webhookSecret,
      webhooks: createPaymentWebhookService({ db, stripe, mailer, appOrigin, now, holdWindowDays }),
    }),
  );

  app.use('/api', compression({ threshold: COMPRESS_FROM_BYTES }));
  app.use('/api', requireSameOrigin(appOrigin));
  app.use('/api', express.json({ limit: '1mb' }));
  // Health checks come before the session layer: a proxy polling them needs no session.
  app.use(
    '/api/health',
    createHealthRouter({ health: createHealthService({ db, isDraining: deps.isDraining ?? (() => false) }) }),
  );
  app.use('/api', sessionWhereNeeded(isSessionFree, [deps.sessions.middleware, signIn.session()]));
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  // Abuse limits, counted before the work: sign-in, pricing, uploads, checkouts and answers to proofs.
  const limits = createRateLimits(db, config.database.database, config.rateLimits);
  app.get(['/api/auth/google', '/api/auth/google/callback'], limits.signIn);
  app.post('/api/quotes/preview', limits.quotePreviews);
  app.post(['/api/artwork', '/api/admin/catalogue/motifs/preview', '/api/admin/orders/:number/proofs'], limits.uploads);
  app.post(['/api/orders', '/api/orders/:number/payment'], limits.orders);
  app.post(
    ['/api/orders/:number/proofs/:version/approval', '/api/orders/:number/proofs/:version/change-request'],
    limits.proofAnswers,
  );

  app.use(
    '/api/auth',
    cookieParser(config.sessionSecret),
    createAuthRouter({ signIn, log: deps.log, claimArtwork: artwork.claim }),
  );
  app.use('/api/me', createMeRouter());
  app.use('/api/catalogue', createCatalogueRouter({ catalogue }));
  app.use('/api/quotes', createQuotesRouter({ quotes, storedQuotes }));
  app.use('/api/designs', createDesignsRouter({ designs: createDesignService({ db, quotes, now }), sharing }));
  app.use('/api/shared-designs', createSharedDesignsRouter({ sharing }));
  app.use(
    '/api/orders',
    createOrdersRouter({
      checkout: createCheckoutService({
        db,
        stripe,
        mailer,
        storedQuotes,
        appOrigin,
        holdWindowDays,
        now,
        log: deps.log,
      }),
      customerOrders: createCustomerOrderService({ db, mailer, quotes, appOrigin, now }),
    }),
  );
  app.use('/api/addresses', createAddressesRouter({ addresses: createCustomerAddressService({ db }) }));
  app.use('/api/artwork', createArtworkRouter({ artwork, uploadMaxBytes }));

  app.use('/api/admin', requireRole('staff', 'owner'));
  // A studio change through this server reaches its own next quote at once, whatever the re-check window.
  app.use('/api/admin', (req, res, next) => {
    if (req.method !== 'GET') res.once('finish', versions.markStale);
    next();
  });
  app.use('/api/admin/overview', createAdminOverviewRouter({ overview: createOverviewService({ db, now }) }));
  app.use(
    '/api/admin/catalogue',
    createAdminCatalogueRouter({
      catalogue,
      garments: createCatalogueGarmentService({ db, heavyWork }),
      motifs: createCatalogueMotifService({ db, heavyWork }),
      fonts: createFontService({ db }),
      threads: createThreadService({ db }),
      hoops: createHoopService({ db }),
      uploadMaxBytes,
    }),
  );
  const repricing = createOrderRepricing({ db, quotes });
  app.use(
    '/api/admin/orders',
    createAdminOrdersRouter({
      orders: createStudioOrderService({ db, artwork, quotes, now }),
      payments: createOrderPaymentService(money),
      production: createOrderProductionSteps({ db, mailer, now, appOrigin }),
      proofs: createProofService({ db, mailer, now, appOrigin, heavyWork, repricing }),
      designs: createOrderDesignService({ db, repricing, now }),
      productionSheets: createProductionSheetRouter({
        sheets: createProductionSheetService({ db, fonts, heavyWork }),
      }),
      uploadMaxBytes,
    }),
  );
  app.use('/api/admin/pricing', createAdminPricingRouter({ pricing: createPricingService({ db, now }) }));
  app.use(
    '/api/admin/settings',
    createAdminSettingsRouter({
      settings: createSettingsService({ db, now }),
      shipping: createShippingSettingsService({ db, now }),
    }),
  );
  app.use(
    '/api/admin/users',
    createAdminUsersRouter({ people: createPeopleService({ db, ownerEmails: config.ownerEmails, now }) }),
  );
  app.use('/api/admin/outbox', createAdminOutboxRouter({ outbox: createOutboxService({ db, mailer, now }) }));
  app.use('/api', notFoundHandler);

  const staticRoot = resolve(config.staticDir);
  mountSinglePageApp(app, '/admin', join(staticRoot, 'admin'));
  mountSinglePageApp(app, '/', join(staticRoot, 'storefront'));

  app.use(notFoundHandler);
  app.use(createErrorHandler(deps.log));
  return app;
}

/**
 * The job worker: sends queued e-mails (retrying with a growing delay) and runs the scheduled housekeeping, each task
 * once per period across every instance. `main.ts` runs one in the API process unless WORKER_IN_PROCESS=false;
 * `worker.ts` runs one on its own.
 */
export function createJobWorker(
  deps: Pick<AppDeps, 'db' | 'mailer' | 'now' | 'log'> & { workerId?: string; visitorDataRetentionDays?: number },
) {
  const { db, mailer, now, log } = deps;
  const retention = createVisitorDataRetention({ db, now, log, retentionDays: deps.visitorDataRetentionDays ?? 30 });
  return createJobRunner({
    db,
    now,
    log,
    workerId: deps.workerId,
    handlers: { [SEND_MAIL_JOB]: sendMailJobHandler({ db, mailer, now, log }) },
    schedules: [
      {
        name: 'purge-expired-sessions',
        periodMs: 15 * 60_000,
        run: async (at) => {
          await purgeExpiredSessions(db, at);
        },
      },
      // Visitors' sessions, uploads and quotes no account claimed, once a day across all instances.
      { name: 'purge-unclaimed-visitor-data', periodMs: 86_400_000, run: () => retention.sweepAndReport() },
    ],
  });
}
