import { svgDataUrl } from '@ui/svg-data-url.ts';

/** Draws SVG markup the server has sanitized, as an image (an <img> never runs scripts, whatever the markup). */
export function SvgPicture({ svg, label, className = '' }: { svg: string; label: string; className?: string }) {
  return <img src={svgDataUrl(svg)} alt={label} className={`object-contain ${className}`} />;
}
