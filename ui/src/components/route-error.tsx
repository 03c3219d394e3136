import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/**
 * Shown in place of a page that failed to render, so one broken area never blanks the whole app. The details stay in
 * the browser console; the person gets a way forward.
 */
export function RouteError({ homeHref }: { homeHref: string }) {
  const error = useRouteError();
  const isMissing = isRouteErrorResponse(error) && error.status === 404;
  if (!isMissing) console.error(error);
  return (
    <div
      role="alert"
      className="mx-auto mt-12 max-w-lg rounded-card border border-madder-500/40 bg-madder-50 p-8 text-center"
    >
      <h1 className="text-xl font-semibold text-madder-700">
        {isMissing ? "We couldn't find that page" : 'This page ran into a problem'}
      </h1>
      <p className="mt-2 text-walnut-700">
        {isMissing
          ? 'The link may be out of date.'
          : 'Nothing you entered was lost on our side. Reload the page, or start again from the beginning.'}
      </p>
      <div className="mt-5 flex justify-center gap-3">
        <button
          type="button"
          onClick={() => window.location.reload()}
          className="min-h-11 rounded-full bg-madder-600 px-5 font-medium text-white hover:bg-madder-700"
        >
          Reload
        </button>
        <a
          href={homeHref}
          className="inline-flex min-h-11 items-center rounded-full border border-linen-300 bg-white px-5 font-medium"
        >
          Start again
        </a>
      </div>
    </div>
  );
}
