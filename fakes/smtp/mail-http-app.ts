import express, { type Express } from 'express';
import { z } from 'zod';
import type { Mailbox } from './mailbox.ts';

const listQuerySchema = z.object({ to: z.string().trim().toLowerCase().optional() });

/** The HTTP side of the mail fake, for tests and the admin app to read what was sent. */
export function createMailHttpApp(mailbox: Mailbox): Express {
  const app = express();
  app.disable('x-powered-by');

  app.get('/messages', (req, res) => {
    const query = listQuerySchema.safeParse(req.query);
    if (!query.success) {
      res.status(400).json({ error: 'Pass at most one ?to=address.' });
      return;
    }
    const { to } = query.data;
    res.json(
      to
        ? mailbox.messages.filter((mail) => mail.envelope.to.some((address) => address.toLowerCase() === to))
        : mailbox.messages,
    );
  });

  app.get('/messages/:id', (req, res) => {
    const mail = mailbox.find(req.params.id);
    if (!mail) {
      res.status(404).json({ error: `No message ${req.params.id}.` });
      return;
    }
    res.json(mail);
  });

  app.get('/messages/:id/attachments/:index', (req, res) => {
    const mail = mailbox.find(req.params.id);
    const index = Number(req.params.index);
    const content = Number.isInteger(index) ? mailbox.attachmentContent(req.params.id, index) : undefined;
    if (!mail || !content) {
      res.status(404).json({ error: `No attachment ${req.params.index} on message ${req.params.id}.` });
      return;
    }
    const { filename, contentType } = mail.attachments[index];
    // Served as a download in a sandbox: a captured HTML attachment must not run as a page of this origin.
    res.attachment(filename ?? `attachment-${index}`);
    res.set({ 'Content-Type': contentType, 'Content-Security-Policy': 'sandbox', 'X-Content-Type-Options': 'nosniff' });
    res.send(content);
  });

  app.delete('/messages', (_req, res) => {
    mailbox.clear();
    res.status(204).end();
  });

  return app;
}
