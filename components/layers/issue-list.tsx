import type { FieldIssue } from "@/lib/errors";

/** The problems of a refused file, by row and column (or feature), with the total when more exist than are listed. */
export function IssueList({ issues, issueCount }: { issues: FieldIssue[]; issueCount: number }) {
  if (issues.length === 0) return null;
  return (
    <div className="space-y-2">
      <table className="w-full text-left text-sm" data-testid="upload-issues">
        <thead className="text-ink-muted">
          <tr>
            <th className="py-1 pr-4 font-semibold">Where</th>
            <th className="py-1 font-semibold">Problem</th>
          </tr>
        </thead>
        <tbody>
          {issues.map((issue, i) => (
            <tr key={i} className="border-t border-line">
              <td className="whitespace-nowrap py-1 pr-4 align-top font-semibold">{issue.path}</td>
              <td className="py-1">{issue.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {issueCount > issues.length && (
        <p className="text-sm text-ink-muted">
          Showing the first {issues.length} of {issueCount.toLocaleString("en")} problems.
        </p>
      )}
    </div>
  );
}
