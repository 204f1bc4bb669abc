/** Our mark: two pulleys joined by a belt, drawn in the current text colour. */
// @ts-nocheck

export function Logo({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-semibold tracking-tight ${className}`}>
      <svg width="28" height="18" viewBox="0 0 28 18" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="1.6">
        <circle cx="7" cy="9" r="6" />
        <circle cx="7" cy="9" r="1.5" />
        <circle cx="22" cy="9" r="4" />
        <circle cx="22" cy="9" r="1" />
        <path d="M7 3 L22 5 M7 15 L22 13" />
      </svg>
      Pulleywright
    </span>
  );
}
