/**
 * The server's log: one timestamped line per event on standard error. Lines are gathered and written by
 * sonic-boom without blocking, so a busy server does not stop for a write per request (a synchronous write to a
 * pipe or file was a twentieth of a price check's time); `flushSync` writes whatever is still held, on the way out.
 */
import sonicBoom from 'sonic-boom';

// A CommonJS package whose class is also a property of its export (Node finds no named export in it).
const { SonicBoom } = sonicBoom;

export interface LogWriter {
  log: (line: string) => void;
  flushSync: () => void;
}

/** The process's own log on standard error, written out when the process ends, whichever way it ends. */
export function openProcessLog(): LogWriter['log'] {
  const writer = createLogWriter();
  process.on('exit', writer.flushSync);
  return writer.log;
}

export function createLogWriter(fd = 2, now: () => Date = () => new Date()): LogWriter {
  const stream = new SonicBoom({ fd, sync: false });
  return {
    log: (line) => {
      stream.write(`${now().toISOString()} ${line}\n`);
    },
    flushSync: () => {
      try {
        stream.flushSync();
      } catch {
        // Nothing was held, or standard error has gone: nothing more can be written.
      }
    },
  };
}
