import express, { type Express } from 'express';
import helmet from 'helmet';
import passport from 'passport';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type Stripe from 'stripe';
import type { AppConfig } from './config.ts';
import type { Db } from './db/knex.ts';
import type { Mailer } from './integrations/mailer.ts';
import { createGoogleStrategy } from './auth/google-strategy.ts';
import { requireRole } from './auth/roles.ts';
import type { SessionLayer } from './auth/session.ts';
import { createUserService } from './services/user-service.ts';
import { createQuoteService } from './services/quote-service.ts';
import { createDesignService } from './services/design-service.ts';
import { createStoredQuoteService } from './services/stored-quote-service.ts';
import { createCheckoutService } from './services/checkout-service.ts';
import { createCustomerOrderService } from './services/customer-order-service.ts';
import { createPaymentWebhookService } from './services/payment-webhook-service.ts';
import { createDesignSharingService } from './services/design-sharing-service.ts';
import { createLetteringFontLoader } from './integrations/lettering-fonts.ts';
import { requestId } from './middleware/request-id.ts';
import { accessLog } from './middleware/access-log.ts';
import { requireSameOrigin } from './middleware/same-origin.ts';
import { createErrorHandler, notFoundHandler } from './middleware/error-handler.ts';
import { createAuthRouter } from './routes/auth.ts';
import { createMeRouter } from './routes/me.ts';
import { createCatalogRouter } from './routes/catalog.ts';
import { createQuotesRouter } from './routes/quotes.ts';
import { createDesignsRouter } from './routes/designs.ts';
import { createArtworkRouter } from './routes/artwork.ts';
import { createArtworkService } from './services/artwork-service.ts';
import { createSharedDesignsRouter } from './routes/shared-designs.ts';
import { createPaymentWebhookRouter } from './routes/payment-webhooks.ts';
import { createOrdersRouter } from './routes/orders.ts';
import { createAdminOverviewRouter } from './routes/admin/overview.ts';
import { createAdminCatalogRouter } from './routes/admin/catalog.ts';
import { createAdminOrdersRouter } from './routes/admin/orders.ts';
import { createOrderArtworkRouter } from './routes/admin/order-artwork.ts';
import { createProductionSheetRouter } from './routes/admin/production-sheet.ts';
import { createProductionSheetService } from './services/production-sheet-service.ts';
import { createStudioOrdersRouter } from './routes/admin/studio-orders.ts';
import { createCatalogueGarmentsRouter } from './routes/admin/catalogue-garments.ts';
import { createCatalogueMotifsRouter } from './routes/admin/catalogue-motifs.ts';
import { createCatalogueFontsRouter } from './routes/admin/catalogue-fonts.ts';
import { createCatalogueThreadsRouter } from './routes/admin/catalogue-threads.ts';
import { createCatalogueHoopsRouter } from './routes/admin/catalogue-hoops.ts';
import { createAdminPricingRouter } from './routes/admin/pricing.ts';
import { createAdminSettingsRouter } from './routes/admin/settings.ts';
import { createAdminUsersRouter } from './routes/admin/users.ts';
import { createAdminOutboxRouter } from './routes/admin/outbox.ts';
import { createOverviewService } from './services/overview-service.ts';
import { createPricingService } from './services/pricing-service.ts';
import { createPeopleService } from './services/people-service.ts';
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
  const webhooks = createPaymentWebhookService({ db, stripe: deps.stripe, mailer: deps.mailer, appOrigin: config.appOrigin, now: deps.now });
  app.use('/api/webhooks/stripe', createPaymentWebhookRouter({ stripe: deps.stripe, webhookSecret: config.stripe.webhookSecret, webhooks }));

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
  app.use('/api/catalog', createCatalogRouter({ db }));
  // One font loader, so each lettering font is parsed once for quotes, saved designs, proofs and production sheets.
  const fonts = createLetteringFontLoader();
  const quotes = createQuoteService({ db, fonts });
  const storedQuotes = createStoredQuoteService({ db, quotes, now: deps.now });
  app.use('/api/quotes', createQuotesRouter({ quotes, storedQuotes }));
  const sharing = createDesignSharingService({ db });
  app.use('/api/designs', createDesignsRouter({ designs: createDesignService({ db, quotes, now: deps.now }), sharing }));
  app.use('/api/shared-designs', createSharedDesignsRouter({ sharing }));
  app.use('/api/orders', createOrdersRouter({
    checkout: createCheckoutService({ db, stripe: deps.stripe, mailer: deps.mailer, storedQuotes, appOrigin: config.appOrigin, now: deps.now }),
    customerOrders: createCustomerOrderService({ db, mailer: deps.mailer, appOrigin: config.appOrigin, now: deps.now }),
  }));
  app.use('/api/artwork', createArtworkRouter({ artwork, uploadMaxBytes: config.uploadMaxBytes }));
  app.use('/api/admin', requireRole('staff', 'owner'));
  app.use('/api/admin/overview', createAdminOverviewRouter({ overview: createOverviewService({ db, now: deps.now }) }));
  app.use('/api/admin/catalog', createAdminCatalogRouter({ db }));
  app.use('/api/admin/orders', createStudioOrdersRouter({ db, stripe: deps.stripe, mailer: deps.mailer, now: deps.now, appOrigin: config.appOrigin, uploadMaxBytes: config.uploadMaxBytes, fonts }));
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
  app.use('/api/admin/users', createAdminUsersRouter({ people: createPeopleService({ db, ownerEmails: config.ownerEmails, now: deps.now }) }));
  app.use('/api/admin/outbox', createAdminOutboxRouter({ db }));
  app.use('/api', notFoundHandler);

  const staticRoot = resolve(config.staticDir);
  mountSinglePageApp(app, '/admin', join(staticRoot, 'admin'));
  mountSinglePageApp(app, '/', join(staticRoot, 'storefront'));

  app.use(notFoundHandler);
  app.use(createErrorHandler(deps.log));
  return app;
}
