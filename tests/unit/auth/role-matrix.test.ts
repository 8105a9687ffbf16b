// The role × action test (issue 8): every route handler and server action on disk has a row in
// role-matrix.ts, and each cell — caller × case — gets the status the brief's role table says.
import { app } from "../support/app";
import { formData } from "../support/forms";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { PERMISSIONS, type Permission } from "@/lib/auth/permissions";
import type { Role } from "@/db/schema";
import { discoverEndpoints, inlineServerActions, routePathOf, type Endpoint } from "../support/endpoints";
import { BRIEF_TABLE, CALLERS, type BriefRow, type Caller } from "./brief-roles";
import { ACTION_MATRIX, ROUTE_MATRIX, type ActionCase, type RouteCase } from "./role-matrix";

const ROOT = path.resolve(__dirname, "../../..");
const endpoints: Endpoint[] = await discoverEndpoints();

beforeAll(() => app.startMailServer());

type AnyHandler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
type AnyAction = (previous: null, form: FormData) => Promise<unknown>;

/** `/api/scenarios/[scenarioId]` with { scenarioId: 4 } → `/api/scenarios/4`. */
function fillPath(template: string, params: Record<string, string>): string {
  return template.replace(/\[(?:\.\.\.)?([^\]]+)\]/g, (_whole, name: string) => {
    if (!(name in params)) throw new Error(`the case gives no value for route param "${name}"`);
    return params[name];
  });
}

/** Next's redirect / notFound / forbidden signals carry their status in `digest`. */
function statusOfThrown(error: unknown): number {
  const digest = typeof error === "object" && error && "digest" in error ? String(error.digest) : "";
  if (digest.startsWith("NEXT_REDIRECT")) return 303;
  const fallback = digest.match(/^NEXT_HTTP_ERROR_FALLBACK;(\d{3})$/);
  if (fallback) return Number(fallback[1]);
  throw error;
}

async function callRoute(endpoint: Endpoint, testCase: RouteCase, caller: Caller): Promise<number> {
  const fixture = await app.reset();
  const params = Object.fromEntries(Object.entries((await testCase.params?.(fixture)) ?? {}).map(([k, v]) => [k, String(v)]));
  const body = testCase.body?.(fixture);
  app.signInAs(caller);
  const loaded = (await import(path.join(ROOT, endpoint.file))) as Record<string, AnyHandler>;
  const query = typeof testCase.query === "function" ? testCase.query(params) : (testCase.query ?? "");
  const url = `http://leeway.test${fillPath(routePathOf(endpoint.file), params)}${query}`;
  const request = new Request(url, { method: endpoint.exportName, body: testCase.file ?? (body === undefined ? undefined : JSON.stringify(body)) });
  const response = await loaded[endpoint.exportName](request, { params: Promise.resolve(params) });
  return response.status;
}

async function callAction(endpoint: Endpoint, testCase: ActionCase, caller: Caller): Promise<number> {
  const fixture = await app.reset();
  const fields = await testCase.form(fixture);
  app.signInAs(caller);
  const loaded = (await import(path.join(ROOT, endpoint.file))) as Record<string, AnyAction>;
  try {
    const result = await loaded[endpoint.exportName](null, formData(fields));
    const status = typeof result === "object" && result && "status" in result ? result.status : undefined;
    if (typeof status !== "number") {
      throw new Error(`${endpoint.key} must return an ActionResult (lib/api/action-result.ts) so its status can be checked; it returned ${JSON.stringify(result)}`);
    }
    return status;
  } catch (error) {
    return statusOfThrown(error);
  }
}

describe("every route handler and server action is in the role matrix", () => {
  it("has a row for each one found on disk", () => {
    const missing = endpoints.filter((endpoint) => !(endpoint.key in (endpoint.kind === "route" ? ROUTE_MATRIX : ACTION_MATRIX)));
    const advice = missing.map((endpoint) => `  ${JSON.stringify(endpoint.key)}  (${endpoint.file}) — add it to ${endpoint.kind === "route" ? "ROUTE_MATRIX" : "ACTION_MATRIX"} in tests/unit/auth/role-matrix.ts`);
    expect(missing.map((endpoint) => endpoint.key), `Not in the role matrix:\n${advice.join("\n")}\n`).toEqual([]);
  });

  it("has no row for a route or action that no longer exists", () => {
    const found = new Set(endpoints.map((endpoint) => endpoint.key));
    const stale = [...Object.keys(ROUTE_MATRIX), ...Object.keys(ACTION_MATRIX)].filter((key) => !found.has(key));
    expect(stale, `Rows in tests/unit/auth/role-matrix.ts with nothing on disk: ${stale.join(", ")}`).toEqual([]);
  });

  it("keeps server actions in \"use server\" files, where this test can reach them", () => {
    expect(inlineServerActions(), "Inline \"use server\" directives; move these actions into a \"use server\" file").toEqual([]);
  });
});

describe("each cell of the matrix", () => {
  for (const endpoint of endpoints) {
    const row = endpoint.kind === "route" ? ROUTE_MATRIX[endpoint.key] : ACTION_MATRIX[endpoint.key];
    if (!row) continue;
    if ("notCalledHere" in row) {
      it.skip(`${endpoint.key}: ${row.notCalledHere}`, () => {});
      continue;
    }
    for (const testCase of row.cases) {
      for (const caller of CALLERS) {
        const expected = testCase.expect[caller];
        const label = `${endpoint.key}${testCase.name ? ` (${testCase.name})` : ""} as ${caller === "none" ? "no session" : caller} → ${expected}`;
        it(label, async () => {
          const status =
            endpoint.kind === "route" ? await callRoute(endpoint, testCase as RouteCase, caller) : await callAction(endpoint, testCase as ActionCase, caller);
          expect(status, label).toBe(expected);
        });
      }
    }
  }
});

// lib/auth/permissions.ts is the table the code reads; it must say what the brief says.
const PERMISSION_ROWS: Record<Permission, BriefRow | { roles: Role[]; why: string }> = {
  "scenario:edit": "edit scenarios, stations, layers; upload",
  "layer:edit": "edit scenarios, stations, layers; upload",
  "scenario:publish": "publish / unpublish to council (e-mails council members)",
  "scenario:share": "share a scenario for exercises (no e-mail to council)",
  "council:print": "print the council view; download exposure CSV",
  "exposure:csv": "print the council view; download exposure CSV",
  "export:files": "map sheet, handout, GeoJSON, site CSV, scenario file, exercise CAP message",
  "admin:people": "people, roles, invitations, outbox, audit trail",
  "layer:view": { roles: ["admin", "planner", "trainer"], why: "layers feed drafts and exercises; council sees results, not inputs" },
};

describe("lib/auth/permissions.ts agrees with the brief's role table", () => {
  for (const permission of Object.keys(PERMISSIONS) as Permission[]) {
    it(permission, () => {
      const source = PERMISSION_ROWS[permission];
      expect(source, `${permission} has no entry in PERMISSION_ROWS (tests/unit/auth/role-matrix.test.ts)`).toBeDefined();
      const expected =
        typeof source === "string"
          ? (Object.entries(BRIEF_TABLE[source]) as [Role, unknown][]).filter(([, cell]) => cell === true).map(([role]) => role)
          : source.roles;
      expect([...PERMISSIONS[permission]].sort()).toEqual([...expected].sort());
    });
  }
});
