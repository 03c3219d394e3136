import type { SavedAddress } from '@server/contracts/saved-addresses.ts';
import { useSavedAddresses } from '../api/get-saved-addresses.ts';

const oneLine = (address: SavedAddress['address']) =>
  [address.name, address.line1, address.line2, address.city, address.region, address.postalCode, address.countryCode]
    .filter(Boolean)
    .join(', ');

/**
 * The customer's addresses from earlier orders, each a button that fills the address boxes (which stay editable).
 * Nothing is shown to a first-time customer; a list that cannot load leaves the boxes to type in as before.
 */
export function SavedAddressPicker({ onUse }: { onUse: (address: SavedAddress['address']) => void }) {
  const saved = useSavedAddresses();
  if (saved.isPending) return <p className="text-sm text-walnut-500 sm:col-span-2">Looking for your addresses…</p>;
  if (saved.isError)
    return (
      <p className="text-sm text-walnut-500 sm:col-span-2">
        Your saved addresses could not be loaded; type the address below.
      </p>
    );
  if (saved.data.addresses.length === 0) return null;
  return (
    <div className="sm:col-span-2">
      <h3 id="saved-addresses-heading" className="text-sm font-medium">
        Your addresses
      </h3>
      <ul aria-labelledby="saved-addresses-heading" className="mt-1 grid gap-2">
        {saved.data.addresses.map(({ id, address }) => (
          <li
            key={id}
            className="flex flex-wrap items-center justify-between gap-2 rounded-lg border border-linen-300 p-2"
          >
            <span className="text-sm">{oneLine(address)}</span>
            <button
              type="button"
              onClick={() => onUse(address)}
              aria-label={`Use ${oneLine(address)}`}
              className="min-h-11 rounded-full border border-madder-600 px-4 text-sm font-medium text-madder-700 hover:bg-madder-50"
            >
              Use this address
            </button>
          </li>
        ))}
      </ul>
    </div>
  );
}
