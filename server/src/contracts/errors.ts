import { z } from 'zod';

/** Every expected failure the API reports has one of these kinds; one table maps each to an HTTP status. */
export const errorKinds = [
  'invalid',
  'unauthenticated',
  'forbidden',
  'not-found',
  'conflict',
  'too-large',
  'unsupported-type',
  'payment-failed',
  /** The server could not do the work in time (a heavy job past its time limit, or too many at once). */
  'busy',
  'too-many-requests',
  /** The request is sound but needs the person to confirm something first (the safety notes at checkout). */
  'needs-acknowledgement',
  /** Well formed but impossible to carry out as asked: lettering in characters its font cannot stitch. */
  'unprocessable',
] as const;
export type ErrorKind = (typeof errorKinds)[number];

export const apiErrorBody = z.object({
  error: z.object({
    kind: z.enum([...errorKinds, 'server']),
    message: z.string(),
    /** Field path (dot-joined) to a message a person can act on. */
    fields: z.record(z.string(), z.string()).optional(),
    /** Figures that go with a refusal, for the page to show (a repriced quote's totals, say). */
    details: z.record(z.string(), z.unknown()).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBody>;
