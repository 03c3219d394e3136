import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  createGarmentRequest,
  fabricConstructions,
  garmentKinds,
  type StudioGarment,
} from '@server/contracts/admin-catalogue-garments.ts';
import { garmentClosures, garmentUses } from '@server/contracts/guidance.ts';
import { cautionsForGarment } from '@server/engine/index.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { asNumber, Field, inputClassName, saveOrShowErrors, slugFrom } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';
import { ChoiceBoxes } from './choice-boxes.tsx';
import { SvgPicture } from './svg-picture.tsx';

const fieldNames = [
  'slug',
  'name',
  'kind',
  'description',
  'fabricType',
  'isNapped',
  'minAgeMonths',
  'maxAgeMonths',
  'tiePlaces',
  'drawstringPlaces',
  'closure',
  'closesAtNeck',
  'intendedUse',
  'mockupSvg',
] as const;

const placeChoices = [
  { value: 'hood', label: 'Hood' },
  { value: 'neck', label: 'Neck (under the chin)' },
  { value: 'waist', label: 'Waist' },
] as const;
const closureLabels: Record<(typeof garmentClosures)[number], string> = {
  none: 'Nothing (pulls on)',
  snaps: 'Snaps',
  buttons: 'Buttons',
  hook_and_loop: 'Hook-and-loop tab',
  ties: 'Ties',
  zip: 'Zip',
};
const useLabels: Record<(typeof garmentUses)[number], string> = {
  day_wear: 'Day wear',
  sleepwear: 'Sleepwear (pyjamas, nightgowns, sleep sacks)',
};

export const garmentKindLabels: Record<(typeof garmentKinds)[number], string> = {
  dress: 'Dress',
  romper: 'Romper',
  bishop_dress: 'Bishop dress',
  bib: 'Bib',
  bonnet: 'Bonnet',
};
const fabricLabels: Record<(typeof fabricConstructions)[number], string> = {
  woven: 'Woven (stable)',
  knit: 'Knit (stretches)',
  sheer: 'Sheer (shows the backing)',
};

/** Adds a garment or edits one: what it is, who wears it, how its fabric behaves, and its flat drawing. */
export function GarmentForm({ garment, onDone }: { garment?: StudioGarment; onDone: () => void }) {
  const save = useSaveCatalogueRow('garments');
  const { register, formState, watch, setValue, setError, clearErrors, handleSubmit } = useForm({
    resolver: zodResolver(createGarmentRequest),
    defaultValues: garment
      ? {
          slug: garment.slug,
          name: garment.name,
          kind: garment.kind as (typeof garmentKinds)[number],
          description: garment.description,
          fabricType: garment.fabricType as (typeof fabricConstructions)[number],
          isNapped: garment.isNapped,
          minAgeMonths: garment.minAgeMonths,
          maxAgeMonths: garment.maxAgeMonths,
          ...garment.safety,
          mockupSvg: garment.mockupSvg,
        }
      : {
          slug: '',
          name: '',
          kind: 'dress' as const,
          description: '',
          fabricType: 'woven' as const,
          isNapped: false,
          tiePlaces: [],
          drawstringPlaces: [],
          closure: 'none' as const,
          closesAtNeck: false,
          intendedUse: 'day_wear' as const,
          mockupSvg: '',
        },
  });
  const errors = formState.errors;
  const mockupSvg = watch('mockupSvg');
  const youngestMonths = watch('minAgeMonths');
  const [tiePlaces, drawstringPlaces, closure, closesAtNeck, intendedUse] = watch([
    'tiePlaces',
    'drawstringPlaces',
    'closure',
    'closesAtNeck',
    'intendedUse',
  ]);
  // The cautions for the youngest wearer the garment is made for, as the storefront shows them on its smallest size.
  const cautions = cautionsForGarment(
    {
      tiePlaces: Array.isArray(tiePlaces) ? tiePlaces : [],
      drawstringPlaces: Array.isArray(drawstringPlaces) ? drawstringPlaces : [],
      closure: closure ?? 'none',
      closesAtNeck: Boolean(closesAtNeck),
      intendedUse: intendedUse ?? 'day_wear',
    },
    typeof youngestMonths === 'number' && youngestMonths >= 0 ? youngestMonths : 0,
    false,
  );

  async function readDrawing(file: File | undefined) {
    clearErrors('mockupSvg');
    if (!file) return;
    if (file.size > 500_000)
      return setError('mockupSvg', { type: 'file', message: 'That drawing is over 500 kB; simplify it first.' });
    setValue('mockupSvg', await file.text(), { shouldValidate: true });
  }

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(() => save.mutateAsync({ id: garment?.id, body: values }), setError, fieldNames, onDone),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Name" error={errors.name?.message}>
          <input
            className={inputClassName}
            {...register('name', { onChange: (event) => !garment && setValue('slug', slugFrom(event.target.value)) })}
          />
        </Field>
        <Field
          label="Web address name"
          error={errors.slug?.message}
          hint={garment ? 'Fixed once created: it is the garment’s page address.' : undefined}
        >
          <input className={inputClassName} readOnly={Boolean(garment)} {...register('slug')} />
        </Field>
        <Field label="Kind" error={errors.kind?.message}>
          <select className={inputClassName} {...register('kind')}>
            {garmentKinds.map((kind) => (
              <option key={kind} value={kind}>
                {garmentKindLabels[kind]}
              </option>
            ))}
          </select>
        </Field>
        <Field
          label="Fabric"
          error={errors.fabricType?.message}
          hint="Guides the stabilizer advice on the production sheet."
        >
          <select className={inputClassName} {...register('fabricType')}>
            {fabricConstructions.map((fabric) => (
              <option key={fabric} value={fabric}>
                {fabricLabels[fabric]}
              </option>
            ))}
          </select>
        </Field>
        <Field
          label="Youngest wearer (months)"
          error={errors.minAgeMonths?.message}
          hint="Under 36 months brings the small-parts caution."
        >
          <input
            type="number"
            inputMode="numeric"
            className={inputClassName}
            {...register('minAgeMonths', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Oldest wearer (months)" error={errors.maxAgeMonths?.message}>
          <input
            type="number"
            inputMode="numeric"
            className={inputClassName}
            {...register('maxAgeMonths', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Description" error={errors.description?.message} className="sm:col-span-2">
          <textarea rows={3} className={inputClassName} {...register('description')} />
        </Field>
        <label className="flex min-h-10 items-center gap-2 text-sm">
          <input type="checkbox" className="h-5 w-5 accent-madder-600" {...register('isNapped')} />
          Napped fabric (terry, velvet): stitching needs a topping
        </label>
      </div>
      <fieldset className="grid gap-4 rounded-lg border border-linen-200 p-3 sm:grid-cols-2">
        <legend className="px-1 text-sm font-medium">Safety facts (the cautions customers see come from these)</legend>
        <ChoiceBoxes
          legend="Ribbon ties at"
          choices={placeChoices}
          register={register('tiePlaces')}
          error={errors.tiePlaces?.message}
        />
        <ChoiceBoxes
          legend="Drawstrings at"
          choices={placeChoices}
          register={register('drawstringPlaces')}
          error={errors.drawstringPlaces?.message}
        />
        <Field label="Fastens with" error={errors.closure?.message}>
          <select className={inputClassName} {...register('closure')}>
            {garmentClosures.map((kind) => (
              <option key={kind} value={kind}>
                {closureLabels[kind]}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Made as" error={errors.intendedUse?.message}>
          <select className={inputClassName} {...register('intendedUse')}>
            {garmentUses.map((use) => (
              <option key={use} value={use}>
                {useLabels[use]}
              </option>
            ))}
          </select>
        </Field>
        <label className="flex min-h-10 items-center gap-2 text-sm sm:col-span-2">
          <input type="checkbox" className="h-5 w-5 accent-madder-600" {...register('closesAtNeck')} />
          The fastening goes round the neck (a bib’s snap, a bonnet’s ties)
        </label>
      </fieldset>
      {cautions.ok && (
        <aside
          aria-label="Safety notes for this garment"
          className="grid gap-1 rounded-lg border border-saffron-500/50 bg-saffron-100 p-3 text-sm"
        >
          <p className="font-medium">Safety notes customers will see</p>
          <ul className="grid gap-1">
            {cautions.messages.map((message) => (
              <li key={message.code}>
                <span className="font-medium">{message.title}:</span> {message.text}
              </li>
            ))}
          </ul>
          <p className="text-xs text-walnut-700">
            Do not offer a garment as sleepwear unless the garment and the embroidery meet the sleepwear flammability
            rules where you sell.
          </p>
        </aside>
      )}
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem] sm:items-start">
        <Field
          label="Flat drawing (SVG, viewBox in mm)"
          error={errors.mockupSvg?.message}
          hint="Drawn at the reference size; sizes scale it."
        >
          <input
            type="file"
            accept=".svg,image/svg+xml"
            className={inputClassName}
            onChange={(event) => void readDrawing(event.target.files?.[0])}
          />
        </Field>
        {mockupSvg ? (
          <SvgPicture
            svg={mockupSvg}
            label="The garment drawing"
            className="h-40 w-40 rounded-lg border border-linen-200 bg-white p-2"
          />
        ) : null}
      </div>
      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={garment ? 'Save garment' : 'Add garment'}
      />
    </form>
  );
}
