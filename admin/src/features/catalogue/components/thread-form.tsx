import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createThreadRequest } from '@server/contracts/admin-catalogue-threads.ts';
import type { StudioThread } from '@server/contracts/admin-catalog.ts';
import { hexToLab } from '@server/engine/index.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { Field, inputClassName, saveOrShowErrors } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';
import { ColourPicker, isHexColour } from './colour-picker.tsx';

const fieldNames = ['code', 'name', 'hex', 'lab'] as const;

/**
 * Adds a thread or edits one. CIELAB is left to the server, which works it out from the hex colour; the form shows
 * that value as the colour is typed.
 */
export function ThreadForm({ thread, onDone }: { thread?: StudioThread; onDone: () => void }) {
  const save = useSaveCatalogueRow('threads');
  const { register, formState, watch, setValue, setError, handleSubmit } = useForm({
    resolver: zodResolver(createThreadRequest),
    defaultValues: thread ? { code: thread.code, name: thread.name, hex: thread.hex } : { code: '', name: '', hex: '#C8A2C8' },
  });
  const errors = formState.errors;
  const hex = watch('hex') ?? '';
  const lab = isHexColour(hex) ? hexToLab(hex) : undefined;

  const onSubmit = handleSubmit((values) => saveOrShowErrors(() => save.mutateAsync({ id: thread?.id, body: { ...values, lab: undefined } }), setError, fieldNames, onDone));

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Code on the spool" error={errors.code?.message} hint={thread ? 'Fixed once created: designs name threads by it.' : 'For example WB-140.'}>
          <input className={inputClassName} readOnly={Boolean(thread)} {...register('code')} />
        </Field>
        <Field label="Colour name" error={errors.name?.message}>
          <input className={inputClassName} {...register('name')} />
        </Field>
        <Field label="Colour (hex)" error={errors.hex?.message} hint={lab ? `CIELAB ${lab.l.toFixed(1)}, ${lab.a.toFixed(1)}, ${lab.b.toFixed(1)} (worked out from the hex)` : undefined}>
          <input className={inputClassName} {...register('hex')} />
        </Field>
        <ColourPicker hex={hex} onPick={(picked) => setValue('hex', picked, { shouldValidate: true })} swatchClassName="h-12 w-12 rounded-full shadow-inner" />
      </div>
      <FormActions isSaving={save.isPending} error={errors.root?.server?.message} onCancel={onDone} saveLabel={thread ? 'Save thread' : 'Add thread'} />
    </form>
  );
}
