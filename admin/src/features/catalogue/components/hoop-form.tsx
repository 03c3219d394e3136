import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createHoopRequest } from '@server/contracts/admin-catalogue-hoops.ts';
import type { StudioHoop } from '@server/contracts/admin-catalogue.ts';
import { formatLength } from '@ui/format.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { asNumber, Field, inputClassName, saveOrShowErrors, slugFrom } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';

const fieldNames = ['slug', 'name', 'fieldWidthMm', 'fieldHeightMm'] as const;

/** Adds a hoop or edits one; the sewing field is drawn as it is typed. */
export function HoopForm({ hoop, onDone }: { hoop?: StudioHoop; onDone: () => void }) {
  const save = useSaveCatalogueRow('hoops');
  const form = useForm({
    resolver: zodResolver(createHoopRequest),
    defaultValues: hoop
      ? { slug: hoop.slug, name: hoop.name, fieldWidthMm: hoop.fieldWidthMm, fieldHeightMm: hoop.fieldHeightMm }
      : { slug: '', name: '' },
  });
  const { register, formState, watch, setValue, setError, handleSubmit } = form;
  const errors = formState.errors;
  const [widthMm, heightMm] = [Number(watch('fieldWidthMm')) || 0, Number(watch('fieldHeightMm')) || 0];
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
      </div>
      {widthMm > 0 && heightMm > 0 && (
        <figure className="flex items-center gap-4 text-sm text-walnut-500">
          <div
            className="rounded-md border-2 border-dashed border-walnut-500 bg-linen-100"
            style={{ width: widthMm * scale, height: heightMm * scale }}
            aria-hidden="true"
          />
          <figcaption>
            {formatLength(widthMm)} × {formatLength(heightMm)}
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
