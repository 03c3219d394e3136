import { formatStudioDateTime } from '@ui/format.ts';
import { useState } from 'react';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { Button } from '@ui/components/button.tsx';
import { useOutboxMessage } from '../api/get-outbox-message.ts';
import { useResendMessage } from '../api/resend-message.ts';
import { MailStatusBadge } from './mail-status-badge.tsx';

/**
 * One message as the customer got it. The HTML body is shown in a sandboxed frame (no scripts, no same-origin
 * access, and the page's own security policy still applies), so a message can never act on the studio app.
 */
export function OutboxMessage({ id }: { id: number }) {
  const message = useOutboxMessage(id);
  const resend = useResendMessage();
  const [view, setView] = useState<'text' | 'html'>('text');
  if (message.isPending) return <Loading label="Opening the message…" />;
  if (message.isError) return <ErrorNotice message={message.error.message} onRetry={() => void message.refetch()} />;
  const m = message.data.message;
  const hasHtml = Boolean(m.htmlBody);
  return (
    <article aria-labelledby="outbox-message-subject" className="grid gap-3">
      <header className="grid gap-1">
        <h2 id="outbox-message-subject" className="text-lg font-semibold">
          {m.subject}
        </h2>
        <div className="flex flex-wrap items-center gap-2 text-sm text-walnut-500">
          <MailStatusBadge status={m.status} />
          <span>To {m.toEmail}</span>
          {m.orderNumber && <span>· order {m.orderNumber}</span>}
          <span>· {formatStudioDateTime(m.createdAt)}</span>
        </div>
        {m.status === 'retrying' && (
          <p role="note" className="rounded-lg bg-saffron-100 p-2.5 text-sm text-walnut-900">
            Attempt {m.attempts} did not go through{m.error ? ` (${m.error})` : ''}.{' '}
            {m.nextAttemptAt ? `The next try is at ${formatStudioDateTime(m.nextAttemptAt)}.` : ''}
          </p>
        )}
        {m.status === 'failed' && (
          <div role="note" className="grid gap-2 rounded-lg bg-madder-50 p-2.5 text-sm text-madder-700">
            <p>
              This one was not delivered after {m.attempts} {m.attempts === 1 ? 'attempt' : 'attempts'}
              {m.error ? `: ${m.error}` : '.'}
            </p>
            <div className="flex flex-wrap items-center gap-3">
              <Button tone="quiet" disabled={resend.isPending} onClick={() => resend.mutate(m.id)}>
                {resend.isPending ? 'Sending…' : 'Send it again'}
              </Button>
              {resend.isError && <span role="alert">{resend.error.message}</span>}
            </div>
          </div>
        )}
      </header>
      {hasHtml && (
        <div role="group" aria-label="Show the message as" className="flex gap-2 text-sm">
          {(['text', 'html'] as const).map((option) => (
            <button
              key={option}
              type="button"
              aria-pressed={view === option}
              onClick={() => setView(option)}
              className={`min-h-9 rounded-full border px-3 ${view === option ? 'border-walnut-700 bg-walnut-900 text-linen-100' : 'border-linen-300 hover:bg-linen-100'}`}
            >
              {option === 'text' ? 'Plain text' : 'As designed'}
            </button>
          ))}
        </div>
      )}
      {view === 'html' && m.htmlBody ? (
        <iframe
          title={`The message “${m.subject}” as designed`}
          sandbox=""
          srcDoc={m.htmlBody}
          className="h-96 w-full rounded-lg border border-linen-200 bg-white"
        />
      ) : m.textBody ? (
        <pre className="whitespace-pre-wrap break-words rounded-lg border border-linen-200 bg-linen-50 p-4 font-sans text-sm">
          {m.textBody}
        </pre>
      ) : (
        <p className="text-sm text-walnut-500">This message was logged before the outbox kept what messages said.</p>
      )}
    </article>
  );
}
