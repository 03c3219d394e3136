import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { outboxPageSize, type OutboxQuery } from '../../contracts/admin-outbox.ts';
import { failure, ok } from '../../contracts/result.ts';
import { enqueueJob, runJobNow } from '../jobs/job-runner.ts';
import { SEND_MAIL_JOB, sendMailJobHandler } from './order-mail.ts';
import { readOutboxMessage, readOutboxPage, requeueFailedMail } from './outbox-repo.ts';

/** Every e-mail the server sent or tried to send, page by page, for the whole studio team, and sending one again. */
export function createOutboxService(deps: { db: Db; mailer: Mailer; now: () => Date }) {
  async function message(id: number) {
    const found = await readOutboxMessage(deps.db, id);
    return found ? ok({ message: found }) : failure('not-found', `There is no message ${id} in the outbox.`);
  }
  return {
    async page(query: OutboxQuery) {
      const { messages, total } = await readOutboxPage(deps.db, query, outboxPageSize);
      return { messages, total, page: query.page, pageSize: outboxPageSize };
    },
    message,
    /** Sends a failed message again from its first attempt (retried by the worker if this one fails too). */
    async resend(id: number) {
      const now = deps.now();
      const jobId = await deps.db.transaction(async (trx) => {
        if (!(await requeueFailedMail(trx, id, now))) return undefined;
        return enqueueJob(trx, { kind: SEND_MAIL_JOB, payload: { mailId: id } }, now);
      });
      if (jobId === undefined) {
        const current = await readOutboxMessage(deps.db, id);
        if (!current) return failure('not-found', `There is no message ${id} in the outbox.`);
        return failure('conflict', 'Only a message that failed can be sent again; this one is not marked failed.');
      }
      await runJobNow({ ...deps, log: () => {} }, jobId, sendMailJobHandler(deps));
      return message(id);
    },
  };
}

export type OutboxService = ReturnType<typeof createOutboxService>;
