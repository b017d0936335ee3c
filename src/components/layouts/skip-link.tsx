/** First thing a keyboard user reaches: jumps past the header and navigation. */
export function SkipLink({ target = 'main' }: { target?: string }) {
  return (
    <a
      href={`#${target}`}
      className="sr-only z-50 rounded-lg bg-field-900 px-4 py-3 font-bold text-oat-50 focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
    >
      Skip to main content
    </a>
  );
}
