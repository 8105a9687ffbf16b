export default function AdminLoading() {
  return <p className="text-ink-muted">Loading…</p>;
}
