import { useDeferredValue, useState } from 'react';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { usePeople } from '../../features/people/api/get-people.ts';
import { PeopleTable } from '../../features/people/components/people-table.tsx';

export function PeoplePage() {
  const me = useCurrentUser();
  const [search, setSearch] = useState('');
  const deferredSearch = useDeferredValue(search.trim());
  const people = usePeople(deferredSearch, me.data?.role === 'owner');
  if (me.data?.role !== 'owner') {
    return <ErrorNotice message="Only the studio owner can see and change who works in the studio." />;
  }
  return (
    <div className="grid min-w-0 gap-6">
      <div>
        <h1 className="text-2xl font-semibold">People</h1>
        <p className="text-sm text-walnut-500">
          Add someone to the studio team to let them into this app; the change applies on their next click.
        </p>
      </div>
      <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
        <label htmlFor="people-search" className="text-sm font-medium text-walnut-700">
          Find a person
        </label>
        <input
          id="people-search"
          type="search"
          value={search}
          onChange={(event) => setSearch(event.target.value)}
          placeholder="Name or e-mail"
          className="mb-4 mt-1 block min-h-10 w-full max-w-sm rounded-lg border border-linen-300 px-3"
        />
        {people.isPending ? (
          <Loading label="Finding people…" />
        ) : people.isError ? (
          <ErrorNotice message={people.error.message} onRetry={() => void people.refetch()} />
        ) : people.data.people.length === 0 ? (
          <EmptyState title={search ? `Nobody matches “${search}”.` : 'Nobody has signed in yet.'} />
        ) : (
          <PeopleTable people={people.data.people} myId={me.data.id} />
        )}
      </section>
    </div>
  );
}
