import { mkdtempSync, openSync, readFileSync, closeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { createLogWriter } from '../../../server/src/integrations/log-writer.ts';

describe('the server log', () => {
  it('writes every line, timestamped, in order, once flushed', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'hw-log-')), 'server.log');
    const fd = openSync(file, 'a');
    const writer = createLogWriter(fd, () => new Date('2026-12-03T10:00:00.000Z'));
    for (let i = 1; i <= 500; i += 1) writer.log(`[r${i}] POST /api/quotes/preview 200 1.0ms`);
    writer.flushSync();
    closeSync(fd);
    const lines = readFileSync(file, 'utf8').trimEnd().split('\n');
    expect(lines).toHaveLength(500);
    expect(lines[0]).toBe('2026-12-03T10:00:00.000Z [r1] POST /api/quotes/preview 200 1.0ms');
    expect(lines[499]).toBe('2026-12-03T10:00:00.000Z [r500] POST /api/quotes/preview 200 1.0ms');
  });
});
