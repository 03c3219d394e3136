/**
 * The heavy-work pool: CPU-bound jobs (sanitizing and decoding uploads, measuring SVG artwork, drawing proofs,
 * building PDFs) run in worker threads (piscina), so one slow request never stalls the others. Each job has a
 * time limit; a job past it is stopped (its thread is replaced) and answered with a sentence, never a frozen
 * process. The jobs themselves are in `server/src/workers/heavy-tasks.ts`, loaded in each thread through a small
 * entry that registers tsx, as the server runs TypeScript without a build.
 */
import { Piscina } from 'piscina';
import { failure, type Result } from '../contracts/result.ts';

/** The jobs the pool runs, by name (the task file exports one function per name). */
export type HeavyTaskName = 'inspectUpload' | 'inspectArtwork' | 'estimateSvg' | 'renderProof' | 'productionSheetPdf';

export interface HeavyWork {
  /**
   * Runs a job in a thread: its own `Result`, or a `busy` failure when it ran past the time limit or the queue
   * is full. `T` is what the named task answers; values cross threads by structured clone (a Buffer arrives as
   * a Uint8Array: see `asBuffer`).
   */
  run<T>(task: HeavyTaskName, input: unknown): Promise<Result<T>>;
  /** Settles once the threads have loaded their code; jobs wait for it before their time limit starts. */
  ready: Promise<void>;
  close(): Promise<void>;
}

export interface HeavyWorkSettings {
  threads: number;
  timeLimitMs: number;
}

const ENTRY = new URL('../workers/heavy-tasks-entry.mjs', import.meta.url).href;
/** Jobs waiting beyond this many per thread are refused at once rather than left to time out. */
const QUEUED_PER_THREAD = 64;

export function createHeavyWork(settings: HeavyWorkSettings): HeavyWork {
  const pool = new Piscina({
    filename: ENTRY,
    minThreads: settings.threads,
    maxThreads: settings.threads,
    maxQueue: settings.threads * QUEUED_PER_THREAD,
    // Threads keep what they loaded (jsdom, jimp, fonts) between jobs.
    idleTimeout: 60_000,
    // The request thread comes first when cores are short: heavy jobs run at a lower priority (Linux nice, per
    // thread, through piscina's optional @napi-rs/nice; where that is missing they run at normal priority).
    niceIncrement: 10,
    // The young heap the API server gets from --max-semi-space-size=64 (V8 sizes the young generation at three
    // semi-spaces): measuring a large SVG allocates a point or a segment at a time, and in the default 16 MB the
    // collector copied the live ones again and again, so 10 × the segments cost 20 × the time (bench:engine).
    resourceLimits: { maxYoungGenerationSizeMb: 192 },
  });
  // Each thread loads tsx, jsdom, jimp, resvg and pdfkit before its first job (seconds on a busy machine): the
  // first job waits for that without it counting against the job's time limit.
  const warmedUp = pool.run(null, { name: 'warmUp' }).then(
    () => undefined,
    () => undefined,
  );
  const seconds = settings.timeLimitMs / 1000;
  const tooLong = `This took longer than the ${seconds.toLocaleString('en-GB')} s we allow for one file, so it was stopped; try a smaller or simpler file.`;
  const tooBusy = 'We are preparing too many files at once right now; please try again in a minute.';

  return {
    async run<T>(task: HeavyTaskName, input: unknown): Promise<Result<T>> {
      await warmedUp;
      try {
        return (await pool.run(input, { name: task, signal: AbortSignal.timeout(settings.timeLimitMs) })) as Result<T>;
      } catch (error) {
        const name = (error as Error)?.name;
        if (name === 'AbortError' || name === 'TimeoutError') return failure('busy', tooLong);
        if (/queue is at limit/i.test((error as Error)?.message ?? '')) return failure('busy', tooBusy);
        throw error;
      }
    },
    ready: warmedUp,
    close: () => pool.close({ force: true }),
  };
}

/** A Buffer again, from the Uint8Array a Buffer becomes when it crosses threads. */
export function asBuffer(bytes: Uint8Array): Buffer {
  return Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}
