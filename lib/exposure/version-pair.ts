import { z } from "zod";

/** `scenarioId:version` in a query string, e.g. `a=3:1`. */
const versionKey = z
  .string({ error: "is required (scenarioId:version, e.g. 3:1)" })
  .regex(/^[1-9]\d{0,15}:[1-9]\d{0,15}$/, "must be scenarioId:version, e.g. 3:1")
  .transform((text) => {
    const [scenarioId, number] = text.split(":").map(Number);
    return { scenarioId, number };
  });

/** The two versions of a comparison: A (the baseline) and B. */
export const versionPairSchema = z.object({ a: versionKey, b: versionKey });
export type VersionPair = z.infer<typeof versionPairSchema>;

/** The query string of a comparison of B with A. */
export function versionPairQuery(pair: { a: { scenarioId: number; number: number }; b: { scenarioId: number; number: number } }): string {
  return `a=${pair.a.scenarioId}:${pair.a.number}&b=${pair.b.scenarioId}:${pair.b.number}`;
}
