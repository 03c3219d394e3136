import type { OrderDelivery } from '@server/contracts/shipping.ts';

interface ShownAddress {
  name: string;
  line1: string;
  line2?: string;
  city: string;
  region: string;
  postalCode: string;
  countryCode: string;
  phone?: string;
}

/**
 * How an order travels, as both order pages show it: delivery or pick-up, the parcel's carrier and tracking number
 * once posted, and the address. `audience` picks the words: the customer's "you" or the studio's "the customer".
 */
export function DeliveryDetails({
  delivery,
  shipTo,
  audience,
}: {
  delivery: OrderDelivery;
  shipTo: ShownAddress;
  audience: 'customer' | 'studio';
}) {
  const isPickup = delivery.method === 'pickup';
  const hasShipment = delivery.carrier !== null || delivery.trackingNumber !== null;
  return (
    <div className="space-y-2 text-sm">
      <p className="font-medium">
        {isPickup
          ? audience === 'customer'
            ? 'You pick it up at the studio'
            : 'The customer picks it up at the studio'
          : 'Delivery to the address below'}
      </p>
      {isPickup && delivery.pickupNote && <p className="text-walnut-700">{delivery.pickupNote}</p>}
      {hasShipment && (
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1" aria-label="Parcel tracking">
          {delivery.carrier && (
            <>
              <dt className="text-walnut-500">Carrier</dt>
              <dd>{delivery.carrier}</dd>
            </>
          )}
          {delivery.trackingNumber && (
            <>
              <dt className="text-walnut-500">Tracking number</dt>
              <dd className="font-mono">{delivery.trackingNumber}</dd>
            </>
          )}
        </dl>
      )}
      <address className="not-italic">
        {shipTo.name}
        <br />
        {shipTo.line1}
        <br />
        {shipTo.line2 && (
          <>
            {shipTo.line2}
            <br />
          </>
        )}
        {shipTo.city}, {shipTo.region} {shipTo.postalCode}
        <br />
        {shipTo.countryCode}
        {shipTo.phone && (
          <>
            <br />
            {shipTo.phone}
          </>
        )}
      </address>
    </div>
  );
}
