import { useEffect } from 'react';
import { useMatches, type Params } from 'react-router-dom';

/** A route's name for the browser tab: fixed, or made from the address's parameters ("Order WB-1014"). */
export type PageTitle = string | ((params: Params) => string);

const titleOf = (handle: unknown): PageTitle | undefined =>
  typeof handle === 'object' && handle !== null && 'title' in handle ? (handle.title as PageTitle) : undefined;

/** Names the tab "<page> · <app>"; nothing happens while `title` is unknown. */
export function usePageTitle(title: string | undefined, appName: string): void {
  useEffect(() => {
    if (title !== undefined) document.title = `${title} · ${appName}`;
  }, [title, appName]);
}

/**
 * Names the tab after the deepest matched route whose `handle` has a `title`. Pages that know their name only once
 * their data arrives (a garment's) leave it out of the route and call `usePageTitle` themselves.
 */
export function useRouteTitle(appName: string): void {
  const match = useMatches().findLast((candidate) => titleOf(candidate.handle) !== undefined);
  const title = match ? titleOf(match.handle) : undefined;
  usePageTitle(typeof title === 'function' ? title(match!.params) : title, appName);
}
