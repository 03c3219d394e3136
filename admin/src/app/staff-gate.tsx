import type { ReactNode } from 'react';
import { useLocation } from 'react-router-dom';
import { ButtonLink } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { signInHref } from '@ui/session/sign-in-href.ts';
import { basename } from '../config/paths.ts';

/**
 * Lets the studio team through and explains the refusal to everyone else. The server enforces the same rule on
 * every /api/admin route; this only decides what to show.
 */
export function StaffGate({ children }: { children: ReactNode }) {
  const location = useLocation();
  const me = useCurrentUser();
  if (me.isPending) return <Loading label="Checking who you are…" />;
  if (me.isError) return <ErrorNotice message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) {
    return (
      <div className="mx-auto mt-16 max-w-md rounded-card border border-linen-200 bg-white p-8 text-center shadow-sm">
        <h1 className="text-2xl font-semibold">Studio sign-in</h1>
        <p className="mt-2 text-walnut-700">This is where the studio team runs orders, proofs and production.</p>
        <ButtonLink href={signInHref(basename + location.pathname)} className="mt-6 w-full">
          Sign in with Google
        </ButtonLink>
      </div>
    );
  }
  if (me.data.role === 'customer') {
    return (
      <div
        role="alert"
        className="mx-auto mt-16 max-w-lg rounded-card border border-madder-500/40 bg-madder-50 p-8 text-center"
      >
        <h1 className="text-2xl font-semibold text-madder-700">This area is for the studio team</h1>
        <p className="mt-3 text-walnut-700">
          You're signed in as {me.data.name} ({me.data.email}), which is a customer account. Your designs and orders are
          in the shop.
        </p>
        <ButtonLink href="/" tone="quiet" className="mt-6">
          Go to the shop
        </ButtonLink>
      </div>
    );
  }
  return <>{children}</>;
}
