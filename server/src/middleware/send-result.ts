import type { Response } from 'express';
import type { Result } from '../contracts/result.ts';
import { statusByKind } from './http-error.ts';

/** Maps a service Result to the response: the value as JSON, or the error body with its kind's status. */
export function sendResult<T>(res: Response, result: Result<T>, successStatus = 200): void {
  if (result.ok) {
    res.status(successStatus).json(result.value);
    return;
  }
  res.status(statusByKind[result.error.kind]).json({ error: result.error });
}
