import { formatStudioDateTime } from '@ui/format.ts';
import { Link } from 'react-router-dom';
import type { OutboxEntry } from '@server/contracts/admin-outbox.ts';
import { MailStatusBadge } from './mail-status-badge.tsx';

/** One page of messages, newest first; each subject opens the message. */
export function OutboxList({
  messages,
  hrefOf,
  openId,
}: {
  messages: OutboxEntry[];
  hrefOf: (id: number) => string;
  openId: number | undefined;
}) {
  return (
    <ul className="divide-y divide-linen-200">
      {messages.map((message) => (
        <li key={message.id} className={`grid gap-0.5 py-2.5 ${message.id === openId ? 'bg-linen-100' : ''}`}>
          <div className="flex flex-wrap items-center gap-2">
            <Link
              to={hrefOf(message.id)}
              aria-current={message.id === openId ? 'page' : undefined}
              className="font-medium text-madder-700 underline-offset-2 hover:underline"
            >
              {message.subject}
            </Link>
            <MailStatusBadge status={message.status} />
          </div>
          <p className="text-sm text-walnut-500">
            To {message.toEmail}
            {message.orderNumber ? ` · ${message.orderNumber}` : ''} · {formatStudioDateTime(message.createdAt)}
          </p>
          {message.status === 'failed' && message.error && (
            <p className="text-sm text-madder-700">Not delivered: {message.error}</p>
          )}
          {message.status === 'retrying' && message.nextAttemptAt && (
            <p className="text-sm text-walnut-700">
              Attempt {message.attempts} failed; trying again at {formatStudioDateTime(message.nextAttemptAt)}.
            </p>
          )}
        </li>
      ))}
    </ul>
  );
}
