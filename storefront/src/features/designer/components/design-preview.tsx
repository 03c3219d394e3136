import { useId, useMemo } from 'react';
import type {
  GarmentSummary,
  LetteringFontSummary,
  MotifSummary,
  ThreadColourSummary,
} from '@server/contracts/catalogue.ts';
import type { DesignDocument } from '@server/contracts/designs.ts';
import { dyedMockupSrc } from '@store/lib/dyed-mockup.ts';
import { mockupSizeMm, sizeOf } from '../model/design-setting.ts';
import { useDesignSetting } from '../hooks/use-design-setting.ts';
import { useLetteringFontsReady } from '../hooks/use-lettering-fonts.ts';
import { describeScene, type Drawable } from '../render/describe-scene.ts';
import { svgDataUrl } from '@ui/svg-data-url.ts';
import type { DesignUploadPicture } from '@server/contracts/artwork.ts';
import { ArtworkPicture } from '@store/components/artwork-picture.tsx';

interface DesignPreviewProps {
  garment: GarmentSummary;
  sizeId: number;
  colourHex: string;
  document: DesignDocument;
  motifs: readonly MotifSummary[];
  fonts: readonly LetteringFontSummary[];
  threads: readonly ThreadColourSummary[];
  /** The customer's uploads the design places. */
  uploads: readonly DesignUploadPicture[];
  label: string;
}

/** One placement drawn in SVG, in the mockup's millimetres: the same drawables the designer's canvas shows. */
function PreviewItem({ drawable, clipId }: { drawable: Drawable; clipId: string }) {
  const turn = `rotate(${drawable.rotationDeg} ${drawable.centerXMm} ${drawable.centerYMm})`;
  switch (drawable.kind) {
    case 'lettering':
      return (
        <text
          x={drawable.centerXMm}
          y={drawable.centerYMm}
          transform={turn}
          textAnchor="middle"
          dominantBaseline="central"
          fontFamily={`"${drawable.fontFamily}"`}
          fontSize={drawable.fontSizeMm}
          fill={drawable.fill}
        >
          {drawable.text}
        </text>
      );
    case 'motif':
      return (
        <image
          href={svgDataUrl(drawable.svg)}
          x={drawable.centerXMm - drawable.widthMm / 2}
          y={drawable.centerYMm - drawable.widthMm / 2}
          width={drawable.widthMm}
          height={drawable.widthMm}
          transform={turn}
        />
      );
    case 'border': {
      const { band } = drawable;
      const src = svgDataUrl(drawable.svg);
      return (
        <g clipPath={`url(#${clipId})`}>
          <clipPath id={clipId}>
            <rect x={band.leftMm} y={band.centerYMm - band.heightMm} width={band.widthMm} height={band.heightMm * 2} />
          </clipPath>
          {drawable.repeats.map((repeat, index) => (
            <image
              key={index}
              href={src}
              x={repeat.centerXMm - repeat.widthMm / 2}
              y={repeat.centerYMm - repeat.heightMm / 2}
              width={repeat.widthMm}
              height={repeat.heightMm}
              preserveAspectRatio="none"
            />
          ))}
        </g>
      );
    }
  }
}

/**
 * A still picture of a saved design on its garment, for pages that show an order rather than edit it. It draws
 * the designer's own scene description, so it matches what the customer saw while designing.
 */
export function DesignPreview({
  garment,
  sizeId,
  colourHex,
  document,
  motifs,
  fonts,
  threads,
  uploads,
  label,
}: DesignPreviewProps) {
  const clipPrefix = useId();
  const setting = useDesignSetting(garment, motifs, fonts);
  const isFontsReady = useLetteringFontsReady(fonts);
  const size = sizeOf(setting, sizeId);
  const { widthMm, heightMm } = mockupSizeMm(garment, size);
  const drawables = useMemo(
    () => (isFontsReady ? describeScene({ document, sizeId }, setting, threads) : []),
    [isFontsReady, document, sizeId, setting, threads],
  );
  return (
    <svg viewBox={`0 0 ${widthMm} ${heightMm}`} role="img" aria-label={label} className="h-auto w-full">
      <image href={dyedMockupSrc(garment.mockupSvg, colourHex)} x={0} y={0} width={widthMm} height={heightMm} />
      {drawables.map((drawable) => (
        <PreviewItem key={drawable.id} drawable={drawable} clipId={`${clipPrefix}-${drawable.id}`.replace(/:/g, '')} />
      ))}
      {document.placements.map((placement) => {
        // Uploads come from the design's own list (their proportions and address), drawn by the shared rule;
        // the scene's artwork drawables, made for the canvas, are not drawn here.
        const upload =
          placement.kind === 'artwork' && uploads.find((candidate) => candidate.uploadId === placement.artworkUploadId);
        return placement.kind === 'artwork' && upload ? (
          <ArtworkPicture key={placement.id} placement={placement} upload={upload} />
        ) : null;
      })}
    </svg>
  );
}
