import type { Knex } from 'knex';
import { loadDatabaseConfig } from './server/src/config.ts';
import { knexSettings } from './server/src/db/knex.ts';

// One environment: the database is chosen by DATABASE_URL or DB_* variables (see README), never by NODE_ENV.
const config: Knex.Config = knexSettings(loadDatabaseConfig());
export default config;
