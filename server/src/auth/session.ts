import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { RequestHandler } from 'express';
import type { AppConfig } from '../config.ts';

export interface SessionLayer {
  middleware: RequestHandler;
  close(): Promise<void>;
}

const dayMs = 86_400_000;

/** How long a session lasts after its last request (the cookie rolls); the store expires rows after that. */
export const SESSION_LIFETIME_MS = 14 * dayMs;

/**
 * Sessions live in MariaDB (the `sessions` table from the migrations), so they survive a server restart. The store
 * keeps its own small pool, which it ends on close.
 */
export async function createSessionLayer(config: AppConfig): Promise<SessionLayer> {
  const MySQLStore = MySQLStoreFactory(session as never);
  const store = new MySQLStore({
    host: config.database.host,
    port: config.database.port,
    user: config.database.user,
    password: config.database.password,
    database: config.database.database,
    createDatabaseTable: false,
    expiration: SESSION_LIFETIME_MS,
    // Expired sessions are swept by the job worker's scheduled task, once per period across all instances.
    clearExpired: false,
    endConnectionOnClose: true,
    connectionLimit: 3,
  } as never);
  await store.onReady();
  const middleware = session({
    name: 'hw.sid',
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: config.isBehindProxy,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.isCookieSecure,
      maxAge: SESSION_LIFETIME_MS,
      path: '/',
    },
  });
  return { middleware, close: () => store.close() };
}
