import type { PlacementTemplate } from '@server/contracts/production-sheet.ts';

const INK = '#2e241e';
const FIELD = '#b4513a';
const GUIDE = '#4a6345';
const ARM_MM = 12;

/**
 * A placement template at true size: the SVG is sized in CSS millimetres and drawn in millimetres, so printed at
 * 100 % a 173 mm repeat measures 173 mm. Same figures as the PDF's template pages.
 */
export function TrueSizeTemplate({ template }: { template: PlacementTemplate }) {
  const { field, centre, artwork } = template;
  return (
    <svg
      role="img"
      aria-label={`${template.title}, at true size`}
      width={`${template.widthMm}mm`}
      height={`${template.heightMm}mm`}
      viewBox={`0 0 ${template.widthMm} ${template.heightMm}`}
      className="block max-w-none bg-white"
    >
      <rect
        x={field.xMm}
        y={field.yMm}
        width={field.widthMm}
        height={field.heightMm}
        fill="none"
        stroke={FIELD}
        strokeWidth={0.3}
        strokeDasharray="2 1"
      />
      <text x={field.xMm + 1.5} y={field.yMm + 4} fontSize={3} fill={FIELD}>
        sewing field
      </text>
      {template.pictureDataUrl && (
        <image
          href={template.pictureDataUrl}
          x={artwork.xMm}
          y={artwork.yMm}
          width={artwork.widthMm}
          height={artwork.heightMm}
          preserveAspectRatio="none"
        />
      )}
      {template.outlines.map((outline, i) => (
        <path
          key={i}
          d={outline.d}
          fill={outline.isFilled ? outline.hex : 'none'}
          fillOpacity={0.25}
          stroke={INK}
          strokeWidth={0.2}
        />
      ))}
      {template.guideLineYMm !== null && (
        <line
          x1={field.xMm}
          x2={field.xMm + field.widthMm}
          y1={template.guideLineYMm}
          y2={template.guideLineYMm}
          stroke={GUIDE}
          strokeWidth={0.2}
          strokeDasharray="1 1"
        />
      )}
      {template.hemLineYMm !== null && (
        <>
          <line
            x1={field.xMm}
            x2={field.xMm + field.widthMm}
            y1={template.hemLineYMm}
            y2={template.hemLineYMm}
            stroke={INK}
            strokeWidth={0.35}
          />
          <text x={field.xMm + 1.5} y={template.hemLineYMm + 4} fontSize={3} fill={INK}>
            hem edge
          </text>
        </>
      )}
      {template.joinMarksXMm.map((x) => (
        <g key={x} fill={FIELD}>
          <path d={`M${x} ${artwork.yMm - 0.5}l-1 -2h2z`} />
          <path d={`M${x} ${artwork.yMm + artwork.heightMm + 0.5}l-1 2h2z`} />
        </g>
      ))}
      <g stroke={FIELD} strokeWidth={0.3} fill="none">
        <line x1={centre.xMm - ARM_MM} x2={centre.xMm + ARM_MM} y1={centre.yMm} y2={centre.yMm} />
        <line x1={centre.xMm} x2={centre.xMm} y1={centre.yMm - ARM_MM} y2={centre.yMm + ARM_MM} />
        <circle cx={centre.xMm} cy={centre.yMm} r={2} />
      </g>
    </svg>
  );
}

/** A 50 mm square to check the printout with a ruler. */
export function CheckSquare() {
  return (
    <div className="flex items-start gap-3 text-sm">
      <svg
        role="img"
        aria-label="50 mm check square"
        width="50mm"
        height="50mm"
        viewBox="0 0 50 50"
        className="shrink-0"
      >
        <rect x={0.15} y={0.15} width={49.7} height={49.7} fill="none" stroke={INK} strokeWidth={0.3} />
      </svg>
      <p className="max-w-xs text-walnut-700">
        <strong className="block">Check square: 50 mm (1 ¹⁵⁄₁₆ in)</strong>
        Measure it before cutting. If it is not 50 mm, print again at 100 % (actual size) with “fit to page” off.
      </p>
    </div>
  );
}
