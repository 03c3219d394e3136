import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createMotifRequest, type MotifPreviewResponse } from '@server/contracts/admin-catalogue-motifs.ts';
import type { StudioMotif, StudioThread } from '@server/contracts/admin-catalogue.ts';
import { formatLength } from '@ui/format.ts';
import type { UploadProgress } from '@ui/upload-with-progress.ts';
import { usePreviewMotif } from '../api/preview-motif.ts';
import { useSaveCatalogueRow } from '../api/save-catalogue-row.ts';
import { asNumber, Field, inputClassName, saveOrShowErrors, slugFrom, smallButtonClassName } from './form-field.tsx';
import { FormActions } from './form-actions.tsx';
import { ChoiceBoxes } from './choice-boxes.tsx';
import { MotifEstimateSummary } from './motif-estimate.tsx';
import { StitchMixBar } from './stitch-mix-bar.tsx';
import { SvgPicture } from './svg-picture.tsx';
import { UploadProgressBar } from './upload-progress.tsx';

const fieldNames = [
  'slug',
  'name',
  'kind',
  'svg',
  'widthMm',
  'heightMm',
  'gapMm',
  'minScalePct',
  'maxScalePct',
  'threadCodes',
  'trims',
  'measured',
] as const;
const motifTrimChoices = [
  { value: 'applique', label: 'Appliqué' },
  { value: 'buttons', label: 'Buttons' },
  { value: 'bows', label: 'Bows' },
  { value: 'beads', label: 'Beads' },
] as const;
const round2 = (value: number) => Math.round(value * 100) / 100;

/**
 * Adds a motif from its SVG artwork, or edits one. The upload goes to the server, which sends back the cleaned
 * drawing, its size and the engine's stitch estimate; the studio may enter the count it measured instead.
 */
export function MotifForm({
  motif,
  threads,
  onDone,
}: {
  motif?: StudioMotif;
  threads: StudioThread[];
  onDone: () => void;
}) {
  const save = useSaveCatalogueRow('motifs');
  const [progress, setProgress] = useState<UploadProgress>();
  const [file, setFile] = useState<File>();
  const [preview, setPreview] = useState<MotifPreviewResponse>();
  const upload = usePreviewMotif(setProgress);
  const activeThreads = threads.filter((thread) => thread.isActive);
  const threadByCode = new Map(threads.map((thread) => [thread.code, thread]));

  const { register, formState, watch, setValue, getValues, setError, clearErrors, handleSubmit } = useForm({
    resolver: zodResolver(createMotifRequest),
    defaultValues: motif
      ? {
          slug: motif.slug,
          name: motif.name,
          kind: motif.kind,
          svg: motif.svg,
          widthMm: motif.widthMm,
          heightMm: motif.heightMm,
          gapMm: motif.gapMm,
          minScalePct: motif.minScalePct,
          maxScalePct: motif.maxScalePct,
          threadCodes: motif.threadCodes,
          trims: motif.trims,
          measured: motif.stitchCountSource === 'measured' ? { stitchCount: motif.stitchCount, mix: motif.mix } : null,
        }
      : {
          slug: '',
          name: '',
          kind: 'single' as const,
          svg: '',
          gapMm: 0,
          minScalePct: 80,
          maxScalePct: 120,
          threadCodes: [],
          trims: [],
          measured: null,
        },
  });
  const errors = formState.errors;
  const [svg, threadCodes, measured, widthMm] = [
    watch('svg'),
    watch('threadCodes') ?? [],
    watch('measured'),
    watch('widthMm'),
  ];
  const estimatedCount =
    preview?.estimate?.stitchCount ??
    (motif?.estimatedMix ? motif.estimatedMix.run + motif.estimatedMix.satin + motif.estimatedMix.fill : undefined);

  function measure(chosen: File, atWidthMm?: number) {
    setFile(chosen);
    setProgress({ sentBytes: 0, totalBytes: chosen.size, fraction: 0 });
    clearErrors('svg');
    upload.mutate(
      { file: chosen, widthMm: atWidthMm },
      {
        onSuccess: (answer) => {
          setPreview(answer);
          setValue('svg', answer.svg, { shouldValidate: true });
          if (answer.widthMm !== null && answer.heightMm !== null) {
            setValue('widthMm', round2(answer.widthMm), { shouldValidate: true });
            setValue('heightMm', round2(answer.heightMm), { shouldValidate: true });
          }
          const fallback = activeThreads[0]?.code ?? '';
          setValue(
            'threadCodes',
            answer.colours.length ? answer.colours.map((colour) => colour.threadCode ?? fallback) : [fallback],
            { shouldValidate: true },
          );
          if (!getValues('name')) {
            const name = chosen.name
              .replace(/\.svg$/i, '')
              .replace(/[-_]+/g, ' ')
              .trim();
            setValue('name', name.charAt(0).toUpperCase() + name.slice(1));
            if (!motif) setValue('slug', slugFrom(name));
          }
        },
        onError: (error) => setError('svg', { type: 'server', message: error.message }),
      },
    );
  }

  const setThread = (index: number, code: string) =>
    setValue(
      'threadCodes',
      threadCodes.map((existing, i) => (i === index ? code : existing)),
      { shouldValidate: formState.isSubmitted },
    );

  const onSubmit = handleSubmit((values) =>
    saveOrShowErrors(() => save.mutateAsync({ id: motif?.id, body: values }), setError, fieldNames, onDone),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-5">
      <section aria-label="Artwork" className="grid gap-3 sm:grid-cols-[1fr_14rem]">
        <div className="grid content-start gap-3">
          <Field
            label={motif ? 'Replace the artwork (SVG)' : 'Artwork (SVG)'}
            error={errors.svg?.message}
            hint="Scripts and links are removed before anything is kept."
          >
            <input
              type="file"
              accept=".svg,image/svg+xml"
              className={inputClassName}
              onChange={(event) => event.target.files?.[0] && measure(event.target.files[0])}
            />
          </Field>
          {progress && <UploadProgressBar fraction={progress.fraction} isWaiting={upload.isPending} />}
          {preview && !preview.estimate && (
            <p role="status" className="rounded-lg bg-saffron-100 p-2 text-sm">
              {preview.estimateMessage} Enter the width below and measure again.
            </p>
          )}
          {preview?.estimate && <MotifEstimateSummary estimate={preview.estimate} />}
          {!preview && motif?.estimatedMix && (
            <div className="grid gap-1 text-sm">
              <p>Engine estimate: {estimatedCount?.toLocaleString('en-US')} stitches (underlay included)</p>
              <StitchMixBar mix={motif.estimatedMix} />
            </div>
          )}
        </div>
        <div className="grid h-48 place-items-center rounded-lg border border-linen-200 bg-white p-2">
          {svg ? (
            <SvgPicture svg={svg} label="The motif as it will be kept" className="max-h-44 w-full" />
          ) : (
            <span className="text-sm text-walnut-500">The drawing shows here.</span>
          )}
        </div>
      </section>

      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Name" error={errors.name?.message}>
          <input
            className={inputClassName}
            {...register('name', { onChange: (event) => !motif && setValue('slug', slugFrom(event.target.value)) })}
          />
        </Field>
        <Field
          label="Short name"
          error={errors.slug?.message}
          hint={motif ? 'Fixed once created: designs name it.' : undefined}
        >
          <input className={inputClassName} readOnly={Boolean(motif)} {...register('slug')} />
        </Field>
        <Field label="Use" error={errors.kind?.message}>
          <select className={inputClassName} {...register('kind')}>
            <option value="single">A single motif</option>
            <option value="border">A border that repeats along the hem</option>
          </select>
        </Field>
        <Field
          label="Width at 100 % (mm)"
          error={errors.widthMm?.message}
          hint={typeof widthMm === 'number' && widthMm > 0 ? formatLength(widthMm) : undefined}
        >
          <input
            type="number"
            step="0.01"
            inputMode="decimal"
            className={inputClassName}
            {...register('widthMm', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Height at 100 % (mm)" error={errors.heightMm?.message}>
          <input
            type="number"
            step="0.01"
            inputMode="decimal"
            className={inputClassName}
            {...register('heightMm', { setValueAs: asNumber })}
          />
        </Field>
        <div className="flex items-end">
          {file && (
            <button
              type="button"
              className={smallButtonClassName}
              disabled={upload.isPending || !(Number(widthMm) > 0)}
              onClick={() => measure(file, Number(widthMm))}
            >
              Measure again at this width
            </button>
          )}
        </div>
        <Field label="Gap between repeats (mm)" error={errors.gapMm?.message} hint="Borders only; negative overlaps.">
          <input
            type="number"
            step="0.1"
            inputMode="decimal"
            className={inputClassName}
            {...register('gapMm', { setValueAs: asNumber })}
          />
        </Field>
        <Field label="Smallest size (%)" error={errors.minScalePct?.message}>
          <input
            type="number"
            inputMode="numeric"
            className={inputClassName}
            {...register('minScalePct', { setValueAs: asNumber })}
          />
        </Field>
        <Field
          label="Largest size (%)"
          error={errors.maxScalePct?.message}
          hint="Stitch files resize well only by about 10–20 %."
        >
          <input
            type="number"
            inputMode="numeric"
            className={inputClassName}
            {...register('maxScalePct', { setValueAs: asNumber })}
          />
        </Field>
      </div>

      <ChoiceBoxes
        legend="Trims sewn on beyond the stitches (each could come off: a choking caution for under-3s)"
        choices={motifTrimChoices}
        register={register('trims')}
        error={errors.trims?.message}
      />

      <fieldset className="grid gap-2">
        <legend className="text-sm font-medium text-walnut-700">Threads, one per colour, in stitching order</legend>
        {errors.threadCodes?.message && <p className="text-sm text-madder-700">{errors.threadCodes.message}</p>}
        <ol className="grid gap-2 sm:grid-cols-2">
          {threadCodes.map((code, index) => (
            <li key={index} className="flex items-center gap-2">
              <span className="w-5 text-right text-sm text-walnut-500">{index + 1}.</span>
              {preview?.colours[index] && (
                <span
                  title={`Artwork colour ${preview.colours[index].hex}`}
                  className="h-6 w-6 shrink-0 rounded border border-walnut-900/20"
                  style={{ backgroundColor: preview.colours[index].hex }}
                />
              )}
              <span
                className="h-6 w-6 shrink-0 rounded-full border border-walnut-900/20"
                style={{ backgroundColor: threadByCode.get(code)?.hex ?? 'transparent' }}
                aria-hidden="true"
              />
              <select
                aria-label={`Thread for colour ${index + 1}`}
                value={code}
                onChange={(event) => setThread(index, event.target.value)}
                className={inputClassName}
                aria-invalid={errors.threadCodes?.[index] ? true : undefined}
              >
                {!threadByCode.has(code) && <option value={code}>{code || 'Choose a thread'}</option>}
                {activeThreads.map((thread) => (
                  <option key={thread.code} value={thread.code}>
                    {thread.name} ({thread.code})
                  </option>
                ))}
              </select>
              <button
                type="button"
                className={smallButtonClassName}
                aria-label={`Remove colour ${index + 1}`}
                onClick={() =>
                  setValue(
                    'threadCodes',
                    threadCodes.filter((_, i) => i !== index),
                  )
                }
              >
                ✕
              </button>
              {errors.threadCodes?.[index]?.message && (
                <span className="text-sm text-madder-700">{errors.threadCodes[index].message}</span>
              )}
            </li>
          ))}
        </ol>
        <div>
          <button
            type="button"
            className={smallButtonClassName}
            onClick={() => setValue('threadCodes', [...threadCodes, activeThreads[0]?.code ?? ''])}
          >
            Add a colour
          </button>
        </div>
      </fieldset>

      <fieldset className="grid gap-3 rounded-lg border border-linen-200 bg-white p-3">
        <legend className="px-1 text-sm font-medium text-walnut-700">Stitch count quotes use</legend>
        <label className="flex min-h-10 items-center gap-2 text-sm">
          <input
            type="checkbox"
            className="h-5 w-5 accent-madder-600"
            checked={measured !== null && measured !== undefined}
            onChange={(event) =>
              setValue(
                'measured',
                event.target.checked ? { stitchCount: motif?.stitchCount ?? estimatedCount ?? 1000 } : null,
              )
            }
          />
          We measured it in our digitizing program
        </label>
        {measured ? (
          <Field
            label="Measured stitches at 100 %"
            error={errors.measured?.stitchCount?.message ?? errors.measured?.mix?.message}
            hint="Split into running, satin and fill like the estimate."
          >
            <input
              type="number"
              inputMode="numeric"
              className={inputClassName}
              {...register('measured.stitchCount', {
                setValueAs: asNumber,
                onChange: () => setValue('measured.mix', undefined),
              })}
            />
          </Field>
        ) : null}
        <p className="text-sm" data-testid="stitch-source">
          {measured
            ? `Quotes use the measured count: ${Number(measured.stitchCount || 0).toLocaleString('en-US')} stitches.`
            : estimatedCount !== undefined
              ? `Quotes use the engine’s estimate: ${estimatedCount.toLocaleString('en-US')} stitches.`
              : 'Upload the artwork for an estimate, or enter your measured count.'}
        </p>
        {errors.measured?.message && <p className="text-sm text-madder-700">{errors.measured.message}</p>}
      </fieldset>

      <FormActions
        isSaving={save.isPending}
        error={errors.root?.server?.message}
        onCancel={onDone}
        saveLabel={motif ? 'Save motif' : 'Add motif'}
      />
    </form>
  );
}
