export default function LayersLoading() {
  return <p className="text-ink-muted">Loading layers…</p>;
}
