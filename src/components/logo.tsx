/** Pinwork's mark: two links meeting at a loaded pin. */
export function LogoMark({ className = 'size-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="7" className="fill-ink-800" />
      <path
        d="M9 6 L16 16 L9 26 M23 6 L16 16 L23 26"
        fill="none"
        className="stroke-ink-100"
        strokeWidth="3"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <circle cx="16" cy="16" r="4" className="fill-signal-400 stroke-ink-800" strokeWidth="1.5" />
    </svg>
  );
}
