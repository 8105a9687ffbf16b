import type { z } from "zod";
import type { FieldIssue } from "@/lib/errors";

/** Formats a zod path as `a.b[2].c`, the way Leeway names fields in messages. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, key) => {
    if (typeof key === "number") return `${out}[${key}]`;
    return out ? `${out}.${String(key)}` : String(key);
  }, "");
}

/** Turns zod issues into Leeway's field issues (unknown keys are named one by one). */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.flatMap((issue) => {
    if (issue.code === "unrecognized_keys") {
      return issue.keys.map((key) => ({
        path: formatPath([...issue.path, key]),
        message: "unknown field",
      }));
    }
    return [{ path: formatPath(issue.path) || "(body)", message: issue.message }];
  });
}
