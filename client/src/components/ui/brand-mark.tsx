// Yardcall's mark: a wheel hub ringed in amber with a check, beside the name.
export function BrandMark({ label }: { label: string }) {
  return (
    <span className="inline-flex items-center gap-2 text-2xl font-bold tracking-tight">
      <svg viewBox="0 0 32 32" width="36" height="36" aria-hidden="true" focusable="false">
        <rect width="32" height="32" rx="7" fill="var(--yc-primary)" />
        <circle cx="16" cy="16" r="9" fill="none" stroke="var(--yc-accent)" strokeWidth="3" />
        <path
          d="M11.5 16.5l3 3 6-7"
          fill="none"
          stroke="var(--yc-on-primary)"
          strokeWidth="3"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
      </svg>
      <span>{label}</span>
    </span>
  );
}
