import { useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { garmentSizeRequest, zoneCodes, type StudioGarment } from '@server/contracts/admin-catalogue-garments.ts';
import { formatLength } from '@ui/format.ts';
import { useSaveGarmentPart } from '../api/save-garment-part.ts';
import {
  asNumber,
  asNumberOrNull,
  Field,
  inputClassName,
  saveOrShowErrors,
  smallButtonClassName,
} from './form-field.tsx';
import { FormActions } from './form-actions.tsx';

type StudioSize = StudioGarment['sizes'][number];
type ZoneCode = (typeof zoneCodes)[number];

const zoneLabels: Record<ZoneCode, string> = {
  hem: 'Hem border',
  chest: 'Chest',
  collar: 'Collar',
  bib_centre: 'Bib centre',
  brim: 'Brim',
};
/** 1¾ in above the hem: where a border's centre line commonly sits (common practice, no source). */
const usualHemOffsetMm = 44.45;
const fieldNames = [
  'code',
  'label',
  'minAgeMonths',
  'maxAgeMonths',
  'hemFrontMm',
  'hemCircumferenceMm',
  'mockupScale',
  'zones',
] as const;

/**
 * Adds a size to a garment or edits one: its hem lengths at the guide line, the scale its drawing is shown at, and
 * the places embroidery may go, in this size's millimetres on the drawing.
 */
export function SizeForm({ garment, size, onDone }: { garment: StudioGarment; size?: StudioSize; onDone: () => void }) {
  const save = useSaveGarmentPart();
  const { register, control, formState, watch, setError, handleSubmit } = useForm({
    resolver: zodResolver(garmentSizeRequest),
    defaultValues: size
      ? {
          code: size.code,
          label: size.label,
          minAgeMonths: size.minAgeMonths,
          maxAgeMonths: size.maxAgeMonths,
          hemFrontMm: size.hemFrontMm,
          hemCircumferenceMm: size.hemCircumferenceMm,
          mockupScale: size.mockupScale,
          zones: size.zones.map((zone) => ({ ...zone, code: zone.code as ZoneCode })),
        }
      : {
          code: '',
          label: '',
          minAgeMonths: garment.minAgeMonths,
          maxAgeMonths: garment.maxAgeMonths,
          hemFrontMm: null,
          hemCircumferenceMm: null,
          mockupScale: 1,
          zones: [],
        },
  });
  const zones = useFieldArray({ control, name: 'zones' });
  const errors = formState.errors;
  const hemFrontMm = watch('hemFrontMm');

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(
      () => save.mutateAsync({ target: { part: 'sizes', garmentId: garment.id, partId: size?.id }, body: values }),
      setError,
      fieldNames,
      onDone,
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Size code" error={errors.code?.message} hint="For example 2T or 12m.">
          <input className={inputClassName} {...register('code')} />
        </Field>
        <Field label="Label" error={errors.label?.message}>
          <input className={inputClassName} {...register('label')} />
        </Field>
        <Field
          label="Youngest wearer of this size (months)"
          error={errors.minAgeMonths?.message}
          hint="The safety cautions for this size assume this child: under 36 months brings the small-parts ones."
        >
          <input
            type="number"
            inputMode="numeric"
            className={inputClassName}
            {...register('minAgeMonths', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Oldest wearer of this size (months)" error={errors.maxAgeMonths?.message}>
          <input
            type="number"
            inputMode="numeric"
            className={inputClassName}
            {...register('maxAgeMonths', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Drawing scale" error={errors.mockupScale?.message} hint="1 = the drawing’s reference size.">
          <input
            type="number"
            step="0.0001"
            inputMode="decimal"
            className={inputClassName}
            {...register('mockupScale', { setValueAs: asNumber })}
          />
        </Field>
        <Field
          label="Front hem (mm)"
          error={errors.hemFrontMm?.message}
          hint={
            typeof hemFrontMm === 'number' && hemFrontMm > 0
              ? formatLength(hemFrontMm)
              : 'Leave empty if it takes no hem border.'
          }
        >
          <input
            type="number"
            step="0.1"
            inputMode="decimal"
            className={inputClassName}
            {...register('hemFrontMm', { setValueAs: asNumberOrNull })}
          />
        </Field>
        <Field label="Hem all round (mm)" error={errors.hemCircumferenceMm?.message}>
          <input
            type="number"
            step="0.1"
            inputMode="decimal"
            className={inputClassName}
            {...register('hemCircumferenceMm', { setValueAs: asNumberOrNull })}
          />
        </Field>
      </div>

      <fieldset className="grid gap-3">
        <legend className="text-sm font-medium text-walnut-700">
          Places for embroidery (mm on this size’s drawing)
        </legend>
        {errors.zones?.message && <p className="text-sm text-madder-700">{errors.zones.message}</p>}
        {zones.fields.map((zone, index) => {
          const zoneErrors = errors.zones?.[index];
          return (
            <div key={zone.id} className="grid gap-3 rounded-lg border border-linen-200 bg-white p-3 sm:grid-cols-4">
              <Field label="Place" error={zoneErrors?.code?.message}>
                <select className={inputClassName} {...register(`zones.${index}.code`)}>
                  {zoneCodes.map((code) => (
                    <option key={code} value={code}>
                      {zoneLabels[code]}
                    </option>
                  ))}
                </select>
              </Field>
              <Field label="Label" error={zoneErrors?.label?.message}>
                <input className={inputClassName} {...register(`zones.${index}.label`)} />
              </Field>
              <Field
                label="Above the hem (mm)"
                error={zoneErrors?.hemOffsetMm?.message}
                hint="Hem borders: the border’s centre line."
              >
                <input
                  type="number"
                  step="0.01"
                  inputMode="decimal"
                  className={inputClassName}
                  {...register(`zones.${index}.hemOffsetMm`, { setValueAs: asNumber })}
                />
              </Field>
              <div className="flex items-end">
                <button type="button" className={smallButtonClassName} onClick={() => zones.remove(index)}>
                  Remove place
                </button>
              </div>
              {(['xMm', 'yMm', 'widthMm', 'heightMm'] as const).map((key) => (
                <Field
                  key={key}
                  label={{ xMm: 'From left', yMm: 'From top', widthMm: 'Width', heightMm: 'Height' }[key]}
                  error={zoneErrors?.[key]?.message}
                >
                  <input
                    type="number"
                    step="0.1"
                    inputMode="decimal"
                    className={inputClassName}
                    {...register(`zones.${index}.${key}`, { setValueAs: asNumber })}
                  />
                </Field>
              ))}
            </div>
          );
        })}
        <div>
          <button
            type="button"
            className={smallButtonClassName}
            onClick={() =>
              zones.append({
                code: garment.sizes.length === 0 && zones.fields.length === 0 ? 'hem' : 'chest',
                label: zones.fields.length === 0 ? 'Hem' : 'Chest',
                xMm: 0,
                yMm: 0,
                widthMm: 100,
                heightMm: 50,
                hemOffsetMm: zones.fields.length === 0 ? usualHemOffsetMm : undefined,
              })
            }
          >
            Add a place
          </button>
        </div>
      </fieldset>
      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={size ? 'Save size' : 'Add size'}
      />
    </form>
  );
}
