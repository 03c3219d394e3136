import { apiErrorBody } from '../../server/src/contracts/errors.ts';
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
