import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button } from '@ui/components/button.tsx';
import { showServerErrors } from '@ui/show-server-errors.ts';
import { proofPreviewPath, sendProofRequest } from '@server/contracts/studio-orders.ts';
import { useSendProof } from '../api/send-proof.ts';

const defaultMessage =
  'Here is your proof, drawn to scale on the garment. Approve it to start stitching, or point at anything you would like changed.';

/** The contract's request, with the photo a photo proof sends beside it. */
const sendProofFields = z
  .object({
    source: z.enum(['render', 'photo']),
    message: sendProofRequest.options[0].shape.message,
    file: z.instanceof(File).nullable(),
  })
  .refine((fields) => fields.source === 'render' || fields.file !== null, {
    path: ['file'],
    message: 'choose a photo to send',
  });
const serverFieldNames = ['message', 'file'] as const;

/** The drawing a render would send, drawn by the server on request; nothing is stored until it is sent. */
function DrawingPreview({ number }: { number: string }) {
  const [state, setState] = useState<'closed' | 'loading' | 'shown' | 'failed'>('closed');
  if (state === 'closed')
    return (
      <div>
        <Button tone="quiet" onClick={() => setState('loading')}>
          Preview the drawing
        </Button>
      </div>
    );
  return (
    <figure className="grid gap-1">
      {state === 'loading' && (
        <p role="status" className="text-walnut-500">
          Drawing the design on the garment…
        </p>
      )}
      {state === 'failed' && (
        <p role="alert" className="text-madder-700">
          The drawing could not be made; try again, or send a photo.
        </p>
      )}
      <img
        src={proofPreviewPath(number)}
        alt="Preview of the drawing the customer would get"
        onLoad={() => setState('shown')}
        onError={() => setState('failed')}
        className={`w-full max-w-sm rounded-md border border-linen-200 ${state === 'shown' ? '' : 'hidden'}`}
      />
    </figure>
  );
}

/** Sends the next proof version: the server's drawing of the design, or a photo of a test stitch-out. */
export function SendProofForm({ number, versionCount }: { number: string; versionCount: number }) {
  const [progress, setProgress] = useState(0);
  const send = useSendProof(number, setProgress);
  const { register, watch, setValue, setError, formState, handleSubmit } = useForm({
    resolver: zodResolver(sendProofFields),
    defaultValues: { source: 'render' as 'render' | 'photo', message: defaultMessage, file: null as File | null },
  });
  const source = watch('source');
  const message = watch('message');
  const file = watch('file');
  const fields = { message: formState.errors.message?.message, file: formState.errors.file?.message };

  const submit = handleSubmit((values) => {
    setProgress(0);
    const onError = (error: Error) => showServerErrors(error, setError, serverFieldNames);
    if (values.source === 'photo' && values.file)
      send.mutate({ source: 'photo', message: values.message, file: values.file }, { onError });
    else if (values.source === 'render') send.mutate({ source: 'render', message: values.message }, { onError });
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      className="grid gap-3 rounded-lg border border-linen-200 p-3 text-sm"
      aria-label="Send a proof"
    >
      <p className="font-medium">{versionCount === 0 ? 'Send the first proof' : `Send proof ${versionCount + 1}`}</p>
      <fieldset className="flex flex-wrap gap-4">
        <legend className="sr-only">What to send</legend>
        <label className="flex items-center gap-2">
          <input type="radio" value="render" {...register('source')} /> Drawing of the design on the garment
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" value="photo" {...register('source')} /> Photo of a test stitch-out
        </label>
      </fieldset>
      {source === 'render' && <DrawingPreview number={number} />}
      {source === 'photo' && (
        <label className="grid gap-1">
          <span className="font-medium">Photo (PNG or JPEG)</span>
          <input
            type="file"
            accept="image/png,image/jpeg"
            onChange={(event) =>
              setValue('file', event.target.files?.[0] ?? null, { shouldValidate: formState.isSubmitted })
            }
            aria-invalid={Boolean(fields.file)}
          />
          {fields.file && <span className="text-madder-700">{fields.file}</span>}
        </label>
      )}
      <label className="grid gap-1">
        <span className="font-medium">Note to the customer</span>
        <textarea
          rows={3}
          maxLength={2000}
          className="rounded-lg border border-linen-300 p-2"
          aria-invalid={Boolean(fields.message)}
          {...register('message')}
        />
        {fields.message && <span className="text-madder-700">{fields.message}</span>}
      </label>
      {send.isPending && source === 'photo' && (
        <label className="grid gap-1 text-walnut-500">
          Uploading {Math.round(progress * 100)} %
          <progress value={progress} max={1} className="h-2 w-full" />
        </label>
      )}
      {send.isError && (
        <p role="alert" className="rounded-md bg-madder-50 p-2 text-madder-700">
          {send.error.message}
        </p>
      )}
      {send.isSuccess && (
        <p role="status" className="rounded-md bg-sage-50 p-2 text-sage-700">
          Proof {send.data.version} is on its way to the customer.
        </p>
      )}
      <div>
        <Button type="submit" disabled={send.isPending || (source === 'photo' && !file) || message.trim() === ''}>
          {send.isPending ? (source === 'render' ? 'Drawing the proof…' : 'Sending…') : 'Send proof'}
        </Button>
      </div>
    </form>
  );
}
