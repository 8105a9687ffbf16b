import { CAUTION } from "@/lib/caution";

/** The brief's caution, shown on every page that carries results. */
export function CautionNote({ className = "" }: { className?: string }) {
  return (
    <p data-testid="caution" className={`rounded-card bg-caution-bg px-3 py-2 text-sm text-caution-ink ${className}`}>
      <strong className="font-semibold">Caution. </strong>
      {CAUTION}
    </p>
  );
}
