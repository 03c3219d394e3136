import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createFontRequest } from '@server/contracts/admin-catalogue-fonts.ts';
import type { StudioFont } from '@server/contracts/admin-catalogue.ts';
import { useShippedFonts } from '../api/get-shipped-fonts.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { asNumber, Field, inputClassName, saveOrShowErrors, slugFrom } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';

const fieldNames = ['slug', 'fontsourcePackage', 'name', 'minHeightMm', 'maxHeightMm'] as const;

/** Adds one of the fonts shipped with the shop to the lettering choices, or edits one's name and letter heights. */
export function FontForm({ font, onDone }: { font?: StudioFont; onDone: () => void }) {
  const save = useSaveCatalogueRow('fonts');
  const shipped = useShippedFonts();
  const { register, formState, watch, setValue, setError, handleSubmit } = useForm({
    resolver: zodResolver(createFontRequest),
    defaultValues: font
      ? {
          slug: font.slug,
          name: font.name,
          fontsourcePackage: font.fontsourcePackage,
          minHeightMm: font.minHeightMm,
          maxHeightMm: font.maxHeightMm,
        }
      : { slug: '', name: '', fontsourcePackage: '' },
  });
  const errors = formState.errors;
  const chosen = shipped.data?.fonts.find((f) => f.fontsourcePackage === watch('fontsourcePackage'));
  const family = font?.fontFamily ?? chosen?.fontFamily;

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(() => save.mutateAsync({ id: font?.id, body: values }), setError, fieldNames, onDone),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        {font ? (
          <Field label="Font file" hint="Fixed once created: saved designs were measured with it.">
            <input className={inputClassName} readOnly value={font.fontFamily} />
          </Field>
        ) : (
          <Field
            label="Font file"
            error={errors.fontsourcePackage?.message}
            hint="Only fonts shipped with the shop, so every letter can be measured."
          >
            <select className={inputClassName} {...register('fontsourcePackage')}>
              <option value="">{shipped.isPending ? 'Loading the shipped fonts…' : 'Choose a font'}</option>
              {(shipped.data?.fonts ?? []).map((f) => (
                <option key={f.fontsourcePackage} value={f.fontsourcePackage}>
                  {f.fontFamily}
                  {f.isInCatalogue ? ' (already offered under another name)' : ''}
                </option>
              ))}
            </select>
          </Field>
        )}
        <Field label="Name customers see" error={errors.name?.message}>
          <input
            className={inputClassName}
            {...register('name', { onChange: (event) => !font && setValue('slug', slugFrom(event.target.value)) })}
          />
        </Field>
        <Field label="Short name" error={errors.slug?.message} hint={font ? 'Fixed once created.' : undefined}>
          <input className={inputClassName} readOnly={Boolean(font)} {...register('slug')} />
        </Field>
        <div className="grid grid-cols-2 gap-3">
          <Field label="Smallest letters (mm)" error={errors.minHeightMm?.message}>
            <input
              type="number"
              step="0.5"
              inputMode="decimal"
              className={inputClassName}
              {...register('minHeightMm', { setValueAs: asNumber })}
            />
          </Field>
          <Field label="Largest letters (mm)" error={errors.maxHeightMm?.message}>
            <input
              type="number"
              step="0.5"
              inputMode="decimal"
              className={inputClassName}
              {...register('maxHeightMm', { setValueAs: asNumber })}
            />
          </Field>
        </div>
      </div>
      {family && (
        <p
          className="rounded-lg border border-linen-200 bg-white p-3 text-3xl"
          style={{ fontFamily: `"${family}", cursive` }}
        >
          Amelia Rose
        </p>
      )}
      {shipped.isError && (
        <p role="alert" className="text-sm text-madder-700">
          {shipped.error.message}
        </p>
      )}
      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={font ? 'Save font' : 'Add font'}
      />
    </form>
  );
}
