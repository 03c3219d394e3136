import { z } from 'zod';
import { shipTo } from './orders.ts';

/** An address the customer has sent an order to, offered again at their next checkout. */
export const savedAddress = z.object({
  id: z.number().int(),
  address: shipTo,
  /** ISO 8601: when an order last went there. */
  lastUsedAt: z.string(),
});
export type SavedAddress = z.infer<typeof savedAddress>;

export const savedAddressesResponse = z.object({ addresses: z.array(savedAddress) });
export type SavedAddressesResponse = z.infer<typeof savedAddressesResponse>;

export const savedAddressParams = z.object({
  id: z
    .string()
    .regex(/^[1-9]\d{0,9}$/, 'must be an address number')
    .transform(Number),
});
