import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { scenarios, scenarioVersions, users, type ScenarioState } from "@/db/schema";

/** Scenarios that have at least one version in the given states, each with its newest such version. */
export async function listScenarios({ states }: { states: ScenarioState[] }) {
  const rows = await db
    .select({
      id: scenarios.id,
      name: scenarios.name,
      description: scenarios.description,
      versionNumber: scenarioVersions.number,
      state: scenarioVersions.state,
      params: scenarioVersions.params,
      createdAt: scenarioVersions.createdAt,
    })
    .from(scenarios)
    .innerJoin(scenarioVersions, eq(scenarioVersions.scenarioId, scenarios.id))
    .where(inArray(scenarioVersions.state, states))
    .orderBy(asc(scenarios.name), desc(scenarioVersions.number));

  const newest = new Map<number, (typeof rows)[number] & { versionCount: number }>();
  for (const row of rows) {
    const seen = newest.get(row.id);
    if (seen) seen.versionCount += 1;
    else newest.set(row.id, { ...row, versionCount: 1 });
  }
  return [...newest.values()];
}

export async function findScenario({ id }: { id: number }) {
  return db.query.scenarios.findFirst({ where: eq(scenarios.id, id) });
}

/** Every version of a scenario in the given states, newest first. */
export async function listScenarioVersions({ scenarioId, states }: { scenarioId: number; states: ScenarioState[] }) {
  return db
    .select({
      number: scenarioVersions.number,
      state: scenarioVersions.state,
      note: scenarioVersions.note,
      createdAt: scenarioVersions.createdAt,
      publishedAt: scenarioVersions.publishedAt,
      author: users.name,
    })
    .from(scenarioVersions)
    .leftJoin(users, eq(users.id, scenarioVersions.authorId))
    .where(and(eq(scenarioVersions.scenarioId, scenarioId), inArray(scenarioVersions.state, states)))
    .orderBy(desc(scenarioVersions.number));
}

export async function findScenarioVersion({ scenarioId, number }: { scenarioId: number; number: number }) {
  const [row] = await db
    .select({ version: scenarioVersions, author: users.name })
    .from(scenarioVersions)
    .leftJoin(users, eq(users.id, scenarioVersions.authorId))
    .where(and(eq(scenarioVersions.scenarioId, scenarioId), eq(scenarioVersions.number, number)));
  return row;
}
