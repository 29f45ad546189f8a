/**
 * Frostfold's mark: three folded layers stacked like shields, each lit on the left and shaded
 * on the right. Drawn for Frostfold; public/favicon.svg is the same drawing on a dark tile.
 */
export function LogoMark({ className = "size-8" }: { className?: string }) {
  return (
    <svg viewBox="4 3 24 26" className={className} aria-hidden="true" focusable="false">
      <path d="M16 5 6 10.5V14l10-5.5z" fill="#d9f7fb" />
      <path d="M16 5l10 5.5V14L16 8.5z" fill="#7fe1ee" />
      <path d="M16 11.5 6 17v3.5l10-5.5z" fill="#7fe1ee" />
      <path d="M16 11.5 26 17v3.5L16 15z" fill="#1fb2c8" />
      <path d="M16 18 6 23.5V27l10-5.5z" fill="#1fb2c8" />
      <path d="M16 18l10 5.5V27l-10-5.5z" fill="#147283" />
    </svg>
  );
}

export function Logo({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2.5 ${className}`}>
      <LogoMark />
      <span className="text-lg font-semibold tracking-wide text-ink-50">Frostfold</span>
    </span>
  );
}
