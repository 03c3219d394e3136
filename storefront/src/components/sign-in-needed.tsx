import { ButtonLink } from '@ui/components/button.tsx';
import { ErrorNotice } from '@ui/components/page-state.tsx';
import { signInHref } from '@ui/session/sign-in-href.ts';

/** A page that belongs to an account, opened while signed out: why, and sign-in that comes straight back. */
export function SignInNeeded({ message, returnTo }: { message: string; returnTo: string }) {
  return (
    <div className="space-y-4">
      <ErrorNotice message={message} />
      <ButtonLink href={signInHref(returnTo)}>Sign in</ButtonLink>
    </div>
  );
}
