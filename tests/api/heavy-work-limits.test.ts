import { describe, expect, it } from 'vitest';
import { useApiHarness } from '../support/api-harness.ts';
import { errorOf, signedInAgent } from '../support/api-calls.ts';
import { svgDocument } from '../support/hostile-files.ts';

// A time limit no job can meet, so every heavy job is stopped: what the client sees then is the point.
const harness = useApiHarness({ env: { HEAVY_JOB_TIME_LIMIT_MS: '1' } });

describe('heavy work past its time limit', () => {
  it('when checking an upload takes longer than the limit, then it answers 503 with a sentence and the server keeps answering', async () => {
    const res = await harness
      .agent()
      .post('/api/artwork')
      .attach('file', Buffer.from(svgDocument('<rect width="10" height="10"/>')), {
        filename: 'drawing.svg',
        contentType: 'image/svg+xml',
      })
      .expect(503);
    expect(errorOf(res.body)).toMatchObject({
      kind: 'busy',
      message:
        'This took longer than the 0.001 s we allow for one file, so it was stopped; try a smaller or simpler file.',
    });
    await harness.agent().get('/api/health').expect(200);
    expect(await harness.db('artwork_uploads').where({ original_name: 'drawing.svg' }).count({ n: '*' })).toEqual([
      { n: 0 },
    ]);
  });

  it('when a motif preview takes longer than the limit, then the studio gets the same 503 sentence', async () => {
    const staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
    const res = await staff
      .post('/api/admin/catalogue/motifs/preview')
      .attach('file', Buffer.from(svgDocument('<rect width="10" height="10"/>')), {
        filename: 'motif.svg',
        contentType: 'image/svg+xml',
      })
      .expect(503);
    expect(errorOf(res.body).message).toMatch(/^This took longer than the 0\.001 s we allow/);
  });
});
