import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button } from '@ui/components/button.tsx';
import { showServerErrors } from '@ui/show-server-errors.ts';
import { stitchFileRequest, type StitchFile } from '@server/contracts/proof-versions.ts';
import { useEnterStitchFile } from '../api/order-design.ts';
import { PriceAgainst } from './price-against.tsx';

/** The boxes hold text; the contract's own rules check the numbers they become. */
const wholeNumber = (message: string) =>
  z
    .string()
    .trim()
    .regex(/^\d[\d,]*$/, message)
    .transform((value) => Number(value.replaceAll(',', '')));
const stitchFileFields = z.object({
  stitchCount: wholeNumber('Type the stitch count as a whole number').pipe(stitchFileRequest.shape.stitchCount),
  colourCount: wholeNumber('Type how many colours, as a whole number').pipe(stitchFileRequest.shape.colourCount),
  fileName: stitchFileRequest.shape.fileName,
});
const fieldNames = ['stitchCount', 'colourCount', 'fileName'] as const;

/**
 * Once a customer's picture is digitized, the studio types what the stitch file sews: its stitches and colours
 * price the placement from then on, and its name goes on the production sheet.
 */
export function StitchFileForm({
  number,
  placementId,
  label,
  saved,
}: {
  number: string;
  placementId: string;
  label: string;
  saved: StitchFile | undefined;
}) {
  const enter = useEnterStitchFile(number, placementId);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(stitchFileFields),
    defaultValues: {
      stitchCount: saved ? String(saved.stitchCount) : '',
      colourCount: saved ? String(saved.colourCount) : '',
      fileName: saved?.fileName ?? '',
    },
  });
  const errors = formState.errors;
  const submit = handleSubmit((values) =>
    enter.mutate(values, { onError: (error) => showServerErrors(error, setError, fieldNames) }),
  );
  const box = 'min-h-11 rounded-lg border border-linen-300 bg-white px-2.5';
  return (
    <form onSubmit={submit} noValidate className="grid gap-3 text-sm" aria-label={`Stitch file for ${label}`}>
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="grid gap-1">
          <span className="font-medium">Stitch count</span>
          <input
            inputMode="numeric"
            className={box}
            aria-invalid={Boolean(errors.stitchCount)}
            {...register('stitchCount')}
          />
          {errors.stitchCount && <span className="text-madder-700">{errors.stitchCount.message}</span>}
        </label>
        <label className="grid gap-1">
          <span className="font-medium">Colours</span>
          <input
            inputMode="numeric"
            className={box}
            aria-invalid={Boolean(errors.colourCount)}
            {...register('colourCount')}
          />
          {errors.colourCount && <span className="text-madder-700">{errors.colourCount.message}</span>}
        </label>
        <label className="grid gap-1">
          <span className="font-medium">Stitch file name</span>
          <input
            className={box}
            placeholder="sun-56mm.dst"
            aria-invalid={Boolean(errors.fileName)}
            {...register('fileName')}
          />
          {errors.fileName && <span className="text-madder-700">{errors.fileName.message}</span>}
        </label>
      </div>
      {errors.root?.server && (
        <p role="alert" className="text-madder-700">
          {errors.root.server.message}
        </p>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={enter.isPending}>
          {enter.isPending ? 'Pricing…' : saved ? 'Update the stitch file' : 'Save and price'}
        </Button>
        {saved && <span className="text-walnut-500">Entered by {saved.enteredByName}</span>}
      </div>
      {enter.data && <PriceAgainst price={enter.data.price} />}
    </form>
  );
}
