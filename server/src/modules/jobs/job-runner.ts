import { hostname } from 'node:os';
import { randomUUID } from 'node:crypto';
import type { Db } from '../../db/knex.ts';
import {
  claimDueJobs,
  claimJob,
  insertJob,
  markJobAttemptFailed,
  markJobDone,
  releaseJob,
  takeLease,
  type ClaimedJob,
  type NewJob,
} from './job-repo.ts';

/** Does one job's work; throws to have it tried again later (or failed, after its last attempt). */
export type JobHandler = (job: ClaimedJob) => Promise<void>;

export interface ScheduledTask {
  /** Names the lease: one instance runs the task per period, whichever takes the lease first. */
  name: string;
  periodMs: number;
  run(now: Date): Promise<void>;
}

export interface JobDeps {
  db: Db;
  now: () => Date;
  log: (line: string) => void;
}

/** How long a claim lasts before another worker may take the job over (its worker is taken to have stopped). */
const LEASE_MS = 5 * 60_000;

/** Waits 30 s, 2 min, 8 min, 32 min, then an hour between attempts (common practice, no source). */
export function retryDelayMs(attempt: number): number {
  return Math.min(30_000 * 4 ** (attempt - 1), 3_600_000);
}

export const newWorkerId = () => `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;

/** Writes a job due now (or at `runAfter`); pass the change's transaction as `db`. */
export function enqueueJob(db: Db, job: Omit<NewJob, 'runAfter'> & { runAfter?: Date }, now: Date): Promise<number> {
  return insertJob(db, { ...job, runAfter: job.runAfter ?? now }, now);
}

async function runClaimed(
  deps: JobDeps,
  workerId: string,
  job: ClaimedJob,
  handler: JobHandler | undefined,
): Promise<boolean> {
  try {
    if (!handler) throw new Error(`No worker knows jobs of kind "${job.kind}".`);
    await handler(job);
    await markJobDone(deps.db, job.id, workerId, deps.now());
    return true;
  } catch (error) {
    const now = deps.now();
    const message = String((error as Error)?.message ?? error).slice(0, 2000);
    const isLast = job.attempt >= job.maxAttempts;
    const runAfter = isLast ? null : new Date(now.getTime() + retryDelayMs(job.attempt));
    await markJobAttemptFailed(deps.db, job.id, { workerId, error: message, now, runAfter });
    deps.log(`job ${job.id} (${job.kind}) attempt ${job.attempt}/${job.maxAttempts} failed: ${message}`);
    return false;
  }
}

/** Tries one job at once, if no worker has it: the request that wrote it uses this, the worker retries. */
export async function runJobNow(deps: JobDeps, id: number, handler: JobHandler): Promise<boolean> {
  const workerId = newWorkerId();
  const job = await claimJob(deps.db, id, { workerId, now: deps.now(), leaseMs: LEASE_MS });
  return job ? runClaimed(deps, workerId, job, handler) : false;
}

/**
 * A worker: claims due jobs in small batches and runs them one by one, and runs each scheduled task when it wins
 * that task's lease. `stop()` lets the job in hand finish and hands back the claims it has not started.
 */
export function createJobRunner(
  deps: JobDeps & { handlers: Record<string, JobHandler>; schedules?: ScheduledTask[]; workerId?: string },
) {
  const workerId = deps.workerId ?? newWorkerId();
  let stopping = false;
  let loop: Promise<void> | undefined;
  let wake: (() => void) | undefined;

  /** Runs every job due now; answers how many it ran. */
  async function runDue(batch = 10): Promise<number> {
    let ran = 0;
    for (;;) {
      const claimed = await claimDueJobs(deps.db, { workerId, limit: batch, now: deps.now(), leaseMs: LEASE_MS });
      if (!claimed.length) return ran;
      for (const [index, job] of claimed.entries()) {
        if (stopping) {
          for (const left of claimed.slice(index)) await releaseJob(deps.db, left.id, workerId);
          return ran;
        }
        await runClaimed(deps, workerId, job, deps.handlers[job.kind]);
        ran += 1;
      }
    }
  }

  /** Runs the scheduled tasks whose lease this worker wins now. */
  async function runSchedules(): Promise<string[]> {
    const ran: string[] = [];
    for (const task of deps.schedules ?? []) {
      const now = deps.now();
      if (!(await takeLease(deps.db, { name: task.name, holder: workerId, now, periodMs: task.periodMs }))) continue;
      try {
        await task.run(now);
        ran.push(task.name);
      } catch (error) {
        deps.log(`scheduled task ${task.name} failed: ${(error as Error)?.stack ?? error}`);
      }
    }
    return ran;
  }

  return {
    workerId,
    runDue,
    runSchedules,
    /** Polls every `pollMs` until stopped; a failure of the database is logged and tried again next round. */
    start(pollMs = 1_000) {
      loop ??= (async () => {
        while (!stopping) {
          try {
            await runSchedules();
            await runDue();
          } catch (error) {
            deps.log(`worker ${workerId}: ${(error as Error)?.message ?? error}`);
          }
          await new Promise<void>((resolve) => {
            wake = resolve;
            setTimeout(resolve, pollMs).unref();
          });
        }
      })();
    },
    async stop() {
      stopping = true;
      wake?.();
      await loop;
    },
  };
}

export type JobRunner = ReturnType<typeof createJobRunner>;
