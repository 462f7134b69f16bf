/** Our mark: a condenser coil folded into a "C". Drawn here, borrowed from nowhere. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 48 48" className={className} aria-hidden="true" focusable="false">
      <rect x="2" y="2" width="44" height="44" rx="12" fill="currentColor" />
      <path
        d="M34 14H18a6 6 0 0 0 0 12h12a4 4 0 0 1 0 8H14"
        fill="none"
        stroke="#ffffff"
        strokeWidth="4"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <circle cx="34" cy="14" r="3" fill="#c6e6f6" />
    </svg>
  );
}
