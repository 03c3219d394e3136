import type { Db } from '../../db/knex.ts';
import type { CreateThreadRequest, UpdateThreadRequest } from '../../contracts/admin-catalogue-threads.ts';
import { ok } from '../../contracts/result.ts';
import { hexToLab } from '../../engine/index.ts';
import { createPlainRowService } from './catalogue-rows.ts';

/** The row to store; CIELAB is worked out from the hex colour (culori, D65) unless the studio measured its own. */
function editedRow(thread: UpdateThreadRequest) {
  // The contract only lets a #RRGGBB hex through, which always converts.
  const lab = thread.lab ?? hexToLab(thread.hex)!;
  return {
    name: thread.name,
    hex: thread.hex,
    lab_l: lab.l.toFixed(4),
    lab_a: lab.a.toFixed(4),
    lab_b: lab.b.toFixed(4),
    ...(thread.sortOrder === undefined ? {} : { sort_order: thread.sortOrder }),
  };
}

/** The thread palette customers choose colours from and motifs name by code. */
export function createThreadService(deps: { db: Db }) {
  return createPlainRowService<CreateThreadRequest, UpdateThreadRequest>(deps.db, {
    table: 'threads',
    wording: { noun: 'thread', uniqueField: 'code', duplicateMessage: 'Another thread already has this code' },
    newRow: (thread) => ok({ code: thread.code, ...editedRow(thread) }),
    editedRow,
  });
}
export type ThreadService = ReturnType<typeof createThreadService>;
