/**
 * Leeway's wordmark: a time axis with the alert (accent tick) and the strong shaking (tall tick);
 * the shaded span between them is the leeway a warning buys.
 */
export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`}>
      <svg viewBox="0 0 32 32" aria-hidden="true" className="h-7 w-7">
        <rect width="32" height="32" rx="7" fill="#1d5c66" />
        <rect x="10" y="12" width="12" height="12" fill="#2f7b86" />
        <path d="M6 24h20" stroke="#f5f3ee" strokeWidth="2" strokeLinecap="round" />
        <path d="M10 24V12" stroke="#e7b75a" strokeWidth="2.6" strokeLinecap="round" />
        <path d="M22 24V7" stroke="#f5f3ee" strokeWidth="2.6" strokeLinecap="round" />
      </svg>
      <span className="text-xl font-bold tracking-tight text-ink">Leeway</span>
    </span>
  );
}
