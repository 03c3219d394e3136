/**
 * The studio's catalogue writes, turned into Results with messages a person can act on. Rows are retired (hidden
 * from customers) rather than deleted: designs name motifs, fonts, threads and hoops by slug or code inside their
 * documents, where no foreign key guards them, and orders must keep showing what was made. Only a garment's sizes
 * and colours may be deleted, and only while no design or order points at them (the database's RESTRICT keys).
 */
import type { Db } from '../../db/knex.ts';
import {
  deleteCatalogueRow,
  readRowIsActive,
  insertCatalogueRow,
  updateCatalogueRow,
  type CatalogueTable,
  type RowWrite,
} from './catalogue-row-repo.ts';
import type { CatalogueRowRef } from '../../contracts/admin-catalogue-common.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';

/** How a kind of row is named in messages, and which field its unique key is. */
export interface RowWording {
  /** "hoop", "thread", "garment size" */
  noun: string;
  /** The request field whose value must be unique ("slug", "code", "name"). */
  uniqueField: string;
  /** Said when that value is taken, e.g. "Another hoop already uses this short name". */
  duplicateMessage: string;
}

function toResult(write: RowWrite, wording: RowWording, isActive: boolean): Result<CatalogueRowRef> {
  switch (write.outcome) {
    case 'written':
      return ok({ id: write.id, isActive });
    case 'missing':
      return failure('not-found', `There is no such ${wording.noun}.`);
    case 'duplicate':
      return failure('conflict', `${wording.duplicateMessage}.`, { [wording.uniqueField]: wording.duplicateMessage });
    case 'in-use':
      return failure('conflict', `This ${wording.noun} is used by saved designs or orders, so it is kept.`);
  }
}

export async function createCatalogueRow(
  db: Db,
  table: CatalogueTable,
  row: Record<string, unknown>,
  wording: RowWording,
): Promise<Result<CatalogueRowRef>> {
  return toResult(await insertCatalogueRow(db, table, row), wording, row.is_active !== false);
}

export async function editCatalogueRow(
  db: Db,
  table: CatalogueTable,
  where: Record<string, unknown> & { id: number },
  row: Record<string, unknown>,
  wording: RowWording,
): Promise<Result<CatalogueRowRef>> {
  const write = await updateCatalogueRow(db, table, where, row);
  return toResult(
    write,
    wording,
    write.outcome === 'written' && table !== 'garment_sizes' && table !== 'fabric_colours'
      ? await readRowIsActive(db, table, where.id)
      : true,
  );
}

/** Retires (hides from customers) or brings back a row; what already uses it keeps working either way. */
export async function setCatalogueRowActive(
  db: Db,
  table: CatalogueTable,
  id: number,
  isActive: boolean,
  wording: RowWording,
): Promise<Result<CatalogueRowRef>> {
  return toResult(await updateCatalogueRow(db, table, { id }, { is_active: isActive }), wording, isActive);
}

export async function removeCatalogueRow(
  db: Db,
  table: CatalogueTable,
  where: Record<string, unknown> & { id: number },
  wording: RowWording,
): Promise<Result<CatalogueRowRef>> {
  return toResult(await deleteCatalogueRow(db, table, where), wording, false);
}

/** How one kind of plain catalogue row (hoop, thread, font) is written from its requests. */
export interface PlainRowKind<C, U> {
  table: CatalogueTable;
  wording: RowWording;
  /** The columns a new row gets, its slug or code among them, or why the request cannot become a row. */
  newRow: (request: C) => Result<Record<string, unknown>>;
  /** The columns an edit writes; the row's slug or code is not among them, as designs refer to it. */
  editedRow: (request: U) => Record<string, unknown>;
}

/** Create, edit, retire and bring back one kind of plain catalogue row. */
export function createPlainRowService<C, U>(db: Db, kind: PlainRowKind<C, U>) {
  return {
    async create(request: C): Promise<Result<CatalogueRowRef>> {
      const row = kind.newRow(request);
      return row.ok ? createCatalogueRow(db, kind.table, row.value, kind.wording) : row;
    },
    update: (id: number, request: U) => editCatalogueRow(db, kind.table, { id }, kind.editedRow(request), kind.wording),
    setActive: (id: number, isActive: boolean) => setCatalogueRowActive(db, kind.table, id, isActive, kind.wording),
  };
}
