import { useId, useState, type FormEvent } from 'react';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { useRenameDesign } from '../api/rename-design.ts';

const MAX_NAME_LENGTH = 80;

/** Renames a design in place; the server's message for a bad name shows under the field. */
export function RenameDesignForm({ design, onDone }: { design: SavedDesign; onDone: () => void }) {
  const fieldId = useId();
  const errorId = useId();
  const [name, setName] = useState(design.name);
  const rename = useRenameDesign();
  const fieldError =
    rename.error instanceof ApiError ? (rename.error.fields?.name ?? rename.error.message) : rename.error?.message;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    rename.mutate({ id: design.id, request: { name } }, { onSuccess: onDone });
  };
  return (
    <form onSubmit={submit} className="space-y-2">
      <label htmlFor={fieldId} className="block text-sm font-medium">
        New name
      </label>
      <input
        id={fieldId}
        value={name}
        maxLength={MAX_NAME_LENGTH}
        autoFocus
        aria-invalid={fieldError ? true : undefined}
        aria-describedby={fieldError ? errorId : undefined}
        onChange={(event) => setName(event.target.value)}
        className="block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3"
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
