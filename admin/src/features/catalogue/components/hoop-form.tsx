import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createHoopRequest, DEFAULT_HOOP_CLEARANCE_MM } from '@server/contracts/admin-catalogue-hoops.ts';
import type { StudioHoop } from '@server/contracts/admin-catalogue.ts';
import { formatLength } from '@ui/format.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { asNumber, Field, inputClassName, saveOrShowErrors, slugFrom } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';

const fieldNames = ['slug', 'name', 'fieldWidthMm', 'fieldHeightMm', 'clearanceMm'] as const;

/** Adds a hoop or edits one; the sewing field is drawn as it is typed. */
export function HoopForm({ hoop, onDone }: { hoop?: StudioHoop; onDone: () => void }) {
  const save = useSaveCatalogueRow('hoops');
  const form = useForm({
    resolver: zodResolver(createHoopRequest),
    defaultValues: hoop
      ? {
          slug: hoop.slug,
          name: hoop.name,
          fieldWidthMm: hoop.fieldWidthMm,
          fieldHeightMm: hoop.fieldHeightMm,
          clearanceMm: hoop.clearanceMm,
        }
      : { slug: '', name: '', clearanceMm: DEFAULT_HOOP_CLEARANCE_MM },
  });
  const { register, formState, watch, setValue, setError, handleSubmit } = form;
  const errors = formState.errors;
  const [widthMm, heightMm] = [Number(watch('fieldWidthMm')) || 0, Number(watch('fieldHeightMm')) || 0];
  const clearanceMm = Math.max(0, Number(watch('clearanceMm')) || 0);
  const scale = 120 / Math.max(widthMm, heightMm, 1);

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(() => save.mutateAsync({ id: hoop?.id, body: values }), setError, fieldNames, onDone),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Name" error={errors.name?.message}>
          <input
            className={inputClassName}
            {...register('name', { onChange: (event) => !hoop && setValue('slug', slugFrom(event.target.value)) })}
          />
        </Field>
        <Field
          label="Short name"
          error={errors.slug?.message}
          hint={hoop ? 'Fixed once created.' : 'Lower-case, joined by hyphens.'}
        >
          <input className={inputClassName} readOnly={Boolean(hoop)} {...register('slug')} />
        </Field>
        <Field
          label="Sewing field width (mm)"
          error={errors.fieldWidthMm?.message}
          hint="The area the machine reaches, not the frame."
        >
          <input
            type="number"
            step="0.1"
            inputMode="decimal"
            className={inputClassName}
            {...register('fieldWidthMm', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Sewing field height (mm)" error={errors.fieldHeightMm?.message}>
          <input
            type="number"
            step="0.1"
            inputMode="decimal"
            className={inputClassName}
            {...register('fieldHeightMm', { setValueAs: asNumber })}
          />
        </Field>
        <Field
          label="Clearance at each edge (mm)"
          error={errors.clearanceMm?.message}
          hint={`Kept free inside the sewing field all round; every hooping is planned inside it. A few mm is usual (${DEFAULT_HOOP_CLEARANCE_MM} mm by default).`}
        >
          <input
            type="number"
            step="0.5"
            inputMode="decimal"
            className={inputClassName}
            {...register('clearanceMm', { setValueAs: asNumber })}
          />
        </Field>
      </div>
      {widthMm > 0 && heightMm > 0 && (
        <figure className="flex items-center gap-4 text-sm text-walnut-500">
          <div
            className="flex items-center justify-center rounded-md border-2 border-dashed border-walnut-500 bg-linen-100"
            style={{ width: widthMm * scale, height: heightMm * scale }}
            aria-hidden="true"
          >
            <div
              className="rounded-sm border border-walnut-300 bg-white"
              style={{
                width: Math.max(0, widthMm - 2 * clearanceMm) * scale,
                height: Math.max(0, heightMm - 2 * clearanceMm) * scale,
              }}
            />
          </div>
          <figcaption>
            {formatLength(widthMm)} × {formatLength(heightMm)}
            {clearanceMm > 0 && (
              <span className="block">
                {formatLength(Math.max(0, widthMm - 2 * clearanceMm))} ×{' '}
                {formatLength(Math.max(0, heightMm - 2 * clearanceMm))} to sew in
              </span>
            )}
          </figcaption>
        </figure>
      )}
      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={hoop ? 'Save hoop' : 'Add hoop'}
      />
    </form>
  );
}
