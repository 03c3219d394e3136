import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { createFakeStripeState, snapshotFakeStripeState, type FakeStripeState } from './fake-stripe-state.ts';

/**
 * The stand-in's state kept in a JSON file (in the project's data folder for `npm start`), so what the app stored
 * yesterday (a Checkout Session, a held PaymentIntent) can still be retrieved, captured or refunded after a restart,
 * as with the real service. Without a file the state lives in memory only.
 */
export function loadFakeStripeState(file: string | undefined): FakeStripeState {
  const state = createFakeStripeState();
  if (!file || !existsSync(file)) return state;
  const saved = JSON.parse(readFileSync(file, 'utf8')) as ReturnType<typeof snapshotFakeStripeState>;
  for (const [id, record] of Object.entries(saved.checkoutSessions ?? {})) state.checkoutSessions.set(id, record);
  for (const [id, intent] of Object.entries(saved.paymentIntents ?? {})) state.paymentIntents.set(id, intent);
  for (const [id, customer] of Object.entries(saved.customers ?? {})) state.customers.set(id, customer);
  for (const [id, method] of Object.entries(saved.paymentMethods ?? {})) state.paymentMethods.set(id, method);
  for (const [id, intent] of Object.entries(saved.setupIntents ?? {})) state.setupIntents.set(id, intent);
  for (const id of saved.cardsNeedingAuthentication ?? []) state.cardsNeedingAuthentication.add(id);
  for (const [id, charge] of Object.entries(saved.charges ?? {})) state.charges.set(id, charge);
  for (const [id, refund] of Object.entries(saved.refunds ?? {})) state.refunds.set(id, refund);
  for (const [key, answer] of Object.entries(saved.idempotentResponses ?? {}))
    state.idempotentResponses.set(key, answer);
  state.events.push(...(saved.events ?? []));
  state.deliveries.push(...(saved.deliveries ?? []));
  return state;
}

/** Writes the state whole to a temporary file and renames it over the old one, so a crash never leaves half a file. */
export function saveFakeStripeState(file: string, state: FakeStripeState): void {
  mkdirSync(dirname(file), { recursive: true });
  const partial = `${file}.partial`;
  writeFileSync(partial, JSON.stringify(snapshotFakeStripeState(state)));
  renameSync(partial, file);
}
