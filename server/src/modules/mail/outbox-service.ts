import type { Db } from '../../db/knex.ts';
import { outboxPageSize, type OutboxQuery } from '../../contracts/admin-outbox.ts';
import { failure, ok } from '../../contracts/result.ts';
import { readOutboxMessage, readOutboxPage } from './outbox-repo.ts';

/** Every e-mail the server sent or tried to send, page by page, for the whole studio team. */
export function createOutboxService(deps: { db: Db }) {
  return {
    async page(query: OutboxQuery) {
      const { messages, total } = await readOutboxPage(deps.db, query, outboxPageSize);
      return { messages, total, page: query.page, pageSize: outboxPageSize };
    },
    async message(id: number) {
      const message = await readOutboxMessage(deps.db, id);
      return message ? ok({ message }) : failure('not-found', `There is no message ${id} in the outbox.`);
    },
  };
}

export type OutboxService = ReturnType<typeof createOutboxService>;
