import { Link, Outlet, useLocation } from 'react-router-dom';
import { HoopMark } from '@ui/components/logo.tsx';
import { SkipLink } from '@ui/components/skip-link.tsx';
import { Button, ButtonLink } from '@ui/components/button.tsx';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { useSignOut } from '@ui/session/sign-out.ts';
import { signInHref } from '@ui/session/sign-in-href.ts';
import { useRouteTitle } from '@ui/hooks/use-page-title.ts';
import { paths } from '../config/paths.ts';
import { SHOP_TITLE } from '../config/shop-title.ts';
import { SafetyNotes } from '../components/safety-notes.tsx';

function AccountArea() {
  const location = useLocation();
  const me = useCurrentUser();
  const signOut = useSignOut();
  if (me.isPending) return <span className="text-sm text-walnut-500">…</span>;
  if (!me.data) {
    return (
      <ButtonLink tone="quiet" href={signInHref(location.pathname + location.search)}>
        Sign in
      </ButtonLink>
    );
  }
  return (
    <div className="flex items-center gap-3">
      <Link
        to={paths.designs.href()}
        className="inline-flex min-h-11 items-center whitespace-nowrap text-sm font-medium text-walnut-700 underline-offset-4 hover:text-madder-600 hover:underline"
      >
        <span className="hidden sm:inline">My designs</span>
        <span className="sm:hidden">Designs</span>
      </Link>
      <Link
        to={paths.orders.href()}
        className="inline-flex min-h-11 items-center whitespace-nowrap text-sm font-medium text-walnut-700 underline-offset-4 hover:text-madder-600 hover:underline"
      >
        <span className="hidden sm:inline">My orders</span>
        <span className="sm:hidden">Orders</span>
      </Link>
      <span className="hidden text-sm sm:inline">
        Signed in as <strong className="font-semibold">{me.data.name}</strong>
      </span>
      <span className="text-sm sm:hidden" aria-label={`Signed in as ${me.data.name}`}>
        {me.data.name.split(' ')[0]}
      </span>
      <Button tone="quiet" onClick={() => signOut.mutate()} disabled={signOut.isPending}>
        Sign out
      </Button>
    </div>
  );
}

export function ShopLayout() {
  useRouteTitle(SHOP_TITLE);
  return (
    <div className="flex min-h-screen flex-col">
      <SkipLink />
      <header className="border-b border-linen-200 bg-linen-100/70">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-x-4 gap-y-1 px-4 py-3 sm:px-6">
          <Link to={paths.home.href()} className="flex items-center gap-2.5 text-walnut-700">
            <HoopMark />
            <span className="leading-tight">
              <span className="block text-lg font-semibold">Wren &amp; Bobbin</span>
              <span className="block text-xs text-walnut-500">made-to-order embroidery</span>
            </span>
          </Link>
          <AccountArea />
        </div>
      </header>
      <main id="main" tabIndex={-1} className="outline-none mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        <Outlet />
      </main>
      <footer className="border-t border-linen-200 bg-linen-100/60">
        <div className="mx-auto max-w-6xl px-4 py-8 sm:px-6">
          <SafetyNotes />
          <p className="mt-6 text-xs text-walnut-500">Wren &amp; Bobbin Embroidery Studio · orders run on Hoopwright</p>
        </div>
      </footer>
    </div>
  );
}
