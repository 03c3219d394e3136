import type { Db } from '../../db/knex.ts';

export interface ClaimedJob {
  id: number;
  kind: string;
  payload: unknown;
  /** This attempt's number, from 1. */
  attempt: number;
  maxAttempts: number;
}

export interface NewJob {
  kind: string;
  payload: unknown;
  runAfter: Date;
  maxAttempts?: number;
}

const toClaimed = (row: Record<string, any>): ClaimedJob => ({
  id: Number(row.id),
  kind: row.kind,
  payload: typeof row.payload === 'string' ? JSON.parse(row.payload) : row.payload,
  attempt: row.attempts,
  maxAttempts: row.max_attempts,
});

/** Writes a job; pass the transaction of the change that causes it, so both happen or neither. */
export async function insertJob(db: Db, job: NewJob, now: Date): Promise<number> {
  const [id] = await db('jobs').insert({
    kind: job.kind,
    payload: JSON.stringify(job.payload),
    status: 'queued',
    max_attempts: job.maxAttempts ?? 5,
    run_after: job.runAfter,
    created_at: now,
    updated_at: now,
  });
  return Number(id);
}

/**
 * Claims up to `limit` due jobs for one worker: queued ones whose time has come, and running ones whose claim ran
 * out (their worker stopped). Rows another worker is claiming at the same moment are skipped, not waited for.
 */
export async function claimDueJobs(
  db: Db,
  claim: { workerId: string; limit: number; now: Date; leaseMs: number },
): Promise<ClaimedJob[]> {
  return db.transaction(async (trx) => {
    const [rows] = await trx.raw(
      `SELECT id FROM jobs
        WHERE (status = 'queued' AND run_after <= ?) OR (status = 'running' AND claimed_until < ?)
        ORDER BY id LIMIT ? FOR UPDATE SKIP LOCKED`,
      [claim.now, claim.now, claim.limit],
    );
    const ids = (rows as { id: number }[]).map((row) => row.id);
    if (!ids.length) return [];
    await trx('jobs')
      .whereIn('id', ids)
      .update({
        status: 'running',
        claimed_by: claim.workerId,
        claimed_until: new Date(claim.now.getTime() + claim.leaseMs),
        attempts: trx.raw('attempts + 1'),
        updated_at: claim.now,
      });
    return (await trx('jobs').whereIn('id', ids).orderBy('id')).map(toClaimed);
  });
}

/** Claims one job by id if it is queued and due (the request that wrote it tries it at once). */
export async function claimJob(
  db: Db,
  id: number,
  claim: { workerId: string; now: Date; leaseMs: number },
): Promise<ClaimedJob | undefined> {
  const changed = await db('jobs')
    .where({ id, status: 'queued' })
    .where('run_after', '<=', claim.now)
    .update({
      status: 'running',
      claimed_by: claim.workerId,
      claimed_until: new Date(claim.now.getTime() + claim.leaseMs),
      attempts: db.raw('attempts + 1'),
      updated_at: claim.now,
    });
  if (changed !== 1) return undefined;
  return toClaimed(await db('jobs').where({ id }).first());
}

export async function markJobDone(db: Db, id: number, workerId: string, now: Date): Promise<void> {
  await db('jobs')
    .where({ id, claimed_by: workerId })
    .update({ status: 'done', claimed_until: null, last_error: null, finished_at: now, updated_at: now });
}

/** Puts a failed attempt back in the queue for `runAfter`, or marks the job failed when it was the last. */
export async function markJobAttemptFailed(
  db: Db,
  id: number,
  outcome: { workerId: string; error: string; now: Date; runAfter: Date | null },
): Promise<void> {
  await db('jobs')
    .where({ id, claimed_by: outcome.workerId })
    .update(
      outcome.runAfter
        ? { status: 'queued', run_after: outcome.runAfter, claimed_until: null, last_error: outcome.error }
        : { status: 'failed', claimed_until: null, last_error: outcome.error, finished_at: outcome.now },
    );
}

/** Gives back a claim not yet worked on (a worker shutting down), without counting it as an attempt. */
export async function releaseJob(db: Db, id: number, workerId: string): Promise<void> {
  await db('jobs')
    .where({ id, claimed_by: workerId, status: 'running' })
    .update({ status: 'queued', claimed_by: null, claimed_until: null, attempts: db.raw('GREATEST(attempts - 1, 0)') });
}

/**
 * Takes the lease of a scheduled task for one period if nobody holds it: one row per task, and one UPDATE that only
 * one instance can win. Answers whether this holder may run the task now.
 */
export async function takeLease(
  db: Db,
  lease: { name: string; holder: string; now: Date; periodMs: number },
): Promise<boolean> {
  await db.raw('INSERT IGNORE INTO job_leases (name, holder, lease_until) VALUES (?, ?, ?)', [
    lease.name,
    '',
    new Date(0),
  ]);
  const changed = await db('job_leases')
    .where({ name: lease.name })
    .where('lease_until', '<=', lease.now)
    .update({
      holder: lease.holder,
      lease_until: new Date(lease.now.getTime() + lease.periodMs),
      last_run_at: lease.now,
    });
  return changed === 1;
}
