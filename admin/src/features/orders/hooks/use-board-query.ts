import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { orderBoardQuery, type OrderBoardQuery } from '@server/contracts/studio-orders.ts';
import { boardSearch } from '../api/get-order-board.ts';
import { statusOfWord, statusWords } from '../../../lib/order-status-labels.ts';

const defaults = orderBoardQuery.parse({});

/** The page's address for a board query: the API's own search, with each status in words. */
function pageSearch(query: OrderBoardQuery): URLSearchParams {
  const search = new URLSearchParams(boardSearch(query));
  if (query.status?.length) search.set('status', query.status.map((status) => statusWords[status]).join(','));
  return search;
}

/**
 * The board's filters, sort and page live in the URL's search params, so a view can be bookmarked, shared and
 * restored with Back. A hand-edited URL that the contract refuses falls back to the default board.
 */
export function useBoardQuery() {
  const [params, setParams] = useSearchParams();
  const query = useMemo(() => {
    const fields = Object.fromEntries(params);
    if (fields.status) fields.status = fields.status.split(',').map(statusOfWord).join(',');
    const parsed = orderBoardQuery.safeParse(fields);
    return parsed.success ? parsed.data : defaults;
  }, [params]);
  const view: 'list' | 'calendar' = params.get('view') === 'calendar' ? 'calendar' : 'list';

  /** Changes part of the query; any change but paging starts again at page 1. */
  const update = useCallback(
    (changes: Partial<OrderBoardQuery>) => {
      const next = { ...query, ...changes, page: 'page' in changes ? (changes.page ?? 1) : 1 };
      const search = pageSearch(next);
      if (view === 'calendar') search.set('view', 'calendar');
      setParams(search, { replace: !('page' in changes) && 'q' in changes });
    },
    [query, view, setParams],
  );

  const setView = useCallback(
    (nextView: 'list' | 'calendar') => {
      const search = pageSearch(query);
      if (nextView === 'calendar') search.set('view', 'calendar');
      setParams(search);
    },
    [query, setParams],
  );

  return { query, view, update, setView };
}
