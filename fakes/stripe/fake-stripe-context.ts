import { randomId } from '../random-id.ts';
import type { FakeStripeState } from './fake-stripe-state.ts';

/** What the fake's routers share: its state, its clock, its id counters and its webhook sender. */
export interface FakeStripeContext {
  state: FakeStripeState;
  /** A new object id with the real service's prefix (`cs_test_…`, `pi_…`, `ch_…`, `re_…`, `evt_…`, `req_…`). */
  nextId(prefix: IdPrefix): string;
  /** The stand-in's clock: the given clock plus whatever a test moved it on by (`POST /_fake/clock`). */
  nowMs(): number;
  nowSeconds(): number;
  /** Moves the stand-in's clock on; holds past their `capture_before` lapse on the next request. */
  advanceClock(seconds: number): void;
  paymentPageUrl(sessionId: string): string;
  /** Records an event of `type` with a snapshot of `object` and queues its webhook delivery. */
  emit(type: string, object: unknown): void;
}

export type IdPrefix = 'cs' | 'pi' | 'ch' | 're' | 'evt' | 'req' | 'cus' | 'pm' | 'seti';

/**
 * Ids as the real service mints them for practical purposes: random after the object's prefix (Checkout Sessions
 * carry `cs_test_` in test mode), so they never repeat after a restart or between two stand-ins.
 */
export function mintProviderId(prefix: IdPrefix): string {
  if (prefix === 'cs') return randomId('cs_test_', 58);
  if (prefix === 'req') return randomId('req_', 14);
  return randomId(`${prefix}_`, 24);
}
