import type { Db } from '../../db/knex.ts';
import { pingDatabase } from './health-repo.ts';

export interface Readiness {
  ready: boolean;
  database: 'reachable' | 'unreachable';
  message: string;
}

/** Readiness for a proxy or an orchestrator: the process is up (liveness is /api/health) and can reach MariaDB. */
export function createHealthService(deps: { db: Db; isDraining: () => boolean }) {
  return {
    async readiness(): Promise<Readiness> {
      const reachable = await pingDatabase(deps.db, 2_000);
      const database = reachable ? 'reachable' : 'unreachable';
      if (deps.isDraining()) return { ready: false, database, message: 'This server is shutting down.' };
      return reachable
        ? { ready: true, database, message: 'Ready.' }
        : { ready: false, database, message: 'This server cannot reach its database.' };
    },
  };
}

export type HealthService = ReturnType<typeof createHealthService>;
