/**
 * Every engine function returns a result instead of throwing, so a bad number typed into a form or a broken
 * upload becomes a sentence the apps can show, never a 500.
 */
export interface Failure {
  ok: false;
  /** Why the computation could not be done, in words a shop owner or parent can read. */
  reason: string;
}

/** Success carries the computed fields next to `ok: true`; failure carries a reason. */
export type EngineResult<T, F extends Failure = Failure> = ({ ok: true } & T) | F;

export function fail(reason: string): Failure {
  return { ok: false, reason };
}
