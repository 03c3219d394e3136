/**
 * `inspectUpload` as a job of the heavy-work pool, so sanitizing and decoding never run on the request thread.
 * Only types come from `inspect-upload.ts` here: jsdom and jimp load in the pool's threads, not in the server's.
 */
import { failure, ok, type Result } from '../contracts/result.ts';
import { asBuffer, type HeavyWork } from './heavy-work.ts';
import type { InspectedUpload, UploadKind } from './inspect-upload.ts';

export async function inspectUploadOffThread(
  work: HeavyWork,
  bytes: Buffer,
  allowed: UploadKind[],
): Promise<Result<InspectedUpload>> {
  const inspected = await work.run<InspectedUpload>('inspectUpload', { bytes, allowed });
  if (!inspected.ok || inspected.value.kind === 'svg') return inspected;
  return ok({ ...inspected.value, png: asBuffer(inspected.value.png) });
}

/** The uploaded bytes as clean SVG text, or why not (415 for another type of file, 400 for a broken one). */
export async function cleanSvgOffThread(work: HeavyWork, bytes: Buffer): Promise<Result<string>> {
  const inspected = await inspectUploadOffThread(work, bytes, ['svg']);
  if (!inspected.ok) return inspected;
  return inspected.value.kind === 'svg'
    ? ok(inspected.value.svg)
    : failure('unsupported-type', 'Please upload an SVG file.');
}

/** A photo (PNG or JPEG) re-encoded as PNG, or why not. */
export async function cleanPhotoOffThread(work: HeavyWork, bytes: Buffer): Promise<Result<Buffer>> {
  const inspected = await inspectUploadOffThread(work, bytes, ['png', 'jpeg']);
  if (!inspected.ok) return inspected;
  return inspected.value.kind === 'svg'
    ? failure('unsupported-type', 'Please upload a PNG or JPEG photo.')
    : ok(inspected.value.png);
}
