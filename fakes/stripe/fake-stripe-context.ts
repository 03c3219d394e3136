import type { FakeStripeState } from './fake-stripe-state.ts';

/** What the fake's routers share: its state, its clock, its id counters and its webhook sender. */
export interface FakeStripeContext {
  state: FakeStripeState;
  /** Counter-based ids such as `pi_test_000001`, so a failing test fails the same way twice. */
  nextId(prefix: string): string;
  nowMs(): number;
  nowSeconds(): number;
  paymentPageUrl(sessionId: string): string;
  /** Records an event of `type` with a snapshot of `object` and queues its webhook delivery. */
  emit(type: string, object: unknown): void;
}

export function createIdSequence(): (prefix: string) => string {
  const counts = new Map<string, number>();
  return (prefix) => {
    const count = (counts.get(prefix) ?? 0) + 1;
    counts.set(prefix, count);
    return `${prefix}_test_${String(count).padStart(6, '0')}`;
  };
}
