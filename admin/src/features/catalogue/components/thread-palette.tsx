import type { ReactNode } from 'react';
import type { StudioThread } from '@server/contracts/admin-catalogue.ts';

export function ThreadPalette({
  threads,
  renderActions,
}: {
  threads: StudioThread[];
  renderActions?: (thread: StudioThread) => ReactNode;
}) {
  return (
    <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-5">
      {threads.map((thread) => (
        <li
          key={thread.id}
          className={`flex flex-wrap items-center gap-2 rounded-lg border border-linen-200 bg-white p-2 text-sm ${thread.isActive ? '' : 'opacity-55'}`}
        >
          <span
            className="h-8 w-8 shrink-0 rounded-full border border-walnut-900/15"
            style={{ backgroundColor: thread.hex }}
          />
          <span className="leading-tight">
            <span className="block font-medium">{thread.name}</span>
            <span className="block text-xs text-walnut-500">
              {thread.code} · {thread.hex}
              {thread.isActive ? '' : ' · retired'}
            </span>
          </span>
          {renderActions && <span className="ml-auto flex gap-1">{renderActions(thread)}</span>}
        </li>
      ))}
    </ul>
  );
}
