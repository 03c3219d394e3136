import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { fabricColourRequest, type StudioGarment } from '@server/contracts/admin-catalogue-garments.ts';
import { useSaveGarmentPart } from '../api/save-garment-part.ts';
import { Field, inputClassName, saveOrShowErrors } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';
import { ColourPicker } from './colour-picker.tsx';

type StudioColour = StudioGarment['colours'][number];

/** Adds a fabric colour to a garment or edits one, with the swatch as it will show on the mockup. */
export function ColourForm({
  garmentId,
  colour,
  onDone,
}: {
  garmentId: number;
  colour?: StudioColour;
  onDone: () => void;
}) {
  const save = useSaveGarmentPart();
  const { register, formState, watch, setValue, setError, handleSubmit } = useForm({
    resolver: zodResolver(fabricColourRequest),
    defaultValues: colour ? { name: colour.name, hex: colour.hex } : { name: '', hex: '#F4E4D4' },
  });
  const errors = formState.errors;
  const hex = watch('hex') ?? '';

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(
      () => save.mutateAsync({ target: { part: 'colours', garmentId, partId: colour?.id }, body: values }),
      setError,
      ['name', 'hex'],
      onDone,
    ),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Colour name" error={errors.name?.message}>
          <input className={inputClassName} {...register('name')} />
        </Field>
        <Field label="Colour (hex)" error={errors.hex?.message}>
          <input className={inputClassName} {...register('hex')} />
        </Field>
      </div>
      <ColourPicker
        hex={hex}
        onPick={(picked) => setValue('hex', picked, { shouldValidate: true })}
        swatchClassName="h-16 flex-1 rounded-lg"
      />
      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={colour ? 'Save colour' : 'Add colour'}
      />
    </form>
  );
}
