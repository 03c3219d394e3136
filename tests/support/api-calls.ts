import { apiErrorBody } from '../../server/src/contracts/errors.ts';
import { demoPeople } from '../../seeds/data/people.ts';
import type { ApiAgent, ApiHarness } from './api-harness.ts';

/** A fresh agent signed in as one of the demo people. */
export async function signedInAgent(harness: Pick<ApiHarness, 'agent' | 'signIn'>, email: string) {
  const agent = harness.agent();
  await harness.signIn(agent, email);
  return agent;
}

/** The error of an error body, checked against its contract. */
export const errorOf = (body: unknown) => apiErrorBody.parse(body).error;

/** The request an agent makes for a method named in a test table. */
export function callFor(agent: ApiAgent, method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE', path: string) {
  const calls = { GET: agent.get, POST: agent.post, PUT: agent.put, PATCH: agent.patch, DELETE: agent.delete };
  return calls[method].call(agent, path);
}

/**
 * Signs an agent in over real HTTP (a running server, not the in-process app): the server sends it to the sign-in
 * stand-in at `signInOrigin`, the stand-in's page picks the demo person, and its redirect brings the code back.
 */
export async function signInOverHttp(agent: ApiAgent, signInOrigin: string, email: string): Promise<void> {
  const start = await agent.get('/api/auth/google').expect(302);
  const authorize = new URL(start.headers.location!);
  const person = demoPeople.find((candidate) => candidate.email === email);
  const form = new URLSearchParams({
    ...Object.fromEntries(authorize.searchParams),
    ...(person ? { identity: person.sub } : { email }),
  });
  const decision = await fetch(`${signInOrigin}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
  const callback = new URL(decision.headers.get('location')!);
  await agent.get(`${callback.pathname}${callback.search}`).expect(302);
}
