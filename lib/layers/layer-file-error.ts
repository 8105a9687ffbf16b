import { LeewayError, type FieldIssue } from "@/lib/errors";
import { MAX_LISTED_ISSUES } from "./limits";

/**
 * A layer file that was refused as a whole. `issues` lists the first problems (row and column,
 * or feature and ring); `issueCount` is how many there were in all.
 */
export class LayerFileError extends LeewayError {
  readonly issueCount: number;

  constructor(message: string, options: { issues?: FieldIssue[]; issueCount?: number; kind?: "invalid" | "too-large" } = {}) {
    super(options.kind ?? "invalid", message, { issues: options.issues });
    this.issueCount = options.issueCount ?? this.issues.length;
  }
}

/** Collects per-row problems: keeps the first `MAX_LISTED_ISSUES`, counts them all. */
export class IssueCollector {
  readonly listed: FieldIssue[] = [];
  count = 0;

  add(path: string, message: string): void {
    this.count += 1;
    if (this.listed.length < MAX_LISTED_ISSUES) this.listed.push({ path, message });
  }

  /** Throws a `LayerFileError` naming the first problem and the total, when anything was collected. */
  throwIfAny(what: "rows" | "features"): void {
    if (this.count === 0) return;
    const [first] = this.listed;
    const detail = `${first.path}: ${first.message}`;
    const listedNote = this.count > this.listed.length ? ` (the first ${this.listed.length} are listed)` : "";
    const message =
      this.count === 1
        ? `The file was refused: ${detail}. Nothing was saved.`
        : `The file was refused: ${this.count.toLocaleString("en")} problems in its ${what}, the first at ${detail}${listedNote}. Nothing was saved.`;
    throw new LayerFileError(message, { issues: this.listed, issueCount: this.count });
  }
}
