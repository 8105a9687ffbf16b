import type { ScenarioState } from "@/db/schema";

const LABELS: Record<ScenarioState, string> = {
  draft: "Draft",
  shared: "Shared for exercises",
  published: "Published to council",
};

const TONES: Record<ScenarioState, string> = {
  draft: "bg-paper text-ink-muted border-line-strong",
  shared: "bg-tide-soft text-tide-strong border-tide",
  published: "bg-ok-bg text-ok-ink border-ok-ink",
};

export function StateBadge({ state }: { state: ScenarioState }) {
  return <span className={`inline-block rounded-full border px-2 py-0.5 text-xs font-semibold ${TONES[state]}`}>{LABELS[state]}</span>;
}
