import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createThreadRequest } from '@server/contracts/admin-catalogue-threads.ts';
import type { StudioThread } from '@server/contracts/admin-catalogue.ts';
import { hexToLab } from '@server/engine/index.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { asNumber, Field, inputClassName, saveOrShowErrors } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';
import { ColourPicker, isHexColour } from './colour-picker.tsx';

const fieldNames = ['code', 'name', 'hex', 'lab'] as const;

/** A stored CIELAB that is not the one the hex converts to was entered from a measurement. */
function isMeasured(thread: StudioThread): boolean {
  const fromHex = hexToLab(thread.hex);
  return (
    !fromHex ||
    Math.abs(fromHex.l - thread.lab.l) + Math.abs(fromHex.a - thread.lab.a) + Math.abs(fromHex.b - thread.lab.b) > 0.01
  );
}

/**
 * Adds a thread or edits one. CIELAB is worked out by the server from the hex colour unless the studio enters the
 * values it measured from the spool; the form shows the worked-out value as the colour is typed.
 */
export function ThreadForm({ thread, onDone }: { thread?: StudioThread; onDone: () => void }) {
  const save = useSaveCatalogueRow('threads');
  const { register, formState, watch, setValue, setError, handleSubmit } = useForm({
    resolver: zodResolver(createThreadRequest),
    defaultValues: thread
      ? { code: thread.code, name: thread.name, hex: thread.hex, lab: isMeasured(thread) ? thread.lab : undefined }
      : { code: '', name: '', hex: '#C8A2C8', lab: undefined },
  });
  const errors = formState.errors;
  const hex = watch('hex') ?? '';
  const lab = isHexColour(hex) ? hexToLab(hex) : undefined;
  const measuredLab = watch('lab');

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(() => save.mutateAsync({ id: thread?.id, body: values }), setError, fieldNames, onDone),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Code on the spool"
          error={errors.code?.message}
          hint={thread ? 'Fixed once created: designs name threads by it.' : 'For example WB-140.'}
        >
          <input className={inputClassName} readOnly={Boolean(thread)} {...register('code')} />
        </Field>
        <Field label="Colour name" error={errors.name?.message}>
          <input className={inputClassName} {...register('name')} />
        </Field>
        <Field
          label="Colour (hex)"
          error={errors.hex?.message}
          hint={
            lab && !measuredLab
              ? `CIELAB ${lab.l.toFixed(1)}, ${lab.a.toFixed(1)}, ${lab.b.toFixed(1)}, worked out from the hex (D65)`
              : undefined
          }
        >
          <input className={inputClassName} {...register('hex')} />
        </Field>
        <fieldset className="grid gap-2 sm:col-span-2">
          <legend className="sr-only">CIELAB</legend>
          <label className="flex min-h-10 items-center gap-2 text-sm">
            <input
              type="checkbox"
              className="h-5 w-5 accent-madder-600"
              checked={measuredLab !== undefined}
              onChange={(event) => setValue('lab', event.target.checked ? (lab ?? { l: 50, a: 0, b: 0 }) : undefined)}
            />
            We measured this thread’s CIELAB ourselves
          </label>
          {measuredLab && (
            <div className="grid grid-cols-3 gap-3">
              {(['l', 'a', 'b'] as const).map((axis) => (
                <Field key={axis} label={`${axis.toUpperCase()}*`} error={errors.lab?.[axis]?.message}>
                  <input
                    type="number"
                    step="0.01"
                    inputMode="decimal"
                    className={inputClassName}
                    {...register(`lab.${axis}`, { setValueAs: asNumber })}
                  />
                </Field>
              ))}
            </div>
          )}
        </fieldset>
        <ColourPicker
          hex={hex}
          onPick={(picked) => setValue('hex', picked, { shouldValidate: true })}
          swatchClassName="h-12 w-12 rounded-full shadow-inner"
        />
      </div>
      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={thread ? 'Save thread' : 'Add thread'}
      />
    </form>
  );
}
