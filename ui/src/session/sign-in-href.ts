/** The server route that starts sign-in and comes back to `returnTo` (a path on this site). */
export function signInHref(returnTo: string): string {
  return `/api/auth/google?returnTo=${encodeURIComponent(returnTo)}`;
}
