import nodemailer, { type Transporter } from 'nodemailer';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startSmtpFake } from '../../../fakes/smtp/server.ts';

// nodemailer → smtp-server → mailparser, with the settings ../shared/docs/stack-notes.md §6 verified
// (authOptional, STARTTLS disabled on the server, ignoreTLS on the client).
let fake: Awaited<ReturnType<typeof startSmtpFake>>;
let transport: Transporter;

beforeAll(async () => {
  fake = await startSmtpFake({ smtpPort: 0, httpPort: 0 });
  const { hostname, port } = new URL(fake.smtpUrl);
  transport = nodemailer.createTransport({ host: hostname, port: Number(port), secure: false, ignoreTLS: true });
});
afterAll(async () => {
  transport.close();
  await fake.close();
});
beforeEach(async () => {
  await fetch(`${fake.httpUrl}/messages`, { method: 'DELETE' });
});

const proofPng = Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex');

function sendProof(to: string, subject = 'Your embroidery proof is ready') {
  return transport.sendMail({
    from: 'Wren & Bobbin <studio@wren-bobbin.test>',
    to,
    bcc: 'archive@wren-bobbin.test',
    subject,
    text: 'Hello! Your proof for order 7 is attached.',
    html: '<p>Hello! Your proof for <strong>order 7</strong> is attached.</p>',
    attachments: [{ filename: 'proof-order-7.png', content: proofPng, contentType: 'image/png' }],
  });
}

describe('the SMTP fake', () => {
  it('when nodemailer sends a message with an attachment, then HTTP shows it and serves the attachment bytes', async () => {
    await sendProof('Maren Threadgill <maren@wren-bobbin.test>', 'Votre épreuve est prête ✂');
    const list = await (await fetch(`${fake.httpUrl}/messages`)).json();
    expect(list).toHaveLength(1);
    const [mail] = list;
    expect(mail).toEqual({
      id: expect.stringMatching(/^mail-[A-Za-z0-9]{16}$/),
      receivedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      envelope: { from: 'studio@wren-bobbin.test', to: ['maren@wren-bobbin.test', 'archive@wren-bobbin.test'] },
      from: '"Wren & Bobbin" <studio@wren-bobbin.test>',
      to: '"Maren Threadgill" <maren@wren-bobbin.test>',
      subject: 'Votre épreuve est prête ✂',
      text: 'Hello! Your proof for order 7 is attached.',
      html: '<p>Hello! Your proof for <strong>order 7</strong> is attached.</p>',
      attachments: [{ filename: 'proof-order-7.png', contentType: 'image/png', size: proofPng.length }],
    });
    expect(fake.messages[0].id).toBe(mail.id);

    expect(await (await fetch(`${fake.httpUrl}/messages/${mail.id}`)).json()).toEqual(mail);
    const attachment = await fetch(`${fake.httpUrl}/messages/${mail.id}/attachments/0`);
    expect(attachment.headers.get('content-type')).toBe('image/png');
    expect(attachment.headers.get('content-disposition')).toContain('proof-order-7.png');
    expect(Buffer.from(await attachment.arrayBuffer())).toEqual(proofPng);
  });

  it('when filtered by recipient, then only their messages come back, newest first', async () => {
    await sendProof('maren@wren-bobbin.test', 'first');
    await sendProof('osric@wren-bobbin.test', 'second');
    await sendProof('maren@wren-bobbin.test', 'third');
    const forMaren = await (await fetch(`${fake.httpUrl}/messages?to=MAREN@wren-bobbin.test`)).json();
    expect(forMaren.map((mail: { subject: string }) => mail.subject)).toEqual(['third', 'first']);
    const all = await (await fetch(`${fake.httpUrl}/messages`)).json();
    expect(all.map((mail: { subject: string }) => mail.subject)).toEqual(['third', 'second', 'first']);
  });

  it('when messages are deleted, then the list is empty, also through the returned array', async () => {
    await sendProof('maren@wren-bobbin.test');
    expect((await fetch(`${fake.httpUrl}/messages`, { method: 'DELETE' })).status).toBe(204);
    expect(await (await fetch(`${fake.httpUrl}/messages`)).json()).toEqual([]);
    expect(fake.messages).toEqual([]);
  });

  it('when an id or attachment index is unknown, then it answers 404', async () => {
    await sendProof('maren@wren-bobbin.test');
    const [mail] = fake.messages;
    expect((await fetch(`${fake.httpUrl}/messages/mail-999999`)).status).toBe(404);
    expect((await fetch(`${fake.httpUrl}/messages/${mail.id}/attachments/1`)).status).toBe(404);
    expect((await fetch(`${fake.httpUrl}/messages/${mail.id}/attachments/x`)).status).toBe(404);
  });

  it('when a message exceeds 10 MB, then the server refuses it with 552 and keeps nothing', async () => {
    const oversized = transport.sendMail({
      from: 'studio@wren-bobbin.test',
      to: 'maren@wren-bobbin.test',
      subject: 'too big',
      text: 'x'.repeat(11 * 1024 * 1024),
    });
    await expect(oversized).rejects.toMatchObject({ responseCode: 552 });
    expect(fake.messages).toEqual([]);
  });
});
