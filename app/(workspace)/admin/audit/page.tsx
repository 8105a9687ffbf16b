import type { Metadata } from "next";
import Link from "next/link";
import { z } from "zod";
import { AdminOnlyNotice, getAdminOrNull } from "@/components/admin/admin-only";
import { AuditChange } from "@/components/admin/audit-change";
import { listAuditEntries, listAuditFilterOptions, type AuditFilter } from "@/db/queries/audit";
import { positiveIntParam } from "@/lib/api/params";
import { AUDIT_TARGETS } from "@/lib/audit/record";

export const metadata: Metadata = { title: "Audit trail" };

const DAY_MS = 24 * 60 * 60 * 1000;
const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "use YYYY-MM-DD");
const blankToUndefined = (value: unknown) => (value === "" ? undefined : value);

/** The filters live in the address, so a filtered trail can be bookmarked and shared. */
const searchSchema = z.object({
  target: z.preprocess(blankToUndefined, z.enum(AUDIT_TARGETS).optional()),
  action: z.preprocess(blankToUndefined, z.string().regex(/^[a-z-]+$/).optional()),
  actor: z.preprocess(blankToUndefined, positiveIntParam.optional()),
  from: z.preprocess(blankToUndefined, day.optional()),
  to: z.preprocess(blankToUndefined, day.optional()),
  before: z.preprocess(blankToUndefined, positiveIntParam.optional()),
});
type AuditSearch = z.infer<typeof searchSchema>;

function toFilter(search: AuditSearch): AuditFilter {
  return {
    targetType: search.target,
    action: search.action,
    actorId: search.actor,
    from: search.from ? new Date(`${search.from}T00:00:00Z`) : undefined,
    // "to" is inclusive: everything before the start of the next day.
    to: search.to ? new Date(new Date(`${search.to}T00:00:00Z`).getTime() + DAY_MS) : undefined,
    beforeId: search.before,
  };
}

/** A scenario version's target id is `scenarioId/number`; it links to that version. */
function targetLink(targetType: string, targetId: string | null) {
  if (!targetId) return "—";
  const version = targetId.match(/^(\d+)\/(\d+)$/);
  if (targetType === "scenario-version" && version) {
    return (
      <Link href={`/scenarios/${version[1]}?v=${version[2]}`} className="text-tide hover:underline">
        scenario {version[1]}, version {version[2]}
      </Link>
    );
  }
  if (targetType === "scenario") return <Link href={`/scenarios/${targetId}`} className="text-tide hover:underline">scenario {targetId}</Link>;
  return `${targetType} ${targetId}`;
}

const selectClass = "block w-full rounded-card border border-line-strong bg-surface px-2 py-1.5 text-sm";

export default async function AuditPage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [raw, admin] = await Promise.all([props.searchParams, getAdminOrNull()]);
  if (!admin) return <AdminOnlyNotice />;
  const parsed = searchSchema.safeParse(raw);
  const search: AuditSearch = parsed.success ? parsed.data : {};
  const [{ entries, hasOlder }, options] = await Promise.all([listAuditEntries({ filter: toFilter(search) }), listAuditFilterOptions()]);

  const olderHref = () => {
    const params = new URLSearchParams();
    for (const [key, value] of Object.entries({ ...search, before: entries.at(-1)?.id })) if (value !== undefined) params.set(key, String(value));
    return `/admin/audit?${params}`;
  };

  return (
    <div className="space-y-4">
      <div className="space-y-1">
        <h1 className="text-2xl font-bold">Audit trail</h1>
        <p className="max-w-3xl text-ink-muted">
          Every change to scenarios, layers, people, publishing and sharing: who made it, when, and what it was before and after.
        </p>
      </div>

      <form method="get" className="grid gap-3 rounded-card border border-line bg-surface p-4 md:grid-cols-6" aria-label="Filter the audit trail">
        <label className="space-y-1 text-sm">
          <span className="font-semibold">About</span>
          <select name="target" defaultValue={search.target ?? ""} className={selectClass}>
            <option value="">anything</option>
            {AUDIT_TARGETS.map((target) => (
              <option key={target} value={target}>{target}</option>
            ))}
          </select>
        </label>
        <label className="space-y-1 text-sm">
          <span className="font-semibold">Action</span>
          <select name="action" defaultValue={search.action ?? ""} className={selectClass}>
            <option value="">any</option>
            {options.actions.map((action) => (
              <option key={action} value={action}>{action}</option>
            ))}
          </select>
        </label>
        <label className="space-y-1 text-sm">
          <span className="font-semibold">By</span>
          <select name="actor" defaultValue={search.actor ? String(search.actor) : ""} className={selectClass}>
            <option value="">anyone</option>
            {options.actors.map((actor) => (
              <option key={actor.id} value={actor.id}>{actor.name}</option>
            ))}
          </select>
        </label>
        <label className="space-y-1 text-sm">
          <span className="font-semibold">From (UTC)</span>
          <input type="date" name="from" defaultValue={search.from ?? ""} className={selectClass} />
        </label>
        <label className="space-y-1 text-sm">
          <span className="font-semibold">To (UTC)</span>
          <input type="date" name="to" defaultValue={search.to ?? ""} className={selectClass} />
        </label>
        <div className="flex items-end gap-2">
          <button type="submit" className="rounded-card bg-tide px-4 py-2 text-sm font-semibold text-on-tide hover:bg-tide-strong">
            Filter
          </button>
          <Link href="/admin/audit" className="px-2 py-2 text-sm text-tide hover:underline">
            Clear
          </Link>
        </div>
      </form>
      {!parsed.success && (
        <p role="alert" className="rounded-card bg-error-bg px-3 py-2 text-sm text-error-ink">
          Some filters in the address were not understood and are ignored: {parsed.error.issues.map((issue) => issue.path.join(".")).join(", ")}.
        </p>
      )}

      {entries.length === 0 ? (
        <p className="text-ink-muted">Nothing recorded matches these filters.</p>
      ) : (
        <table className="w-full border-collapse text-left text-sm" data-testid="audit-table">
          <thead className="border-b border-line-strong">
            <tr>
              <th scope="col" className="py-2 pr-4 font-semibold">When (UTC)</th>
              <th scope="col" className="py-2 pr-4 font-semibold">Who</th>
              <th scope="col" className="py-2 pr-4 font-semibold">Action</th>
              <th scope="col" className="py-2 pr-4 font-semibold">On</th>
              <th scope="col" className="py-2 font-semibold">Change</th>
            </tr>
          </thead>
          <tbody>
            {entries.map((entry) => (
              <tr key={entry.id} className="border-b border-line align-top" data-testid="audit-row">
                <td className="py-2 pr-4 whitespace-nowrap">{entry.at.toISOString().replace("T", " ").slice(0, 19)}</td>
                <td className="py-2 pr-4">{entry.actorName ?? "not signed in"}</td>
                <td className="py-2 pr-4">{entry.targetType} · {entry.action}</td>
                <td className="py-2 pr-4">{targetLink(entry.targetType, entry.targetId)}</td>
                <td className="py-2"><AuditChange detail={entry.detail} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {hasOlder && (
        <Link href={olderHref()} className="text-sm text-tide hover:underline">
          Older entries →
        </Link>
      )}
    </div>
  );
}
