import { useEffect } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { useParams, useSearchParams } from 'react-router-dom';
import { mailStatus, outboxQuery, type MailStatus } from '@server/contracts/admin-outbox.ts';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { paths } from '../../config/paths.ts';
import { useOutbox } from '../../features/outbox/api/get-outbox.ts';
import { OutboxList } from '../../features/outbox/components/outbox-list.tsx';
import { OutboxMessage } from '../../features/outbox/components/outbox-message.tsx';
import { mailStatusLabel } from '../../features/outbox/components/mail-status-badge.tsx';

/** The filter form's order box: empty for every order, else the contract's order number (upper-cased for it). */
const outboxFilterFields = z.object({
  order: z
    .string()
    .trim()
    .pipe(z.union([z.literal(''), outboxQuery.shape.order.unwrap()])),
});

/** The outbox: the filters live in the address, so a filtered list can be bookmarked and opening a message keeps them. */
export function OutboxPage() {
  const params = useParams();
  const openId = params.id ? Number(params.id) : undefined;
  const [search, setSearch] = useSearchParams();
  const page = Math.max(1, Number(search.get('page')) || 1);
  const order = search.get('order') ?? '';
  const statusParam = search.get('status');
  const status = mailStatus.safeParse(statusParam).success ? (statusParam as MailStatus) : undefined;
  const filterForm = useForm({ resolver: zodResolver(outboxFilterFields), defaultValues: { order } });
  const orderError = filterForm.formState.errors.order?.message;
  const { reset: resetFilterForm } = filterForm;
  // The address is the filters' one source: going back or forward shows its order number in the box.
  useEffect(() => resetFilterForm({ order }), [order, resetFilterForm]);
  const outbox = useOutbox({ page, order: order || undefined, status });

  const setFilter = (changes: Record<string, string | undefined>) => {
    const next = new URLSearchParams(search);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    if (!('page' in changes)) next.delete('page');
    setSearch(next);
  };
  const hrefOf = (id: number) => `${paths.outboxMessage.href(id)}${search.size ? `?${search}` : ''}`;
  const pageCount = outbox.data ? Math.max(1, Math.ceil(outbox.data.total / outbox.data.pageSize)) : 1;

  return (
    <div className="grid min-w-0 gap-6">
      <div>
        <h1 className="text-2xl font-semibold">Outbox</h1>
        <p className="text-sm text-walnut-500">Every e-mail the shop has sent its customers, newest first.</p>
      </div>
      <div className="grid min-w-0 gap-6 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)]">
        <section aria-label="Messages" className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
          <form
            className="mb-3 flex flex-wrap items-end gap-3"
            noValidate
            onSubmit={filterForm.handleSubmit((fields) => setFilter({ order: fields.order || undefined }))}
          >
            <div className="grid gap-1">
              <label htmlFor="outbox-order" className="text-sm font-medium text-walnut-700">
                Order
              </label>
              <input
                id="outbox-order"
                placeholder="WB-1003"
                aria-invalid={orderError ? true : undefined}
                aria-describedby={orderError ? 'outbox-order-error' : undefined}
                className="min-h-10 w-32 rounded-lg border border-linen-300 px-3"
                {...filterForm.register('order')}
              />
              {orderError && (
                <p id="outbox-order-error" role="alert" className="text-sm text-madder-700">
                  {orderError}
                </p>
              )}
            </div>
            <div className="grid gap-1">
              <label htmlFor="outbox-status" className="text-sm font-medium text-walnut-700">
                Status
              </label>
              <select
                id="outbox-status"
                value={status ?? ''}
                onChange={(event) => setFilter({ status: event.target.value || undefined })}
                className="min-h-10 rounded-lg border border-linen-300 bg-white px-2"
              >
                <option value="">Any</option>
                {mailStatus.options.map((option) => (
                  <option key={option} value={option}>
                    {mailStatusLabel(option)}
                  </option>
                ))}
              </select>
            </div>
            <button
              type="submit"
              className="min-h-10 rounded-full border border-linen-300 px-4 text-sm hover:bg-linen-100"
            >
              Filter
            </button>
          </form>
          {outbox.isPending ? (
            <Loading label="Opening the outbox…" />
          ) : outbox.isError ? (
            <ErrorNotice message={outbox.error.message} onRetry={() => void outbox.refetch()} />
          ) : outbox.data.messages.length === 0 ? (
            <EmptyState title={order || status ? 'No messages match these filters.' : 'No e-mails sent yet.'} />
          ) : (
            <>
              {/* While other filters load, the previous list stays, dimmed, so the page does not jump. */}
              <div aria-busy={outbox.isPlaceholderData} className={outbox.isPlaceholderData ? 'opacity-50' : ''}>
                <OutboxList messages={outbox.data.messages} hrefOf={hrefOf} openId={openId} />
              </div>
              <nav aria-label="Outbox pages" className="mt-3 flex items-center justify-between text-sm">
                <button
                  type="button"
                  disabled={page <= 1}
                  onClick={() => setFilter({ page: String(page - 1) })}
                  className="min-h-10 rounded-full border border-linen-300 px-4 disabled:opacity-50"
                >
                  Newer
                </button>
                <span>
                  Page {page} of {pageCount} · {outbox.data.total} {outbox.data.total === 1 ? 'message' : 'messages'}
                </span>
                <button
                  type="button"
                  disabled={page >= pageCount}
                  onClick={() => setFilter({ page: String(page + 1) })}
                  className="min-h-10 rounded-full border border-linen-300 px-4 disabled:opacity-50"
                >
                  Older
                </button>
              </nav>
            </>
          )}
        </section>
        <section aria-label="Message" className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
          {openId && Number.isInteger(openId) ? (
            <OutboxMessage key={openId} id={openId} />
          ) : (
            <EmptyState title="Choose a message to read it." />
          )}
        </section>
      </div>
    </div>
  );
}
