import type { AuditDetail, AuditSummary } from "@/lib/audit/record";

type Value = AuditSummary[string] | undefined;

function show(value: Value): string {
  if (value === undefined) return "—";
  if (value === null) return "none";
  return String(value);
}

/**
 * A before/after summary as short lines: a changed field reads `role: trainer → planner`, a field
 * that only names the target (e-mail, scenario) is shown once.
 */
export function AuditChange({ detail }: { detail: AuditDetail | null }) {
  if (!detail) return <span className="text-ink-muted">—</span>;
  const before = detail.before ?? {};
  const after = detail.after ?? {};
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])];
  return (
    <ul className="space-y-0.5">
      {keys.map((key) => {
        const changed = key in before && key in after && before[key] !== after[key];
        const value = key in after ? after[key] : before[key];
        return (
          <li key={key}>
            <span className="text-ink-muted">{key}:</span> {changed ? `${show(before[key])} → ${show(after[key])}` : show(value)}
          </li>
        );
      })}
    </ul>
  );
}
