// Farfield's mark: a dot on the field sending arcs toward the stands.
export function BrandMark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect x="1" y="1" width="30" height="30" rx="8" fill="#1f4d31" />
      <circle cx="10" cy="22" r="3" fill="#ffffff" />
      <path d="M10 14a8 8 0 0 1 8 8" stroke="#dcebdf" strokeWidth="2.2" fill="none" strokeLinecap="round" />
      <path d="M10 8.5a13.5 13.5 0 0 1 13.5 13.5" stroke="#ffffff" strokeWidth="2.2" fill="none" strokeLinecap="round" opacity="0.85" />
    </svg>
  );
}
