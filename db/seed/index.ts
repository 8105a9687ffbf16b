import { connect } from "@/db/connect";
import { buildRegion } from "./region";
import { seedDemo } from "./seed-demo";

/** `npm run db:seed`: writes the invented demo region and demo accounts into DATABASE_URL (run the migrations first). */
async function main() {
  const url = process.env.DATABASE_URL ?? "file:./data/leeway.db";
  const { db, client } = connect(url, process.env.DATABASE_AUTH_TOKEN);
  try {
    const region = buildRegion();
    const report = await seedDemo(db, region);
    const created = report.lines.filter((l) => l.created).length;
    console.log(`Leeway demo seed → ${url}: ${created} created, ${report.lines.length - created} already present`);
    console.log(
      `  ${region.name} (invented): ${region.districts.length} districts, ${region.towns.length} towns, ` +
        `${region.population.value.reduce((a, b) => a + b, 0).toLocaleString("en")} people on ${region.population.lon.length.toLocaleString("en")} cells, ` +
        `${region.stations.length} stations`,
    );
    for (const line of report.lines) console.log(`  ${line.created ? "+" : "="} ${line.item}`);
  } finally {
    client.close();
  }
}

main().catch((error: unknown) => {
  console.error(`Leeway demo seed failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
