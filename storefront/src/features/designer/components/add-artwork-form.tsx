import { useId, useState, type DragEvent } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { designFieldRules } from '@server/contracts/designs.ts';
import { Button } from '@ui/components/button.tsx';
import { useArtworks } from '../api/get-artworks.ts';
import { useUploadArtwork } from '../api/upload-artwork.ts';
import { commandOf, type Dispatch } from '../commands/command-registry.ts';
import { defaultItemZone, sizeOf, type DesignSetting } from '../model/design-setting.ts';
import { hasRoomForPlacement, type DesignerState } from '../model/designer-state.ts';
import { ZoneChoice } from './zone-choice.tsx';

/** What the file picker offers; the server decides by the bytes whatever the name says. */
const ACCEPTED = '.svg,.png,.jpg,.jpeg,image/svg+xml,image/png,image/jpeg';

/** The picture to put on the garment (none chosen means the newest) and its place. */
const addArtworkFields = z.object({
  artworkUploadId: z.number().int().positive().optional(),
  zone: designFieldRules.zoneCode,
});

/**
 * Uploading the customer's own picture (a child's drawing is a favourite): chosen or dropped, sent with a progress
 * bar, and any refusal shown right here. Earlier uploads stay to choose from; the chosen one goes on the garment.
 */
export function AddArtworkForm({
  setting,
  state,
  dispatch,
}: {
  setting: DesignSetting;
  state: DesignerState;
  dispatch: Dispatch;
}) {
  const inputId = useId();
  const size = sizeOf(setting, state.sizeId);
  const { watch, setValue, handleSubmit } = useForm({
    resolver: zodResolver(addArtworkFields),
    defaultValues: { artworkUploadId: undefined as number | undefined, zone: defaultItemZone(size)?.code ?? '' },
  });
  const zone = watch('zone');
  const chosenId = watch('artworkUploadId');
  const [progress, setProgress] = useState(0);
  const [sending, setSending] = useState<string>();
  const [isOver, setIsOver] = useState(false);
  const uploads = useArtworks();
  const upload = useUploadArtwork(setProgress);
  const artworks = setting.artworks;
  const chosen = artworks.find((artwork) => artwork.id === chosenId) ?? artworks[0];

  const send = (file: File | undefined) => {
    if (!file || upload.isPending) return;
    setProgress(0);
    setSending(file.name);
    upload.mutate(file, {
      onSuccess: (artwork) => setValue('artworkUploadId', artwork.id),
      onSettled: () => setSending(undefined),
    });
  };
  const drop = (event: DragEvent) => {
    event.preventDefault();
    setIsOver(false);
    send(event.dataTransfer.files[0]);
  };
  const submit = handleSubmit((fields) => {
    if (chosen) dispatch('add-artwork', { artworkUploadId: chosen.id, zone: fields.zone });
  });
  const problem = upload.isError ? upload.error.message : undefined;

  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <div
        onDragOver={(event) => {
          event.preventDefault();
          setIsOver(true);
        }}
        onDragLeave={() => setIsOver(false)}
        onDrop={drop}
        className={`rounded-card border-2 border-dashed p-4 text-center ${isOver ? 'border-madder-500 bg-madder-50' : 'border-linen-300 bg-linen-50'}`}
      >
        <p className="text-sm text-walnut-700">Drop a picture here, or</p>
        <label
          htmlFor={inputId}
          className="mt-2 inline-flex min-h-11 cursor-pointer items-center rounded-full border border-linen-300 bg-white px-5 font-medium hover:bg-linen-100 focus-within:outline-3 focus-within:outline-saffron-500"
        >
          Choose a picture
          <input
            id={inputId}
            type="file"
            accept={ACCEPTED}
            className="sr-only"
            aria-describedby={`${inputId}-help${problem ? ` ${inputId}-problem` : ''}`}
            aria-invalid={problem !== undefined}
            onChange={(event) => {
              send(event.target.files?.[0]);
              event.target.value = '';
            }}
          />
        </label>
        <p id={`${inputId}-help`} className="mt-2 text-xs text-walnut-500">
          A drawing as SVG is priced straight away; a photo or scan (PNG or JPEG) is turned into stitches by the studio,
          who confirm the price first.
        </p>
      </div>

      {sending && (
        <div>
          <label htmlFor={`${inputId}-progress`} className="text-sm">
            Uploading {sending}… {Math.round(progress * 100)} %
          </label>
          <progress
            id={`${inputId}-progress`}
            max={1}
            value={progress}
            className="mt-1 block h-3 w-full accent-madder-600"
          />
        </div>
      )}
      {problem && (
        <p id={`${inputId}-problem`} role="alert" className="rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
          {problem}
        </p>
      )}

      {uploads.isError && (
        <p className="text-sm text-madder-700">Your earlier pictures could not be loaded: {uploads.error.message}</p>
      )}
      {artworks.length > 0 && (
        <fieldset>
          <legend className="text-sm font-medium">Your pictures</legend>
          <div className="mt-2 grid grid-cols-3 gap-2 sm:grid-cols-4">
            {artworks.map((artwork) => (
              <label key={artwork.id} className="cursor-pointer">
                <input
                  type="radio"
                  name="artwork-choice"
                  value={artwork.id}
                  checked={artwork.id === chosen?.id}
                  onChange={() => setValue('artworkUploadId', artwork.id)}
                  className="peer sr-only"
                  aria-label={artwork.originalName}
                />
                <span className="block rounded-lg border-2 border-linen-200 bg-white p-1 peer-checked:border-madder-500 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500">
                  <img src={artwork.imageUrl} alt="" className="aspect-square w-full object-contain" />
                  <span className="block truncate text-xs">{artwork.originalName}</span>
                </span>
              </label>
            ))}
          </div>
        </fieldset>
      )}
      <ZoneChoice zones={size.zones} value={zone} onChange={(code) => setValue('zone', code)} />
      <Button type="submit" disabled={!chosen || !hasRoomForPlacement(state)}>
        {commandOf('add-artwork').label}
      </Button>
    </form>
  );
}
