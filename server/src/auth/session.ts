import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import { Router, type Request, type RequestHandler } from 'express';
import type { AppConfig } from '../config.ts';

export interface SessionLayer {
  middleware: RequestHandler;
  close(): Promise<void>;
}

const dayMs = 86_400_000;
const SESSION_COOKIE = 'hw.sid';
/** Whether a Cookie header carries the session cookie. */
const sessionCookiePattern = /(?:^|;\s*)hw\.sid=/;

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
    name: SESSION_COOKIE,
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

/**
 * Runs the session layers (the session, then passport's user) except for a visitor without a session cookie on a
 * route that never writes the session: such a request has no session to read and leaves none behind, so it skips
 * the session store and the work of making an empty session.
 */
export function sessionWhereNeeded(isSessionFree: (req: Request) => boolean, layers: RequestHandler[]): RequestHandler {
  const withSession = Router().use(...layers);
  return (req, res, next) => {
    if (isSessionFree(req) && !sessionCookiePattern.test(req.headers.cookie ?? '')) return next();
    return withSession(req, res, next);
  };
}
