import { randomInt } from 'node:crypto';

const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';

/**
 * A random id in the shape the real services use: letters and digits after a prefix. Random, not counted, so ids
 * stay unique across restarts and across several stand-ins, as the app's unique keys on provider ids expect.
 */
export function randomId(prefix: string, length = 24): string {
  let id = prefix;
  for (let i = 0; i < length; i += 1) id += alphabet[randomInt(alphabet.length)];
  return id;
}
