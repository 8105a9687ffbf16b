import { createHash } from "node:crypto";

/** JSON with object keys sorted at every level, so equal content always gives the same text. */
export function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}

/**
 * A result-cache key: `prefix` then the SHA-256 of everything the result depends on — the
 * scenario version's id and file, its layer version ids, the workspace settings and Leeway's
 * version. Change any of them and the key changes, so a stale result is never found.
 */
export function resultCacheKey(prefix: string, dependsOn: Record<string, unknown>): string {
  return `${prefix}${createHash("sha256").update(stableJson(dependsOn)).digest("hex")}`;
}
