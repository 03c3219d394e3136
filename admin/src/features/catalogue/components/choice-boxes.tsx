import type { UseFormRegisterReturn } from 'react-hook-form';

/**
 * A group of tick boxes that fills one array field: each ticked box adds its value. `register` is the field's
 * registration, shared by every box, as react-hook-form reads a group of boxes with one name as a list.
 */
export function ChoiceBoxes<Value extends string>({
  legend,
  choices,
  register,
  error,
}: {
  legend: string;
  choices: readonly { value: Value; label: string }[];
  register: UseFormRegisterReturn;
  error?: string;
}) {
  return (
    <fieldset className="grid gap-1">
      <legend className="text-sm font-medium text-walnut-700">{legend}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {choices.map((choice) => (
          <label key={choice.value} className="flex min-h-10 items-center gap-2 text-sm">
            <input type="checkbox" value={choice.value} className="h-5 w-5 accent-madder-600" {...register} />
            {choice.label}
          </label>
        ))}
      </div>
      {error && <p className="text-sm text-madder-700">{error}</p>}
    </fieldset>
  );
}
