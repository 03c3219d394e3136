import { NavLink, Outlet } from 'react-router-dom';
import { HoopMark } from '@ui/components/logo.tsx';
import { SkipLink } from '@ui/components/skip-link.tsx';
import { Button } from '@ui/components/button.tsx';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { useSignOut } from '@ui/session/sign-out.ts';
import { useRouteTitle } from '@ui/hooks/use-page-title.ts';
import { roleWords } from '@server/contracts/users.ts';
import { paths } from '../config/paths.ts';
import { StaffGate } from './staff-gate.tsx';

const sections: { href: string; label: string; isOwnerOnly?: boolean }[] = [
  { href: paths.home.href(), label: 'Today' },
  { href: paths.catalogue.href(), label: 'Catalogue' },
  { href: paths.orders.href(), label: 'Orders' },
  { href: paths.pricing.href(), label: 'Pricing' },
  { href: paths.settings.href(), label: 'Settings' },
  { href: paths.people.href(), label: 'People', isOwnerOnly: true },
  { href: paths.outbox.href(), label: 'Outbox' },
];

function SignedInAs() {
  const me = useCurrentUser();
  const signOut = useSignOut();
  if (!me.data) return null;
  return (
    <div className="flex items-center gap-3 text-sm">
      <span>
        <strong className="font-semibold">{me.data.name}</strong>
        <span className="ml-2 rounded-full bg-sage-50 px-2 py-0.5 text-xs text-sage-700">
          {roleWords[me.data.role]}
        </span>
      </span>
      <Button
        tone="quiet"
        className="min-h-9 px-3 py-1 text-sm"
        onClick={() => signOut.mutate()}
        disabled={signOut.isPending}
      >
        Sign out
      </Button>
    </div>
  );
}

export function StudioLayout() {
  useRouteTitle('Hoopwright studio');
  const me = useCurrentUser();
  const isOwner = me.data?.role === 'owner';
  return (
    <div className="min-h-screen">
      <SkipLink />
      <header className="border-b border-walnut-700 bg-walnut-900 text-linen-100">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center justify-between gap-3 px-4 py-2.5">
          <div className="flex flex-wrap items-center gap-x-6 gap-y-2">
            <span className="flex items-center gap-2">
              <HoopMark className="h-8 w-8" />
              <span className="font-semibold">
                Hoopwright <span className="font-normal text-linen-300">studio</span>
              </span>
            </span>
            <nav aria-label="Studio sections" className="flex flex-wrap gap-1 text-sm">
              {sections
                .filter((section) => isOwner || !section.isOwnerOnly)
                .map((section) => (
                  <NavLink
                    key={section.href}
                    to={section.href}
                    end
                    className={({ isActive }) =>
                      `rounded-full px-3 py-1.5 ${isActive ? 'bg-linen-100 text-walnut-900' : 'hover:bg-walnut-700'}`
                    }
                  >
                    {section.label}
                  </NavLink>
                ))}
            </nav>
          </div>
          <SignedInAs />
        </div>
      </header>
      <main id="main" tabIndex={-1} className="outline-none mx-auto max-w-7xl px-4 py-6">
        <StaffGate>
          <Outlet />
        </StaffGate>
      </main>
    </div>
  );
}
