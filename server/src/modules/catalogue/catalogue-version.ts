import type { Db } from '../../db/knex.ts';
import { readCatalogueVersion } from './catalogue-version-repo.ts';

/** The catalogue's change count as this server last read it. */
export interface CatalogueVersionWatch {
  /**
   * The count, from a read that started after this call: requests arriving while a read runs share the next one,
   * so a burst of requests costs at most two queries, and a write committed before a request is always seen.
   */
  current(): Promise<number>;
}

const ignore = () => undefined;

export const createCatalogueVersionWatch = (db: Db): CatalogueVersionWatch =>
  watchVersion(() => readCatalogueVersion(db));

/** A watch over any read of a change count (the database's, or a test's). */
export function watchVersion(read: () => Promise<number>): CatalogueVersionWatch {
  let running: Promise<number> | undefined;
  let queued: Promise<number> | undefined;
  function current(): Promise<number> {
    if (!running) {
      running = read().finally(() => {
        running = undefined;
      });
      return running;
    }
    queued ??= running.then(ignore, ignore).then(() => {
      queued = undefined;
      return current();
    });
    return queued;
  }
  return { current };
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
