import { useSearchParams } from 'react-router-dom';
import { ButtonLink } from '@ui/components/button.tsx';
import { signInHref } from '@ui/session/sign-in-href.ts';

export function SignInPage() {
  const [params] = useSearchParams();
  const problem = params.get('problem');
  return (
    <div className="mx-auto max-w-md rounded-card border border-linen-200 bg-white p-8 text-center shadow-sm">
      <h1 className="text-2xl font-semibold">Sign in to save your designs</h1>
      <p className="mt-2 text-walnut-700">We use your Google account so you don't need another password.</p>
      {problem && (
        <p role="alert" className="mt-4 rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
          {problem}
        </p>
      )}
      <ButtonLink href={signInHref('/')} className="mt-6 w-full">
        Continue with Google
      </ButtonLink>
    </div>
  );
}
