import { z } from "zod";

/** A database id or version number in a URL segment. */
export const positiveIntParam = z.coerce
  .number({ error: "must be a whole number" })
  .int("must be a whole number")
  .positive("must be 1 or more")
  .max(Number.MAX_SAFE_INTEGER);

export const scenarioParamsSchema = z.object({ scenarioId: positiveIntParam });
export const scenarioVersionParamsSchema = z.object({ scenarioId: positiveIntParam, number: positiveIntParam });
