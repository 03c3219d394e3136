import { useState } from 'react';
import type { StudioGarment } from '@server/contracts/admin-catalogue-garments.ts';
import { formatLength } from '@ui/format.ts';
import { useDeleteGarmentPart, type GarmentPart } from '../api/save-garment-part.ts';
import { smallButtonClassName } from './form-field.tsx';
import { garmentKindLabels } from './garment-form.tsx';
import { RetireControl } from './retire-control.tsx';
import { SvgPicture } from './svg-picture.tsx';

type Size = StudioGarment['sizes'][number];
type Colour = StudioGarment['colours'][number];

/** What the list asks its page to open: a garment, size or colour form. */
export type GarmentEditRequest =
  | { form: 'garment'; garment: StudioGarment }
  | { form: 'size'; garment: StudioGarment; size?: Size }
  | { form: 'colour'; garment: StudioGarment; colour?: Colour };

const months = (value: number) => (value < 24 ? `${value} months` : `${Math.round(value / 12)} years`);

/** Deletes an unused size or colour after a second click; one a design or order uses has no delete at all. */
function DeletePart({
  part,
  garmentId,
  partId,
  name,
  isInUse,
}: {
  part: GarmentPart;
  garmentId: number;
  partId: number;
  name: string;
  isInUse: boolean;
}) {
  const [isConfirming, setIsConfirming] = useState(false);
  const remove = useDeleteGarmentPart();
  if (isInUse)
    return (
      <span className="text-xs text-walnut-500" title="Saved designs or orders use it, so it is kept.">
        in use
      </span>
    );
  if (!isConfirming) {
    return (
      <button
        type="button"
        className={smallButtonClassName}
        aria-label={`Delete ${name}`}
        onClick={() => setIsConfirming(true)}
      >
        Delete
      </button>
    );
  }
  return (
    <span role="group" aria-label={`Confirm deleting ${name}`} className="inline-flex flex-wrap items-center gap-1">
      <button
        type="button"
        autoFocus
        className={`${smallButtonClassName} border-madder-600 bg-madder-600 text-white hover:bg-madder-700`}
        disabled={remove.isPending}
        onClick={() => remove.mutate({ part, garmentId, partId })}
      >
        Delete {name}
      </button>
      <button type="button" className={smallButtonClassName} onClick={() => setIsConfirming(false)}>
        Keep
      </button>
      {remove.isError && (
        <span role="alert" className="text-sm text-madder-700">
          {remove.error.message}
        </span>
      )}
    </span>
  );
}

function SizeTable({ garment, onEdit }: { garment: StudioGarment; onEdit: (request: GarmentEditRequest) => void }) {
  if (garment.sizes.length === 0)
    return (
      <p className="text-sm text-walnut-500">No sizes yet: customers cannot choose this garment until it has one.</p>
    );
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full min-w-[36rem] text-left text-sm">
        <caption className="sr-only">Sizes of {garment.name}</caption>
        <thead className="text-walnut-500">
          <tr>
            <th className="py-1 font-medium">Size</th>
            <th className="py-1 font-medium">Front hem</th>
            <th className="py-1 font-medium">Hem all round</th>
            <th className="py-1 font-medium">Border above hem</th>
            <th className="py-1 font-medium">Places</th>
            <th className="py-1 font-medium">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {garment.sizes.map((size) => {
            const hem = size.zones.find((zone) => zone.code === 'hem');
            return (
              <tr key={size.id} className="border-t border-linen-200">
                <td className="py-1.5">
                  <span className="font-medium">{size.label}</span>
                </td>
                <td className="py-1.5 whitespace-nowrap">
                  {size.hemFrontMm === null ? '—' : formatLength(size.hemFrontMm)}
                </td>
                <td className="py-1.5 whitespace-nowrap">
                  {size.hemCircumferenceMm === null ? '—' : formatLength(size.hemCircumferenceMm)}
                </td>
                <td className="py-1.5 whitespace-nowrap">
                  {hem?.hemOffsetMm === undefined ? '—' : formatLength(hem.hemOffsetMm)}
                </td>
                <td className="py-1.5">{size.zones.map((zone) => zone.label).join(', ')}</td>
                <td className="py-1.5">
                  <span className="flex flex-wrap items-center justify-end gap-1">
                    <button
                      type="button"
                      className={smallButtonClassName}
                      aria-label={`Edit size ${size.label}`}
                      onClick={() => onEdit({ form: 'size', garment, size })}
                    >
                      Edit
                    </button>
                    <DeletePart
                      part="sizes"
                      garmentId={garment.id}
                      partId={size.id}
                      name={`size ${size.label}`}
                      isInUse={size.isInUse}
                    />
                  </span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/** Each garment as a card: its drawing, who it is for, its sizes and its fabric colours, with their actions. */
export function GarmentList({
  garments,
  onEdit,
}: {
  garments: StudioGarment[];
  onEdit: (request: GarmentEditRequest) => void;
}) {
  return (
    <ul className="grid min-w-0 gap-4">
      {garments.map((garment) => (
        <li
          key={garment.id}
          className={`grid min-w-0 gap-4 rounded-lg border border-linen-200 p-4 ${garment.isActive ? 'bg-white' : 'bg-linen-100'}`}
        >
          <div className="flex flex-wrap items-start gap-4">
            <SvgPicture svg={garment.mockupSvg} label="" className="h-24 w-24 rounded bg-linen-50 p-1" />
            <div className="min-w-48 flex-1">
              <h3 className="font-semibold">
                {garment.name}
                {!garment.isActive && (
                  <span className="ml-2 rounded-full bg-walnut-700 px-2 py-0.5 text-xs font-normal text-linen-100">
                    retired
                  </span>
                )}
              </h3>
              <p className="text-sm text-walnut-500">
                {garmentKindLabels[garment.kind as keyof typeof garmentKindLabels] ?? garment.kind} ·{' '}
                {garment.fabricType}
                {garment.isNapped ? ', napped' : ''} · {months(garment.minAgeMonths)} to {months(garment.maxAgeMonths)}
              </p>
              <p className="mt-1 line-clamp-2 text-sm">{garment.description}</p>
            </div>
            <div className="flex flex-wrap gap-2">
              <button
                type="button"
                className={smallButtonClassName}
                aria-label={`Edit ${garment.name}`}
                onClick={() => onEdit({ form: 'garment', garment })}
              >
                Edit
              </button>
              <RetireControl kind="garments" id={garment.id} name={garment.name} isActive={garment.isActive} />
            </div>
          </div>
          <div className="grid min-w-0 gap-2">
            <div className="flex items-center justify-between gap-2">
              <h4 className="text-sm font-semibold">Sizes</h4>
              <button
                type="button"
                className={smallButtonClassName}
                aria-label={`Add a size to ${garment.name}`}
                onClick={() => onEdit({ form: 'size', garment })}
              >
                Add size
              </button>
            </div>
            <SizeTable garment={garment} onEdit={onEdit} />
          </div>
          <div className="grid min-w-0 gap-2">
            <div className="flex items-center justify-between gap-2">
              <h4 className="text-sm font-semibold">Fabric colours</h4>
              <button
                type="button"
                className={smallButtonClassName}
                aria-label={`Add a colour to ${garment.name}`}
                onClick={() => onEdit({ form: 'colour', garment })}
              >
                Add colour
              </button>
            </div>
            {garment.colours.length === 0 && <p className="text-sm text-walnut-500">No colours yet.</p>}
            <ul className="flex flex-wrap gap-2">
              {garment.colours.map((colour) => (
                <li
                  key={colour.id}
                  className="flex items-center gap-2 rounded-lg border border-linen-200 bg-linen-50 p-1.5 pr-2 text-sm"
                >
                  <span
                    className="h-8 w-8 rounded-md border border-walnut-900/15"
                    style={{ backgroundColor: colour.hex }}
                    aria-hidden="true"
                  />
                  <span>
                    <span className="block font-medium leading-tight">{colour.name}</span>
                    <span className="block text-xs text-walnut-500">{colour.hex}</span>
                  </span>
                  <button
                    type="button"
                    className={smallButtonClassName}
                    aria-label={`Edit colour ${colour.name}`}
                    onClick={() => onEdit({ form: 'colour', garment, colour })}
                  >
                    Edit
                  </button>
                  <DeletePart
                    part="colours"
                    garmentId={garment.id}
                    partId={colour.id}
                    name={colour.name}
                    isInUse={colour.isInUse}
                  />
                </li>
              ))}
            </ul>
          </div>
        </li>
      ))}
    </ul>
  );
}
