import { describe, expect, it } from 'vitest';
import { keptWhileCatalogueUnchanged, watchVersion } from '../../../server/src/modules/catalogue/catalogue-version.ts';

/** A change count read that the test answers by hand, so it can see which reads run and when. */
function controlledReads() {
  const pending: ((version: number) => void)[] = [];
  return {
    read: () => new Promise<number>((resolve) => pending.push(resolve)),
    pending,
    answer: (version: number) => pending.shift()!(version),
  };
}

describe('the catalogue version watch', () => {
  it('when requests arrive while a read runs, then they share one read that starts after that one ends', async () => {
    const reads = controlledReads();
    const watch = watchVersion(reads.read);
    const first = watch.current();
    const later = [watch.current(), watch.current(), watch.current()];
    expect(reads.pending).toHaveLength(1);
    reads.answer(4);
    expect(await first).toBe(4);
    await Promise.resolve();
    // The requests that came during the first read must not take its answer: a write may have landed meanwhile.
    expect(reads.pending).toHaveLength(1);
    reads.answer(5);
    expect(await Promise.all(later)).toEqual([5, 5, 5]);
  });

  it('when the read fails, then the next request reads again', async () => {
    let calls = 0;
    const watch = watchVersion(async () => {
      calls += 1;
      if (calls === 1) throw new Error('connection lost');
      return 7;
    });
    await expect(watch.current()).rejects.toThrow('connection lost');
    expect(await watch.current()).toBe(7);
  });
});

describe('the version watch with a re-check window', () => {
  it('when requests come within the window, then they share one read; after it, or once marked stale, they read again', async () => {
    let clock = 1_000;
    let reads = 0;
    const watch = watchVersion(async () => ++reads, { recheckMs: 500, now: () => clock });
    expect(await watch.current()).toBe(1);
    clock += 499;
    expect(await Promise.all([watch.current(), watch.current()])).toEqual([1, 1]);
    clock += 1;
    expect(await watch.current()).toBe(2);
    watch.markStale();
    expect(await watch.current()).toBe(3);
    expect(reads).toBe(3);
  });

  it('when this server changes the catalogue while a read runs, then later requests wait for a read after it', async () => {
    const reads = controlledReads();
    const watch = watchVersion(reads.read, { recheckMs: 500, now: () => 0 });
    const during = watch.current();
    watch.markStale();
    const after = watch.current();
    reads.answer(8);
    expect(await during).toBe(8);
    await Promise.resolve();
    await Promise.resolve();
    expect(reads.pending).toHaveLength(1);
    reads.answer(9);
    expect(await after).toBe(9);
  });
});

describe('data kept while the catalogue is unchanged', () => {
  it('when the count stays, then the data is read once; when it moves, then it is read again', async () => {
    let version = 1;
    let loads = 0;
    const kept = keptWhileCatalogueUnchanged(
      watchVersion(async () => version),
      async () => `catalogue ${++loads}`,
    );
    expect(await kept()).toBe('catalogue 1');
    expect(await kept()).toBe('catalogue 1');
    version = 2;
    expect(await kept()).toBe('catalogue 2');
    expect(loads).toBe(2);
  });

  it('when reading the data fails, then it is not kept', async () => {
    let loads = 0;
    const kept = keptWhileCatalogueUnchanged(
      watchVersion(async () => 1),
      async () => {
        loads += 1;
        if (loads === 1) throw new Error('timeout');
        return 'catalogue';
      },
    );
    await expect(kept()).rejects.toThrow('timeout');
    expect(await kept()).toBe('catalogue');
  });
});
