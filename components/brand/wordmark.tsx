/**
 * Leeway's wordmark: a source dot with two fronts, the outer one in the accent colour —
 * the gap between them is the "leeway" a warning buys.
 */
export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`}>
      <svg viewBox="0 0 32 32" aria-hidden="true" className="h-7 w-7">
        <rect width="32" height="32" rx="7" fill="#1d5c66" />
        <circle cx="9" cy="23" r="2.6" fill="#f5f3ee" />
        <path d="M9 14.5a8.5 8.5 0 0 1 8.5 8.5" fill="none" stroke="#f5f3ee" strokeWidth="2.4" strokeLinecap="round" />
        <path d="M9 7a16 16 0 0 1 16 16" fill="none" stroke="#e7b75a" strokeWidth="2.4" strokeLinecap="round" />
      </svg>
      <span className="text-xl font-bold tracking-tight text-ink">Leeway</span>
    </span>
  );
}
