import type { Db } from '../../db/knex.ts';
import { readCatalogueVersion } from './catalogue-version-repo.ts';

/** The catalogue's change count as this server last read it. */
export interface CatalogueVersionWatch {
  /**
   * The count. With no re-check window: from a read that started after this call (requests arriving while a read
   * runs share the next one, so a burst costs at most two queries, and a write committed before a request is always
   * seen). With a window of N ms: a read that started less than N ms ago is shared too, so a server saturated with
   * quotes asks the database at most once per window, and a write made through another server is seen within N ms.
   */
  current(): Promise<number>;
  /** Forgets the last read: this server has just changed the catalogue, so its next request must read again. */
  markStale(): void;
}

const ignore = () => undefined;

export const createCatalogueVersionWatch = (db: Db, recheckMs = 0): CatalogueVersionWatch =>
  watchVersion(() => readCatalogueVersion(db), { recheckMs });

/** A watch over any read of a change count (the database's, or a test's). */
export function watchVersion(
  read: () => Promise<number>,
  options: { recheckMs?: number; now?: () => number } = {},
): CatalogueVersionWatch {
  const { recheckMs = 0, now = Date.now } = options;
  let running: Promise<number> | undefined;
  let queued: Promise<number> | undefined;
  let recent: { startedAt: number; value: Promise<number> } | undefined;
  function start(): Promise<number> {
    const value = read().finally(() => {
      if (running === value) running = undefined;
    });
    running = value;
    const entry = { startedAt: now(), value };
    recent = entry;
    value.catch(() => {
      if (recent === entry) recent = undefined;
    });
    return value;
  }
  function current(): Promise<number> {
    if (recent && recheckMs > 0 && now() - recent.startedAt < recheckMs) return recent.value;
    if (!running) return start();
    queued ??= running.then(ignore, ignore).then(() => {
      queued = undefined;
      return current();
    });
    return queued;
  }
  // A read already running may have started before the change committed: later requests queue for the next one.
  function markStale(): void {
    recent = undefined;
  }
  return { current, markStale };
}

/**
 * Data read from the catalogue once and kept while the catalogue's change count stays the same, so every server
 * instance sharing the database replaces it on the first request after a studio edit. A failed read is not kept.
 */
export function keptWhileCatalogueUnchanged<T>(watch: CatalogueVersionWatch, read: () => Promise<T>): () => Promise<T> {
  let kept: { version: number; value: Promise<T> } | undefined;
  return async () => {
    const version = await watch.current();
    if (kept?.version !== version) {
      const value = read();
      const entry = { version, value };
      kept = entry;
      value.catch(() => {
        if (kept === entry) kept = undefined;
      });
    }
    return kept.value;
  };
}
