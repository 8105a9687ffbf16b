export default function LayerLoading() {
  return <p className="text-ink-muted">Loading the layer…</p>;
}
