import { useState } from 'react';
import { formatCustomerDate } from '@ui/format.ts';
import { Link } from 'react-router-dom';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { Button, buttonClassName } from '@ui/components/button.tsx';
import type { DesignDrawingLayout } from '../model/design-drawing-layout.ts';
import { useDuplicateDesign } from '../api/duplicate-design.ts';
import { DesignDrawing } from './design-drawing.tsx';
import { RenameDesignForm } from './rename-design-form.tsx';
import { ShareDesignPanel } from './share-design-panel.tsx';
import { DeleteDesignButton } from './delete-design-button.tsx';

const changedOn = formatCustomerDate;

/**
 * One saved design: its picture on the garment, what it is, and everything the customer can do with it. Rename and
 * share open in place, under the buttons, so the card keeps its spot in the list.
 */
export function DesignCard({
  design,
  garment,
  layout,
  openHref,
  linkOf,
  onDuplicated,
}: {
  design: SavedDesign;
  garment: GarmentSummary | undefined;
  layout: DesignDrawingLayout | undefined;
  openHref: string | undefined;
  linkOf: (shareToken: string) => string;
  onDuplicated: (copy: SavedDesign) => void;
}) {
  const [panel, setPanel] = useState<'rename' | 'share' | undefined>(design.shareToken ? 'share' : undefined);
  const duplicate = useDuplicateDesign();
  const size = garment?.sizes.find((candidate) => candidate.id === design.sizeId);
  const colour = garment?.colours.find((candidate) => candidate.id === design.colourId);
  const toggle = (next: 'rename' | 'share') => setPanel((current) => (current === next ? undefined : next));
  return (
    <li className="flex flex-col overflow-hidden rounded-card border border-linen-200 bg-white shadow-sm">
      <div className="flex h-64 items-center justify-center bg-linen-100 p-3">
        {garment && layout ? (
          <DesignDrawing
            layout={layout}
            garment={garment}
            colourHex={colour?.hex}
            title={`${design.name} on the ${garment.name.toLowerCase()}`}
            className="h-full w-full"
          />
        ) : (
          <p className="text-sm text-walnut-500">This garment is no longer offered.</p>
        )}
      </div>
      <div className="flex flex-1 flex-col gap-3 p-4">
        <div>
          <h2 className="text-lg font-semibold break-words">{design.name}</h2>
          <p className="text-sm text-walnut-500">
            {garment
              ? `${garment.name}${size ? `, ${size.label}` : ''}${colour ? `, ${colour.name}` : ''}`
              : 'Garment no longer offered'}{' '}
            · changed {changedOn(design.updatedAt)}
          </p>
          {design.shareToken && (
            <p className="mt-1 inline-block rounded-full bg-sage-50 px-2.5 py-0.5 text-xs font-medium text-sage-700">
              Shared by link
            </p>
          )}
        </div>
        <div className="flex flex-wrap gap-2">
          {openHref && (
            <Link to={openHref} className={buttonClassName()} aria-label={`Open “${design.name}” in the designer`}>
              Open
            </Link>
          )}
          <Button tone="quiet" aria-expanded={panel === 'rename'} onClick={() => toggle('rename')}>
            Rename
          </Button>
          <Button
            tone="quiet"
            disabled={duplicate.isPending}
            onClick={() => duplicate.mutate(design.id, { onSuccess: onDuplicated })}
          >
            {duplicate.isPending ? 'Copying…' : 'Duplicate'}
          </Button>
          <Button tone="quiet" aria-expanded={panel === 'share'} onClick={() => toggle('share')}>
            Share
          </Button>
          <DeleteDesignButton design={design} />
        </div>
        {duplicate.isError && (
          <p role="alert" className="text-sm text-madder-700">
            {duplicate.error.message}
          </p>
        )}
        {panel === 'rename' && <RenameDesignForm design={design} onDone={() => setPanel(undefined)} />}
        {panel === 'share' && <ShareDesignPanel design={design} linkOf={linkOf} />}
      </div>
    </li>
  );
}
