/** A loading line with words, so it is announced and readable, not just a moving circle. */
export function Loading({ label = "Loading…" }: { label?: string }) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-sm text-ink-300">
      <span className="size-4 animate-spin rounded-full border-2 border-frost-400 border-r-transparent" aria-hidden="true" />
      {label}
    </p>
  );
}
