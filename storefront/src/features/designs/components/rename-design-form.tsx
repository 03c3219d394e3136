import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { designName, type SavedDesign } from '@server/contracts/saved-designs.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { useRenameDesign } from '../api/rename-design.ts';

const MAX_NAME_LENGTH = 80;
const renameFields = z.object({ name: designName });

/** Renames a design in place; the server's message for a bad name shows under the field. */
export function RenameDesignForm({ design, onDone }: { design: SavedDesign; onDone: () => void }) {
  const fieldId = useId();
  const errorId = useId();
  const rename = useRenameDesign();
  const { register, formState, setError, handleSubmit } = useForm({
    resolver: zodResolver(renameFields),
    defaultValues: { name: design.name },
  });
  const fieldError = formState.errors.name?.message;
  const submit = handleSubmit(({ name }) =>
    rename.mutate(
      { id: design.id, request: { name } },
      {
        onSuccess: onDone,
        onError: (error) =>
          setError('name', {
            type: 'server',
            message: error instanceof ApiError ? (error.fields?.name ?? error.message) : error.message,
          }),
      },
    ),
  );
  return (
    <form onSubmit={submit} noValidate className="space-y-2">
      <label htmlFor={fieldId} className="block text-sm font-medium">
        New name
      </label>
      <input
        id={fieldId}
        maxLength={MAX_NAME_LENGTH}
        autoFocus
        aria-invalid={fieldError ? true : undefined}
        aria-describedby={fieldError ? errorId : undefined}
        className="block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3"
        {...register('name')}
      />
      {fieldError && (
        <p id={errorId} role="alert" className="text-sm text-madder-700">
          {fieldError}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={rename.isPending}>
          {rename.isPending ? 'Saving…' : 'Save the name'}
        </Button>
        <Button tone="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
