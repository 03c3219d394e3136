/** The first thing a keyboard user reaches: a jump past the header to the page itself. */
export function SkipLink({ target = 'main' }: { target?: string }) {
  return (
    <a
      href={`#${target}`}
      className="sr-only rounded-full bg-walnut-900 px-4 py-2 text-linen-50 focus:not-sr-only focus:absolute focus:left-3 focus:top-3 focus:z-50"
    >
      Skip to the page
    </a>
  );
}
