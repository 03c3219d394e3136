import express, { type Express } from 'express';
import helmet from 'helmet';
import passport from 'passport';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type Stripe from 'stripe';
import type { AppConfig } from './config.ts';
import type { Db } from './db/knex.ts';
import type { Mailer } from './integrations/mailer.ts';
import { createGoogleStrategy } from './modules/people/google-strategy.ts';
import { requireRole } from './auth/roles.ts';
import type { SessionLayer } from './auth/session.ts';
import { createUserService } from './modules/people/user-service.ts';
import { createQuoteService } from './modules/quotes/quote-service.ts';
import { createDesignService } from './modules/designs/design-service.ts';
import { createStoredQuoteService } from './modules/quotes/stored-quote-service.ts';
import { createCheckoutService } from './modules/orders/checkout-service.ts';
import { createCustomerOrderService } from './modules/orders/customer-order-service.ts';
import { createPaymentWebhookService } from './modules/payments/payment-webhook-service.ts';
import { createDesignSharingService } from './modules/designs/design-sharing-service.ts';
import { createLetteringFontLoader } from './integrations/lettering-fonts.ts';
import { requestId } from './middleware/request-id.ts';
import { accessLog } from './middleware/access-log.ts';
import { requireSameOrigin } from './middleware/same-origin.ts';
import { createErrorHandler, notFoundHandler } from './middleware/error-handler.ts';
import { createAuthRouter } from './modules/people/auth-routes.ts';
import { createMeRouter } from './modules/people/me-routes.ts';
import { createCatalogueRouter } from './modules/catalogue/routes.ts';
import { createQuotesRouter } from './modules/quotes/routes.ts';
import { createDesignsRouter } from './modules/designs/routes.ts';
import { createArtworkRouter } from './modules/artwork/routes.ts';
import { createArtworkService } from './modules/artwork/artwork-service.ts';
import { createSharedDesignsRouter } from './modules/designs/shared-routes.ts';
import { createPaymentWebhookRouter } from './modules/payments/webhook-routes.ts';
import { createOrdersRouter } from './modules/orders/routes.ts';
import { createAdminOverviewRouter } from './modules/studio/admin-overview-routes.ts';
import { createAdminCatalogueRouter } from './modules/catalogue/admin-overview-routes.ts';
import { createAdminOrdersRouter } from './modules/orders/admin-routes.ts';
import { createOrderArtworkRouter } from './modules/orders/admin-artwork-routes.ts';
import { createProductionSheetRouter } from './modules/production/admin-routes.ts';
import { createProductionSheetService } from './modules/production/production-sheet-service.ts';
import { createStudioOrdersRouter } from './modules/orders/admin-studio-routes.ts';
import { createCatalogueGarmentsRouter } from './modules/catalogue/admin-garment-routes.ts';
import { createCatalogueMotifsRouter } from './modules/catalogue/admin-motif-routes.ts';
import { createCatalogueFontsRouter } from './modules/catalogue/admin-font-routes.ts';
import { createCatalogueThreadsRouter } from './modules/catalogue/admin-thread-routes.ts';
import { createCatalogueHoopsRouter } from './modules/catalogue/admin-hoop-routes.ts';
import { createAdminPricingRouter } from './modules/pricing/admin-routes.ts';
import { createAdminSettingsRouter } from './modules/settings/admin-routes.ts';
import { createAdminUsersRouter } from './modules/people/admin-routes.ts';
import { createAdminOutboxRouter } from './modules/mail/admin-outbox-routes.ts';
import { createOverviewService } from './modules/studio/overview-service.ts';
import { createPricingService } from './modules/pricing/pricing-service.ts';
import { createPeopleService } from './modules/people/people-service.ts';
import type { CurrentUser } from './contracts/users.ts';

export interface AppDeps {
  config: AppConfig;
  db: Db;
  sessions: SessionLayer;
  stripe: Stripe;
  mailer: Mailer;
  now: () => Date;
  log: (line: string) => void;
}

function securityHeaders(config: AppConfig) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        ...(config.isCookieSecure ? { upgradeInsecureRequests: [] } : {}),
      },
    },
    strictTransportSecurity: config.isCookieSecure,
  });
}

/** Serves a built single-page app at `base`, falling back to its index.html for client-side routes. */
function mountSinglePageApp(app: Express, base: string, dir: string): void {
  const index = join(dir, 'index.html');
  if (!existsSync(index)) return;
  app.use(base, express.static(dir, { index: false, maxAge: '1h', immutable: false }));
  const pattern = base === '/' ? '/{*splat}' : `${base}{/*splat}`;
  app.get(pattern, (_req, res) => {
    res.set('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}

/** Builds the Express app: middleware, routers, the two apps and the error handler. It does not listen. */
export function createApp(deps: AppDeps): Express {
  const { config, db } = deps;
  const users = createUserService({ db, ownerEmails: config.ownerEmails });
  passport.use(createGoogleStrategy(config, users));
  passport.serializeUser((user, done) => done(null, (user as CurrentUser).id));
  passport.deserializeUser((id: number, done) => {
    users.findById(id).then((user) => done(null, user ?? false), done);
  });

  const app = express();
  app.disable('x-powered-by');
  if (config.isBehindProxy) app.set('trust proxy', 1);
  app.use(requestId);
  app.use('/api', accessLog(deps.log));
  app.use(securityHeaders(config));

  // Webhooks authenticate by signature, not by session or origin, and need the raw body.
  const webhooks = createPaymentWebhookService({
    db,
    stripe: deps.stripe,
    mailer: deps.mailer,
    appOrigin: config.appOrigin,
    now: deps.now,
  });
  app.use(
    '/api/webhooks/stripe',
    createPaymentWebhookRouter({ stripe: deps.stripe, webhookSecret: config.stripe.webhookSecret, webhooks }),
  );

  app.use('/api', requireSameOrigin(config.appOrigin));
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api', deps.sessions.middleware, passport.session());
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  app.get('/api/health', (_req, res) => res.json({ ok: true }));
  const artwork = createArtworkService({ db, now: deps.now });
  app.use('/api/auth', createAuthRouter({ log: deps.log, claimArtwork: artwork.claim }));
  app.use('/api/me', createMeRouter());
  app.use('/api/catalogue', createCatalogueRouter({ db }));
  // One font loader, so each lettering font is parsed once for quotes, saved designs, proofs and production sheets.
  const fonts = createLetteringFontLoader();
  const quotes = createQuoteService({ db, fonts });
  const storedQuotes = createStoredQuoteService({ db, quotes, now: deps.now });
  app.use('/api/quotes', createQuotesRouter({ quotes, storedQuotes }));
  const sharing = createDesignSharingService({ db });
  app.use(
    '/api/designs',
    createDesignsRouter({ designs: createDesignService({ db, quotes, now: deps.now }), sharing }),
  );
  app.use('/api/shared-designs', createSharedDesignsRouter({ sharing }));
  app.use(
    '/api/orders',
    createOrdersRouter({
      checkout: createCheckoutService({
        db,
        stripe: deps.stripe,
        mailer: deps.mailer,
        storedQuotes,
        appOrigin: config.appOrigin,
        now: deps.now,
      }),
      customerOrders: createCustomerOrderService({
        db,
        mailer: deps.mailer,
        appOrigin: config.appOrigin,
        now: deps.now,
      }),
    }),
  );
  app.use('/api/artwork', createArtworkRouter({ artwork, uploadMaxBytes: config.uploadMaxBytes }));
  app.use('/api/admin', requireRole('staff', 'owner'));
  app.use('/api/admin/overview', createAdminOverviewRouter({ overview: createOverviewService({ db, now: deps.now }) }));
  app.use('/api/admin/catalogue', createAdminCatalogueRouter({ db }));
  app.use(
    '/api/admin/orders',
    createStudioOrdersRouter({
      db,
      stripe: deps.stripe,
      mailer: deps.mailer,
      now: deps.now,
      appOrigin: config.appOrigin,
      uploadMaxBytes: config.uploadMaxBytes,
      fonts,
    }),
  );
  app.use('/api/admin/orders', createAdminOrdersRouter({ db }));
  app.use('/api/admin/orders', createOrderArtworkRouter({ db }));
  app.use('/api/admin/orders', createProductionSheetRouter({ sheets: createProductionSheetService({ db, fonts }) }));
  app.use('/api/admin/catalogue/garments', createCatalogueGarmentsRouter({ db }));
  app.use('/api/admin/catalogue/motifs', createCatalogueMotifsRouter({ db, uploadMaxBytes: config.uploadMaxBytes }));
  app.use('/api/admin/catalogue/fonts', createCatalogueFontsRouter({ db }));
  app.use('/api/admin/catalogue/threads', createCatalogueThreadsRouter({ db }));
  app.use('/api/admin/catalogue/hoops', createCatalogueHoopsRouter({ db }));
  app.use('/api/admin/pricing', createAdminPricingRouter({ pricing: createPricingService({ db, now: deps.now }) }));
  app.use('/api/admin/settings', createAdminSettingsRouter({ db, now: deps.now }));
  app.use(
    '/api/admin/users',
    createAdminUsersRouter({ people: createPeopleService({ db, ownerEmails: config.ownerEmails, now: deps.now }) }),
  );
  app.use('/api/admin/outbox', createAdminOutboxRouter({ db }));
  app.use('/api', notFoundHandler);

  const staticRoot = resolve(config.staticDir);
  mountSinglePageApp(app, '/admin', join(staticRoot, 'admin'));
  mountSinglePageApp(app, '/', join(staticRoot, 'storefront'));

  app.use(notFoundHandler);
  app.use(createErrorHandler(deps.log));
  return app;
}
