import { useMutation } from '@tanstack/react-query';
import { motifPreviewResponse } from '@server/contracts/admin-catalogue-motifs.ts';
import { uploadWithProgress, type UploadProgress } from '@ui/upload-with-progress.ts';

/**
 * Uploads motif artwork for the server to sanitize and measure, without saving it. `widthMm` stretches a drawing
 * that does not say its own size.
 */
export const previewMotif = (file: File, widthMm: number | undefined, onProgress: (progress: UploadProgress) => void) =>
  uploadWithProgress('/admin/catalogue/motifs/preview', file, motifPreviewResponse, {
    fields: widthMm === undefined ? {} : { widthMm: String(widthMm) },
    onProgress,
  });

export function usePreviewMotif(onProgress: (progress: UploadProgress) => void) {
  return useMutation({
    mutationFn: ({ file, widthMm }: { file: File; widthMm?: number }) => previewMotif(file, widthMm, onProgress),
  });
}
