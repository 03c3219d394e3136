import { z } from 'zod';

function isHttpUrl(value: string): boolean {
  return URL.canParse(value) && ['http:', 'https:'].includes(new URL(value).protocol);
}

/** The parameters an OAuth 2.0 client sends to the authorization endpoint (RFC 6749 §4.1.1). */
export const authorizationRequestSchema = z.object({
  response_type: z.string({ error: 'response_type is missing.' }),
  client_id: z.string({ error: 'client_id is missing.' }).min(1, 'client_id is empty.'),
  redirect_uri: z
    .string({ error: 'redirect_uri is missing.' })
    .refine(isHttpUrl, 'redirect_uri must be an http(s) URL.'),
  scope: z.string().default(''),
  state: z.string().optional(),
});

export type AuthorizationRequest = z.infer<typeof authorizationRequestSchema>;

/** A person typed in on the page instead of picking a listed identity. */
export const typedIdentitySchema = z.object({
  email: z
    .string({ error: 'Enter an e-mail address.' })
    .trim()
    .pipe(z.email('Enter a full e-mail address, such as maya@example.test.')),
  name: z.string().trim().max(100, 'Keep the name under 100 characters.').default(''),
});

/** The redirect back to the client, carrying `code` and `state` or an OAuth error (RFC 6749 §4.1.2). */
export function clientRedirectUrl(request: AuthorizationRequest, params: Record<string, string>): string {
  const url = new URL(request.redirect_uri);
  for (const [name, value] of Object.entries(params)) url.searchParams.set(name, value);
  if (request.state !== undefined) url.searchParams.set('state', request.state);
  return url.href;
}
