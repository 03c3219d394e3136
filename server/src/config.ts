/**
 * The only reader of process.env. Every setting is parsed once with zod at start-up; a missing or malformed value
 * stops the process with a list of what to fix. `.env.example` and the README document each variable.
 */
import { availableParallelism } from 'node:os';
import { z } from 'zod';

const port = z.coerce.number().int().min(0).max(65_535);
const list = z
  .string()
  .default('')
  .transform((value) =>
    value
      .split(',')
      .map((item) => item.trim().toLowerCase())
      .filter(Boolean),
  );
const flag = z
  .enum(['true', 'false', '1', '0', ''])
  .default('false')
  .transform((value) => value === 'true' || value === '1');

const flagOn = z
  .enum(['true', 'false', '1', '0', ''])
  .default('true')
  .transform((value) => value !== 'false' && value !== '0');

const databaseSchema = z.object({
  DATABASE_URL: z.url().optional(),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: port.default(3307),
  DB_USER: z.string().default('hoopwright'),
  DB_PASSWORD: z.string().default('hoopwright-local'),
  DB_NAME: z.string().default('hoopwright'),
  DB_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
});

const appSchema = databaseSchema.extend({
  HOST: z.string().default('127.0.0.1'),
  PORT: port.default(3000),
  APP_ORIGIN: z.url().default('http://127.0.0.1:3000'),
  SESSION_SECRET: z.string().min(16, 'SESSION_SECRET must be at least 16 characters'),
  COOKIE_SECURE: flag,
  TRUST_PROXY: flag,
  STATIC_DIR: z.string().default('dist'),
  OWNER_EMAILS: list,
  GOOGLE_CLIENT_ID: z.string().min(1),
  GOOGLE_CLIENT_SECRET: z.string().min(1),
  GOOGLE_OAUTH_BASE_URL: z.url().optional(),
  STRIPE_SECRET_KEY: z.string().min(1),
  STRIPE_WEBHOOK_SECRET: z.string().min(1),
  STRIPE_API_URL: z.url().optional(),
  // Stripe's lifetime for an uncaptured online card authorization (Stripe docs: place a hold on a payment method, from memory).
  CARD_HOLD_WINDOW_DAYS: z.coerce.number().int().min(1).max(30).default(7),
  SMTP_URL: z.string().min(1).default('smtp://127.0.0.1:2525'),
  MAIL_FROM: z.string().default('Wren & Bobbin <studio@wrenandbobbin.test>'),
  UPLOAD_MAX_BYTES: z.coerce
    .number()
    .int()
    .min(1024)
    .default(5 * 1024 * 1024),
  WORKER_IN_PROCESS: flagOn,
  // One thread fewer than the cores, so the request thread keeps one to itself.
  HEAVY_WORK_THREADS: z.coerce
    .number()
    .int()
    .min(1)
    .max(64)
    .default(Math.max(1, availableParallelism() - 1)),
  HEAVY_JOB_TIME_LIMIT_MS: z.coerce.number().int().min(1).max(600_000).default(20_000),
  RATE_LIMIT_WINDOW_SECONDS: z.coerce.number().int().min(1).max(86_400).default(60),
  RATE_LIMIT_SIGN_IN: z.coerce.number().int().min(1).default(30),
  RATE_LIMIT_QUOTE_PREVIEWS: z.coerce.number().int().min(1).default(120),
  RATE_LIMIT_UPLOADS: z.coerce.number().int().min(1).default(20),
  RATE_LIMIT_ORDERS: z.coerce.number().int().min(1).default(10),
  RATE_LIMIT_PROOF_ANSWERS: z.coerce.number().int().min(1).default(20),
  VISITOR_DATA_RETENTION_DAYS: z.coerce.number().int().min(1).max(3650).default(30),
  CATALOGUE_RECHECK_MS: z.coerce.number().int().min(0).max(60_000).default(500),
});

export interface DatabaseConfig {
  host: string;
  port: number;
  user: string;
  password: string;
  database: string;
  poolMax: number;
}

export interface AppConfig {
  host: string;
  port: number;
  appOrigin: string;
  sessionSecret: string;
  isCookieSecure: boolean;
  isBehindProxy: boolean;
  staticDir: string;
  ownerEmails: string[];
  database: DatabaseConfig;
  google: { clientId: string; clientSecret: string; providerBaseUrl?: string };
  /** `holdWindowDays`: how long a card hold lasts; orders due after it keep the card for a later charge instead. */
  stripe: { secretKey: string; webhookSecret: string; apiUrl?: string; holdWindowDays: number };
  mail: { smtpUrl: string; from: string };
  uploadMaxBytes: number;
  /** Whether the API process also runs a job worker (the demo, one-server shops); false when workers run apart. */
  isWorkerInProcess: boolean;
  /** The worker threads for uploads, SVG measuring, proofs and PDFs, and how long one job may take. */
  heavyWork: { threads: number; timeLimitMs: number };
  rateLimits: RateLimitSettings;
  /** Days a visitor's sessions, uploads and quotes are kept when no account claimed them. */
  visitorDataRetentionDays: number;
  /** How long a read of the catalogue's change count is shared by requests (0: every request waits for a fresh one). */
  catalogueRecheckMs: number;
}

/** Requests one client may make per window (per signed-in person, or per address for visitors). */
export interface RateLimitSettings {
  windowSeconds: number;
  signIn: number;
  quotePreviews: number;
  uploads: number;
  orders: number;
  proofAnswers: number;
}

function fail(error: z.ZodError): never {
  const lines = error.issues.map((issue) => `  - ${issue.path.join('.') || '(env)'}: ${issue.message}`);
  throw new Error(`Configuration is incomplete or invalid:\n${lines.join('\n')}`);
}

function toDatabaseConfig(env: z.infer<typeof databaseSchema>): DatabaseConfig {
  if (env.DATABASE_URL) {
    const url = new URL(env.DATABASE_URL);
    return {
      host: url.hostname,
      port: Number(url.port || 3306),
      user: decodeURIComponent(url.username),
      password: decodeURIComponent(url.password),
      database: url.pathname.replace(/^\//, ''),
      poolMax: env.DB_POOL_MAX,
    };
  }
  return {
    host: env.DB_HOST,
    port: env.DB_PORT,
    user: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
    poolMax: env.DB_POOL_MAX,
  };
}

/** Database settings alone, for the knex CLI and the scripts. */
export function loadDatabaseConfig(env: NodeJS.ProcessEnv = process.env): DatabaseConfig {
  const parsed = databaseSchema.safeParse(env);
  if (!parsed.success) fail(parsed.error);
  return toDatabaseConfig(parsed.data);
}

/** The whole server configuration, frozen. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Readonly<AppConfig> {
  const parsed = appSchema.safeParse(env);
  if (!parsed.success) fail(parsed.error);
  const e = parsed.data;
  return Object.freeze({
    host: e.HOST,
    port: e.PORT,
    appOrigin: new URL(e.APP_ORIGIN).origin,
    sessionSecret: e.SESSION_SECRET,
    isCookieSecure: e.COOKIE_SECURE,
    isBehindProxy: e.TRUST_PROXY,
    staticDir: e.STATIC_DIR,
    ownerEmails: e.OWNER_EMAILS,
    database: toDatabaseConfig(e),
    google: {
      clientId: e.GOOGLE_CLIENT_ID,
      clientSecret: e.GOOGLE_CLIENT_SECRET,
      providerBaseUrl: e.GOOGLE_OAUTH_BASE_URL,
    },
    stripe: {
      secretKey: e.STRIPE_SECRET_KEY,
      webhookSecret: e.STRIPE_WEBHOOK_SECRET,
      apiUrl: e.STRIPE_API_URL,
      holdWindowDays: e.CARD_HOLD_WINDOW_DAYS,
    },
    mail: { smtpUrl: e.SMTP_URL, from: e.MAIL_FROM },
    uploadMaxBytes: e.UPLOAD_MAX_BYTES,
    isWorkerInProcess: e.WORKER_IN_PROCESS,
    heavyWork: { threads: e.HEAVY_WORK_THREADS, timeLimitMs: e.HEAVY_JOB_TIME_LIMIT_MS },
    rateLimits: {
      windowSeconds: e.RATE_LIMIT_WINDOW_SECONDS,
      signIn: e.RATE_LIMIT_SIGN_IN,
      quotePreviews: e.RATE_LIMIT_QUOTE_PREVIEWS,
      uploads: e.RATE_LIMIT_UPLOADS,
      orders: e.RATE_LIMIT_ORDERS,
      proofAnswers: e.RATE_LIMIT_PROOF_ANSWERS,
    },
    visitorDataRetentionDays: e.VISITOR_DATA_RETENTION_DAYS,
    catalogueRecheckMs: e.CATALOGUE_RECHECK_MS,
  });
}
