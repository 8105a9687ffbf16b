/** Why a version's figures cannot be shown (no population layer, an unreadable scenario file…). */
export function UnavailableNote({ reason }: { reason: string }) {
  return (
    <p role="status" className="max-w-3xl rounded-card bg-caution-bg px-3 py-2 text-caution-ink" data-testid="exposure-unavailable">
      {reason}
    </p>
  );
}
