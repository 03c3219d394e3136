import knex, { type Knex } from 'knex';
import { fileURLToPath } from 'node:url';
import type { DatabaseConfig } from '../config.ts';

const projectRoot = fileURLToPath(new URL('../../../', import.meta.url));

/** Knex settings for mysql2; migrations and seeds are TypeScript files loaded through tsx. */
export function knexSettings(db: DatabaseConfig): Knex.Config {
  return {
    client: 'mysql2',
    connection: {
      host: db.host,
      port: db.port,
      user: db.user,
      password: db.password,
      database: db.database,
      charset: 'utf8mb4',
      // DATETIME columns hold UTC; mysql2 reads and writes them as UTC too.
      timezone: 'Z',
      supportBigNumbers: true,
    },
    pool: {
      min: 0,
      max: db.poolMax,
      // Column defaults (CURRENT_TIMESTAMP) must agree with the UTC values the app writes, whatever the server's zone.
      afterCreate(
        connection: { query(sql: string, done: (error: Error | null) => void): void },
        done: (error: Error | null, connection: unknown) => void,
      ) {
        connection.query("SET time_zone = '+00:00'", (error) => done(error, connection));
      },
    },
    migrations: { directory: `${projectRoot}migrations`, extension: 'ts', loadExtensions: ['.ts'] },
    seeds: { directory: `${projectRoot}seeds`, extension: 'ts', loadExtensions: ['.ts'] },
  };
}

export type Db = Knex;

export function openDatabase(db: DatabaseConfig): Db {
  return knex(knexSettings(db));
}
