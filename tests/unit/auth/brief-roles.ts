// The brief's role table (BRIEF.md, "Who uses it, and what each role may do"), transcribed here by
// hand and kept apart from lib/auth/permissions.ts, so the tests check the code against the brief
// rather than against itself. A later feature that adds a row to the brief adds it here too.
import type { Role } from "@/db/schema";

type Cell = true | false | string;

export const BRIEF_TABLE = {
  "see draft scenarios": { admin: true, planner: true, trainer: "only those shared for exercises", council: false },
  "see published scenarios, their exposure and council view": { admin: true, planner: true, trainer: true, council: true },
  "edit scenarios, stations, layers; upload": { admin: true, planner: true, trainer: false, council: false },
  "publish / unpublish to council (e-mails council members)": { admin: true, planner: true, trainer: false, council: false },
  "share a scenario for exercises (no e-mail to council)": { admin: true, planner: true, trainer: false, council: false },
  "print the council view; download exposure CSV": { admin: true, planner: true, trainer: true, council: true },
  "map sheet, handout, GeoJSON, site CSV, scenario file, exercise CAP message": { admin: true, planner: true, trainer: true, council: false },
  "people, roles, invitations, outbox, audit trail": { admin: true, planner: false, trainer: false, council: false },
} as const satisfies Record<string, Record<Role, Cell>>;

export type BriefRow = keyof typeof BRIEF_TABLE;
export type Caller = Role | "none";
export const CALLERS: readonly Caller[] = ["none", "admin", "planner", "trainer", "council"];

/** Expected status per caller: a role table cell or anything else spelled out. */
export type Expectation = Record<Caller, number>;

/**
 * Statuses for an action governed by one brief row: `yes` → `ok`, `no` → 403, no session → 401.
 * A conditional cell ("only those shared") must be settled by the case in `cells`.
 */
export function fromBrief(row: BriefRow, ok: number, cells: Partial<Record<Role, number>> = {}): Expectation {
  const roles = BRIEF_TABLE[row] as Record<Role, Cell>;
  const out = { none: 401 } as Expectation;
  for (const role of ["admin", "planner", "trainer", "council"] as const) {
    const cell = roles[role];
    const given = cells[role];
    if (given !== undefined) out[role] = given;
    else if (typeof cell === "string") throw new Error(`"${row}" is "${cell}" for ${role}: the case must say which status that gives.`);
    else out[role] = cell ? ok : 403;
  }
  return out;
}

/** Any signed-in role → `ok`, no session → 401 (reading shared reference data such as the station network). */
export function signedIn(ok: number): Expectation {
  return { none: 401, admin: ok, planner: ok, trainer: ok, council: ok };
}

/** The same status for every caller, signed in or not (health check, links from e-mails). */
export function everyone(status: number): Expectation {
  return { none: status, admin: status, planner: status, trainer: status, council: status };
}
