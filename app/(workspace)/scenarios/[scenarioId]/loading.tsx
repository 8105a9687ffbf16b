export default function ScenarioLoading() {
  return <p className="text-ink-muted">Loading scenario…</p>;
}
