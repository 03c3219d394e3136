/** How far the upload has got, as a bar and in words; "measuring" once the bytes are sent and the server works. */
export function UploadProgressBar({ fraction, isWaiting }: { fraction: number; isWaiting: boolean }) {
  const percent = Math.round(fraction * 100);
  const label =
    percent < 100
      ? `Uploading… ${percent} %`
      : isWaiting
        ? 'Uploaded; measuring the stitches…'
        : 'Uploaded and measured';
  return (
    <div className="grid gap-1">
      <div
        role="progressbar"
        aria-label="Artwork upload"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={label}
        className="h-2.5 overflow-hidden rounded-full bg-linen-200"
      >
        <div
          className="h-full rounded-full bg-sage-500 transition-[width] duration-200"
          style={{ width: `${percent}%` }}
        />
      </div>
      <p className="text-xs text-walnut-500" aria-live="polite">
        {label}
      </p>
    </div>
  );
}
