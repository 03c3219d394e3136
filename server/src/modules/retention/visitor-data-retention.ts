import type { Db } from '../../db/knex.ts';
import { SESSION_LIFETIME_MS } from '../../auth/session.ts';
import { deleteUnclaimedVisitorData, type VisitorDataSwept } from './visitor-data-repo.ts';

const dayMs = 86_400_000;

export interface VisitorDataRetentionDeps {
  db: Db;
  now: () => Date;
  retentionDays: number;
  log: (line: string) => void;
}

/**
 * Keeps visitors' data only as long as the shop says: sessions, uploads and stored quotes that no account claimed
 * are deleted once they are `retentionDays` old. `sweep` runs once; `start` sweeps at once and then daily until
 * `stop`. The job worker runs `sweepAndReport` as a daily scheduled task, once across all instances.
 */
export function createVisitorDataRetention(deps: VisitorDataRetentionDeps) {
  let timer: NodeJS.Timeout | undefined;

  async function sweep(): Promise<VisitorDataSwept> {
    const now = deps.now();
    const cutoff = new Date(now.getTime() - deps.retentionDays * dayMs);
    return deleteUnclaimedVisitorData(deps.db, cutoff, now, SESSION_LIFETIME_MS);
  }

  async function sweepAndReport(): Promise<void> {
    try {
      const swept = await sweep();
      deps.log(
        `Visitor data older than ${deps.retentionDays} days removed: ${swept.sessions} sessions, ${swept.uploads} uploads, ${swept.quotes} quotes.`,
      );
    } catch (error) {
      // The next day's sweep tries again; the server keeps serving meanwhile.
      deps.log(`Visitor data sweep failed: ${(error as Error).stack ?? error}`);
    }
  }

  function start(): Promise<void> {
    timer = setInterval(() => void sweepAndReport(), dayMs);
    timer.unref();
    return sweepAndReport();
  }

  function stop(): void {
    clearInterval(timer);
  }

  return { sweep, sweepAndReport, start, stop };
}
