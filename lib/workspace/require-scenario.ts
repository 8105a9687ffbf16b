import { LeewayError } from "@/lib/errors";
import { parseScenario, type Scenario } from "@/lib/scenario/schema";

/**
 * The scenario file of a request body, checked with the scenario file's own schema; a bad file
 * is refused (400) with every issue by its JSON path in the file (`source.depthKm`, `stations[3].lon`).
 */
export function requireValidScenario(input: unknown): Scenario {
  const parsed = parseScenario(input);
  if (parsed.ok) return parsed.scenario;
  const [first] = parsed.issues;
  const more = parsed.issues.length > 1 ? ` (and ${parsed.issues.length - 1} more)` : "";
  throw new LeewayError("invalid", `The scenario is not valid: ${first.path}: ${first.message}${more}. Nothing was saved.`, { issues: parsed.issues });
}
