import type { AddressObject, ParsedMail } from 'mailparser';
import { randomId } from '../random-id.ts';

/** One message as the fake captured it; attachment bytes are kept aside and served over HTTP. */
export interface CapturedMail {
  id: string;
  /** ISO 8601 time the message arrived. */
  receivedAt: string;
  /** What the SMTP client said in MAIL FROM / RCPT TO (includes Bcc recipients). */
  envelope: { from: string; to: string[] };
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  attachments: { filename: string | null; contentType: string; size: number }[];
}

export interface Mailbox {
  /** Newest first; the same array throughout, emptied in place by `clear()`. */
  messages: CapturedMail[];
  add(parsed: ParsedMail, envelope: CapturedMail['envelope']): CapturedMail;
  find(id: string): CapturedMail | undefined;
  attachmentContent(id: string, index: number): Buffer | undefined;
  clear(): void;
}

function addressText(addresses: AddressObject | AddressObject[] | undefined): string {
  if (!addresses) return '';
  return (Array.isArray(addresses) ? addresses : [addresses]).map((group) => group.text).join(', ');
}

export function createMailbox(): Mailbox {
  const messages: CapturedMail[] = [];
  const contents = new Map<string, Buffer[]>();

  return {
    messages,
    add(parsed, envelope) {
      const mail: CapturedMail = {
        id: randomId('mail-', 16),
        receivedAt: new Date().toISOString(),
        envelope,
        from: parsed.from?.text ?? '',
        to: addressText(parsed.to),
        subject: parsed.subject ?? '',
        text: parsed.text ?? '',
        html: parsed.html || null,
        attachments: parsed.attachments.map((attachment) => ({
          filename: attachment.filename ?? null,
          contentType: attachment.contentType,
          size: attachment.content.length,
        })),
      };
      messages.unshift(mail);
      contents.set(
        mail.id,
        parsed.attachments.map((attachment) => attachment.content),
      );
      return mail;
    },
    find: (id) => messages.find((mail) => mail.id === id),
    attachmentContent: (id, index) => contents.get(id)?.[index],
    clear() {
      messages.length = 0;
      contents.clear();
    },
  };
}
