import type { StudioMotif } from '@server/contracts/admin-catalogue.ts';

const parts = [
  { key: 'run', label: 'running', className: 'bg-saffron-500' },
  { key: 'satin', label: 'satin', className: 'bg-madder-500' },
  { key: 'fill', label: 'fill', className: 'bg-sage-500' },
] as const;

/** The motif's stitch count split into running, satin and fill stitches, as one stacked bar. */
export function StitchMixBar({ mix }: { mix: StudioMotif['mix'] }) {
  const total = mix.run + mix.satin + mix.fill || 1;
  const summary = parts.map((p) => `${mix[p.key].toLocaleString('en-US')} ${p.label}`).join(', ');
  return (
    <div
      role="img"
      aria-label={summary}
      title={summary}
      className="flex h-2.5 w-32 overflow-hidden rounded-full bg-linen-200"
    >
      {parts.map((p) => (
        <span key={p.key} className={p.className} style={{ width: `${(mix[p.key] / total) * 100}%` }} />
      ))}
    </div>
  );
}

export function StitchMixLegend() {
  return (
    <p className="flex gap-4 text-xs text-walnut-500">
      {parts.map((p) => (
        <span key={p.key} className="flex items-center gap-1.5">
          <span className={`h-2.5 w-2.5 rounded-full ${p.className}`} />
          {p.label}
        </span>
      ))}
    </p>
  );
}
