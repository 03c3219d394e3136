import { useId, useMemo } from 'react';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import { dyedMockupSrc } from '@store/lib/dyed-mockup.ts';
import { useLetteringFaces } from '@store/lib/load-lettering-faces.ts';
import type { DesignDrawingLayout, DrawnPlacement } from '../model/design-drawing-layout.ts';
import { motifInThreadsSrc } from './motif-in-threads.ts';
import { ArtworkPicture } from '@store/components/artwork-picture.tsx';

/** A capital H is about 0.7 em in most Latin faces: lettering is sized by its H, SVG text by its em. */
const CAP_HEIGHT_EM = 0.7;
/** How far an artwork placeholder is tall for its width, where the upload's picture is not there to show. */
const ARTWORK_ASPECT = 0.75;

const turned = (placement: { centerXMm: number; centerYMm: number; rotationDeg: number }) =>
  placement.rotationDeg === 0
    ? undefined
    : `rotate(${placement.rotationDeg} ${placement.centerXMm} ${placement.centerYMm})`;

function Placement({ placement, clipId }: { placement: DrawnPlacement; clipId: string }) {
  const src = useMemo(
    () => ('svg' in placement ? motifInThreadsSrc(placement.svg, placement.threadHexes) : ''),
    [placement],
  );
  switch (placement.kind) {
    case 'border': {
      // The same clip as the proof's: the front panel's width, and room above and below for a curved hem's rise.
      const { band } = placement;
      return (
        <g clipPath={`url(#${clipId})`}>
          <clipPath id={clipId}>
            <rect x={band.leftMm} y={band.centerYMm - band.heightMm} width={band.widthMm} height={band.heightMm * 2} />
          </clipPath>
          {placement.repeats.map((repeat, index) => (
            <image
              key={index}
              href={src}
              x={repeat.centerXMm - repeat.widthMm / 2}
              y={repeat.centerYMm - repeat.heightMm / 2}
              width={repeat.widthMm}
              height={repeat.heightMm}
              transform={turned(repeat)}
            />
          ))}
        </g>
      );
    }
    case 'motif':
      return (
        <image
          href={src}
          x={placement.centerXMm - placement.widthMm / 2}
          y={placement.centerYMm - placement.heightMm / 2}
          width={placement.widthMm}
          height={placement.heightMm}
          transform={turned(placement)}
        />
      );
    case 'lettering':
      return (
        <text
          x={placement.centerXMm}
          y={placement.centerYMm + placement.letterHeightMm / 2}
          textAnchor="middle"
          fontFamily={`"${placement.fontFamily}", cursive`}
          fontSize={placement.letterHeightMm / CAP_HEIGHT_EM}
          fill={placement.hex ?? '#2e241e'}
          transform={turned(placement)}
        >
          {placement.text}
        </text>
      );
    case 'artwork': {
      if (placement.upload) return <ArtworkPicture placement={placement} upload={placement.upload} />;
      const heightMm = placement.widthMm * ARTWORK_ASPECT;
      return (
        <rect
          x={placement.centerXMm - placement.widthMm / 2}
          y={placement.centerYMm - heightMm / 2}
          width={placement.widthMm}
          height={heightMm}
          rx={4}
          fill="none"
          stroke="#7a6656"
          strokeDasharray="4 3"
          transform={turned(placement)}
        />
      );
    }
    case 'unavailable':
      return null;
  }
}

/**
 * A design drawn still on its garment, without the designer's canvas library: the dyed mockup and each placement
 * as SVG, to the mockup's millimetres. `title` names the picture for screen readers.
 */
export function DesignDrawing({
  layout,
  garment,
  colourHex,
  title,
  className = '',
}: {
  layout: DesignDrawingLayout;
  garment: GarmentSummary;
  colourHex: string | undefined;
  title: string;
  className?: string;
}) {
  const idPrefix = useId().replace(/[^A-Za-z0-9_-]/g, '');
  useLetteringFaces(layout.placements.some((placement) => placement.kind === 'lettering'));
  return (
    <svg viewBox={`0 0 ${layout.widthMm} ${layout.heightMm}`} role="img" aria-label={title} className={className}>
      <image
        href={dyedMockupSrc(garment.mockupSvg, colourHex)}
        x={0}
        y={0}
        width={layout.widthMm}
        height={layout.heightMm}
        preserveAspectRatio="none"
      />
      {layout.placements.map((placement) => (
        <Placement key={placement.id} placement={placement} clipId={`${idPrefix}-clip-${placement.id}`} />
      ))}
    </svg>
  );
}
