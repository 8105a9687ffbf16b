/**
 * `npm run bench [-- section-id …]`: runs every benchmark section (or the named ones) on one
 * core and prints each figure, its ratio to the section's baseline and whether it meets its
 * target. Figures are the fastest of a few runs (the least disturbed on a shared machine); they
 * are measurements, not tests.
 */
import { SECTIONS } from "./sections";
import type { BenchFigure } from "./section";

function formatFigure(f: BenchFigure): string {
  const ratio = f.baselineMs ? `  ×${(f.ms / f.baselineMs).toFixed(1)} baseline` : "";
  const target = f.targetMs ? (f.ms <= f.targetMs ? `  (target < ${f.targetMs.toFixed(0)} ms: met)` : `  (target < ${f.targetMs.toFixed(0)} ms: NOT met)`) : "";
  return `  ${f.label.padEnd(64)} ${f.ms.toFixed(0).padStart(7)} ms${ratio}${target}${f.note ? `  — ${f.note}` : ""}`;
}

async function main(ids: string[]): Promise<void> {
  const unknown = ids.filter((id) => !SECTIONS.some((s) => s.id === id));
  if (unknown.length) throw new Error(`unknown section ${unknown.join(", ")} (known: ${SECTIONS.map((s) => s.id).join(", ")})`);
  console.log(`Leeway benchmark — Node ${process.version}, ${new Date().toISOString().slice(0, 10)}`);
  for (const section of SECTIONS.filter((s) => ids.length === 0 || ids.includes(s.id))) {
    console.log(`\n${section.title} [${section.id}]`);
    for (const figure of await section.run()) console.log(formatFigure(figure));
  }
}

main(process.argv.slice(2)).catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
