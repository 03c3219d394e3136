import { Button } from '@ui/components/button.tsx';
import { FormError } from './form-field.tsx';

/** The foot of every catalogue form: the general error, then cancel and save. */
export function FormActions({
  isSaving,
  error,
  onCancel,
  saveLabel = 'Save',
}: {
  isSaving: boolean;
  error?: string;
  onCancel: () => void;
  saveLabel?: string;
}) {
  return (
    <div className="grid gap-3">
      <FormError message={error} />
      <div className="flex flex-wrap justify-end gap-2">
        <Button tone="quiet" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" disabled={isSaving}>
          {isSaving ? 'Saving…' : saveLabel}
        </Button>
      </div>
    </div>
  );
}
