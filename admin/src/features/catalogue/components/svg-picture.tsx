/** Draws SVG markup the server has sanitized, as an image (an <img> never runs scripts, whatever the markup). */
export function SvgPicture({ svg, label, className = '' }: { svg: string; label: string; className?: string }) {
  return <img src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`} alt={label} className={`object-contain ${className}`} />;
}
