import { Link } from 'react-router-dom';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { buttonClassName } from '@ui/components/button.tsx';
import { orderArtworkImagePath } from '@server/contracts/admin-orders.ts';
import { useOrderDesign } from '../api/order-design.ts';
import { PriceAgainst } from './price-against.tsx';
import { StitchFileForm } from './stitch-file-form.tsx';

/**
 * The studio's work before a proof: each customer's picture with its stitch file figures (the price the customer
 * sees with the proof follows them), the order's price now against what was authorized, and the way into the
 * editor for a change the customer asked for.
 */
export function DesignWorkPanel({ number, editorHref }: { number: string; editorHref: string }) {
  const design = useOrderDesign(number);
  if (design.isPending) return <Loading label="Pricing the design…" />;
  if (design.isError) return <ErrorNotice message={design.error.message} onRetry={() => void design.refetch()} />;
  const pictures = design.data.document.placements.flatMap((placement) =>
    placement.kind === 'artwork' ? [placement] : [],
  );
  return (
    <div className="grid gap-4">
      {pictures.length === 0 ? (
        <p className="text-sm text-walnut-500">No customer’s picture to digitize on this design.</p>
      ) : (
        <ul className="grid gap-4" aria-label="Pictures to digitize">
          {pictures.map((picture, index) => {
            const label = pictures.length === 1 ? 'the customer’s picture' : `the customer’s picture ${index + 1}`;
            return (
              <li
                key={picture.id}
                className="grid gap-3 rounded-lg border border-linen-200 p-3 sm:grid-cols-[7rem_1fr]"
              >
                <img
                  src={orderArtworkImagePath(number, picture.artworkUploadId)}
                  alt={`The customer’s picture, ${picture.widthMm} mm wide`}
                  className="h-24 w-28 rounded-md border border-linen-300 bg-white object-contain p-1"
                />
                <div className="grid gap-2">
                  <h3 className="font-medium">Digitized picture, {picture.widthMm} mm wide</h3>
                  <StitchFileForm
                    number={number}
                    placementId={picture.id}
                    label={label}
                    saved={design.data.stitchFiles.find((file) => file.placementId === picture.id)}
                  />
                </div>
              </li>
            );
          })}
        </ul>
      )}
      <PriceAgainst price={design.data.price} label="The design’s price now" />
      <div>
        <Link to={editorHref} className={buttonClassName('quiet')}>
          Change the design
        </Link>
      </div>
    </div>
  );
}
