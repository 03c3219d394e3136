/** The Hoopwright mark: an embroidery hoop with a running-stitch line through it. Drawn for the project. */
export function HoopMark({ className = 'h-9 w-9' }: { className?: string }) {
  return (
    <svg viewBox="0 0 40 40" className={className} aria-hidden="true">
      <circle cx="20" cy="20" r="16" fill="none" stroke="currentColor" strokeWidth="3.2" />
      <circle cx="20" cy="20" r="11.5" fill="none" stroke="currentColor" strokeWidth="1.2" opacity="0.55" />
      <rect x="17" y="1.5" width="6" height="5" rx="1.2" fill="currentColor" />
      <path
        d="M9 24c3-5 6-5 9 0s6 5 9 0 4-4 5-3"
        fill="none"
        stroke="#b4513a"
        strokeWidth="2"
        strokeDasharray="3 2"
        strokeLinecap="round"
      />
    </svg>
  );
}
