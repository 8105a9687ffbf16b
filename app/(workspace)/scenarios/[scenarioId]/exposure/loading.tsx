export default function ExposureLoading() {
  return <p className="text-ink-muted">Computing exposure from the scenario&rsquo;s layers…</p>;
}
