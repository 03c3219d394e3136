import type { Db } from '../../db/knex.ts';
import type { SavedAddressesResponse } from '../../contracts/saved-addresses.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { deleteSavedAddress, listSavedAddresses } from './customer-address-repo.ts';

/** The addresses a customer has ordered to: only their own, newest first; checkout keeps them as orders are placed. */
export function createCustomerAddressService(deps: { db: Db }) {
  return {
    async list(customerId: number): Promise<Result<SavedAddressesResponse>> {
      const addresses = await listSavedAddresses(deps.db, customerId);
      return ok({
        addresses: addresses.map((saved) => ({ ...saved, lastUsedAt: saved.lastUsedAt.toISOString() })),
      });
    },
    async forget(customerId: number, id: number): Promise<Result<{ id: number }>> {
      return (await deleteSavedAddress(deps.db, customerId, id))
        ? ok({ id })
        : failure('not-found', `There is no saved address ${id}.`);
    },
  };
}

export type CustomerAddressService = ReturnType<typeof createCustomerAddressService>;
