import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createJobWorker } from '../../server/src/app.ts';
import { createMailer, type Mailer } from '../../server/src/integrations/mailer.ts';
import { createJobRunner, enqueueJob } from '../../server/src/modules/jobs/job-runner.ts';
import { claimDueJobs } from '../../server/src/modules/jobs/job-repo.ts';
import { sendLoggedMail } from '../../server/src/modules/mail/order-mail.ts';
import { startSmtpFake } from '../../fakes/smtp/server.ts';
import { outboxMessageResponse } from '../../server/src/contracts/admin-outbox.ts';
import { startApiHarness, type ApiHarness } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';

let harness: ApiHarness;
let smtp: Awaited<ReturnType<typeof startSmtpFake>>;
let mailer: Mailer;
/** The workers' clock, moved by the tests so a retry falls due without waiting. */
let clockMs = Date.parse('2026-12-01T10:00:00Z');
const now = () => new Date(clockMs);
const minutes = (n: number) => n * 60_000;
const log = () => {};

beforeAll(async () => {
  smtp = await startSmtpFake({ smtpPort: 0, httpPort: 0 });
  harness = await startApiHarness({ env: { SMTP_URL: smtp.smtpUrl } });
  mailer = createMailer(harness.config);
});
afterAll(async () => {
  mailer.close();
  await harness.close();
  await smtp.close();
});

const letter = (subject: string) => ({
  to: 'priya@example.test',
  subject,
  text: 'Your proof is ready.',
  template: 'proof_ready',
  orderId: null,
});
const delivered = (subject: string) => smtp.messages.filter((message) => message.subject === subject);
const mailRow = (id: number) => harness.db('email_log').where({ id }).first();

describe('the job worker', () => {
  it('when the mail provider refuses the first two attempts, then the worker retries later and the mail arrives once, on the third', async () => {
    const worker = createJobWorker({ db: harness.db, mailer, now, log });
    smtp.refuseNext(2);
    const { id, sent } = await sendLoggedMail({ db: harness.db, mailer, now }, letter('Third time lucky'));
    expect(sent).toBe(false);
    expect(await mailRow(id)).toMatchObject({ status: 'retrying', attempts: 1 });

    // Not due yet: the first retry waits 30 s.
    expect(await worker.runDue()).toBe(0);
    clockMs += 31_000;
    expect(await worker.runDue()).toBe(1);
    expect(await mailRow(id)).toMatchObject({ status: 'retrying', attempts: 2 });
    expect(delivered('Third time lucky')).toHaveLength(0);

    clockMs += minutes(2) + 1_000;
    expect(await worker.runDue()).toBe(1);
    expect(await mailRow(id)).toMatchObject({ status: 'sent', attempts: 3, error: null });
    expect(delivered('Third time lucky')).toHaveLength(1);

    clockMs += minutes(60);
    expect(await worker.runDue()).toBe(0);
    expect(delivered('Third time lucky')).toHaveLength(1);
  });

  it('when two workers drain the same queue at once, then every message is sent exactly once', async () => {
    const subjects = Array.from({ length: 24 }, (_, i) => `Batch message ${i + 1}`);
    for (const subject of subjects)
      await sendLoggedMail({ db: harness.db, mailer, now }, letter(subject), { sendNow: false });
    // A provider that takes a moment per message, so the two workers' batches overlap as they would in a shop.
    const slowMailer: Mailer = {
      send: async (message) => {
        await new Promise((resolve) => setTimeout(resolve, 25));
        return mailer.send(message);
      },
      close: () => {},
    };
    const first = createJobWorker({ db: harness.db, mailer: slowMailer, now, log, workerId: 'worker-a' });
    const second = createJobWorker({ db: harness.db, mailer: slowMailer, now, log, workerId: 'worker-b' });
    // Two claims at the same moment never share a job: SKIP LOCKED passes over rows the other is taking.
    const [claimedByA, claimedByB] = await Promise.all([
      claimDueJobs(harness.db, { workerId: 'worker-a', limit: 5, now: now(), leaseMs: minutes(5) }),
      claimDueJobs(harness.db, { workerId: 'worker-b', limit: 5, now: now(), leaseMs: minutes(5) }),
    ]);
    const claimedIds = [...claimedByA, ...claimedByB].map((job) => job.id);
    // The second claim gets the next five, or none when the first one's scan held every due row for that moment.
    expect(claimedIds.length).toBeGreaterThanOrEqual(5);
    expect(new Set(claimedIds).size).toBe(claimedIds.length);
    // Those are another worker's for five minutes; the two workers drain the rest between them, then take those over.
    const [ranByFirst, ranBySecond] = await Promise.all([first.runDue(3), second.runDue(3)]);
    expect(ranByFirst + ranBySecond).toBe(24 - claimedIds.length);
    clockMs += minutes(6);
    const [lateFirst, lateSecond] = await Promise.all([first.runDue(3), second.runDue(3)]);
    expect(lateFirst + lateSecond).toBe(claimedIds.length);
    for (const subject of subjects) expect(delivered(subject), subject).toHaveLength(1);
  });

  it('when a worker stops in the middle of a job, then another takes it over once its claim has run out', async () => {
    const jobId = await enqueueJob(harness.db, { kind: 'note-it', payload: { n: 1 } }, now());
    const done: string[] = [];
    const crashed = createJobRunner({
      db: harness.db,
      now,
      log,
      workerId: 'crashes',
      handlers: { 'note-it': () => new Promise<void>(() => {}) },
    });
    void crashed.runDue(1);
    await expect.poll(async () => (await harness.db('jobs').where({ id: jobId }).first()).status).toBe('running');
    const rescuer = createJobRunner({
      db: harness.db,
      now,
      log,
      workerId: 'rescues',
      handlers: { 'note-it': async () => void done.push('rescued') },
    });
    expect(await rescuer.runDue()).toBe(0);
    clockMs += minutes(6);
    expect(await rescuer.runDue()).toBe(1);
    expect(done).toEqual(['rescued']);
    expect(await harness.db('jobs').where({ id: jobId }).first()).toMatchObject({ status: 'done', attempts: 2 });
  });

  it('when several instances tick at the same moment, then a scheduled task runs once per period', async () => {
    const runs: string[] = [];
    const workers = ['one', 'two', 'three'].map((workerId) =>
      createJobRunner({
        db: harness.db,
        now,
        log,
        workerId,
        handlers: {},
        schedules: [{ name: 'tidy-up', periodMs: minutes(60), run: async () => void runs.push(workerId) }],
      }),
    );
    await Promise.all(workers.map((worker) => worker.runSchedules()));
    expect(runs).toHaveLength(1);
    clockMs += minutes(30);
    await Promise.all(workers.map((worker) => worker.runSchedules()));
    expect(runs).toHaveLength(1);
    clockMs += minutes(31);
    await Promise.all(workers.map((worker) => worker.runSchedules()));
    expect(runs).toHaveLength(2);
  });

  it('when a message failed for good, then the studio sends it again from the outbox', async () => {
    smtp.refuseNext(5);
    const { id } = await sendLoggedMail({ db: harness.db, mailer, now }, letter('Given up on'));
    const worker = createJobWorker({ db: harness.db, mailer, now, log });
    for (let attempt = 0; attempt < 4; attempt += 1) {
      clockMs += minutes(61);
      await worker.runDue();
    }
    expect(await mailRow(id)).toMatchObject({ status: 'failed', attempts: 5 });

    const owner = await signedInAgent(harness, 'marigold@wrenandbobbin.test');
    const res = await owner.post(`/api/admin/outbox/${id}/resend`).send({}).expect(200);
    expect(outboxMessageResponse.parse(res.body).message).toMatchObject({ status: 'sent', attempts: 1 });
    expect(delivered('Given up on')).toHaveLength(1);
    const again = await owner.post(`/api/admin/outbox/${id}/resend`).send({}).expect(409);
    expect(again.body.error.message).toMatch(/Only a message that failed can be sent again/);
  });
});
