// The role × action matrix: one row per route handler method and per server action. The test
// (role-matrix.test.ts) finds every route.ts and "use server" export on disk and fails, naming
// the key, when one has no row here. Each case runs once per caller on a fresh fixture
// (tests/unit/support/app.ts): the admin, planner, trainer and council member, and no session.
//
// Adding a row: copy the key the failure prints, say which brief row governs it (fromBrief) or
// that any signed-in person may (signedIn), and give the request that should succeed.
import { app, type Fixture } from "../support/app";
import { makeFixtureComputable } from "../support/computable-scenario";
import { storeLayerVersion } from "@/db/queries/layers";
import { issueAuthToken } from "@/db/queries/tokens";
import { scenarios, scenarioVersions, users } from "@/db/schema";
import { everyone, fromBrief, signedIn, type Expectation } from "./brief-roles";
import { comparableVersions, computableVersion } from "../exposure/fixture";
import { readLayerFile } from "@/lib/layers/read-layer-file";
import { fixtureScenarioFile } from "../support/scenario-file";

export interface RouteCase {
  /** Shown in the test name when a row has several cases. */
  name?: string;
  /** Route params; may write rows first (runs after the fixture is reset, before signing in). */
  params?: (fixture: Fixture) => Record<string, string | number> | Promise<Record<string, string | number>>;
  /** A query string, or one made from the case's params (for ids the fixture writes first). */
  query?: string | ((params: Record<string, string>) => string);
  body?: (fixture: Fixture) => unknown;
  /** A file's text sent as the raw body instead of JSON (the layer uploads read the body as the file). */
  file?: string;
  expect: Expectation;
}

export interface ActionCase {
  name?: string;
  /** The form fields; may write rows first. */
  form: (fixture: Fixture) => Record<string, string | number> | Promise<Record<string, string | number>>;
  expect: Expectation;
}

export type MatrixRow<C> = { cases: C[] } | { notCalledHere: string };

/** A scenario that has only a draft version (so trainers and council may not see it at all). */
async function draftOnlyScenario(fixture: Fixture) {
  const [scenario] = await app.db.insert(scenarios).values({ name: "Draft only", createdBy: fixture.people.planner.id }).returning();
  await app.db.insert(scenarioVersions).values({ scenarioId: scenario.id, number: 1, params: {}, authorId: fixture.people.planner.id });
  return scenario.id;
}

/** Someone invited and not yet signed up, with a valid link of the given kind. */
async function newPersonWithLink(kind: "invite" | "reset") {
  const [person] = await app.db.insert(users).values({ email: `new-${kind}@fixture.example`, name: "New person", role: "council" }).returning();
  const { token } = await issueAuthToken(app.db, { kind, userId: person.id });
  return { person, token };
}

/** The form behind a link, filled in correctly. */
async function newPasswordForm(kind: "invite" | "reset") {
  const { token } = await newPersonWithLink(kind);
  return { token, password: "a-long-new-password", confirm: "a-long-new-password" };
}

/** A complete scenario file (the fixture's source and stations plus site conditions and an area), for the writing routes. */
const MATRIX_SCENARIO_FILE = fixtureScenarioFile("Matrix scenario");

/** A version of the fixture's scenario holding a complete scenario file and the fixture's population layer, for the export routes. */
async function exportableVersion(fixture: Fixture, state: "shared" | "published") {
  const number = 4;
  await app.db.insert(scenarioVersions).values({
    scenarioId: fixture.scenarioId,
    number,
    params: MATRIX_SCENARIO_FILE,
    layerVersions: { population: fixture.populationLayerVersionId },
    state,
    authorId: fixture.people.planner.id,
  });
  return { scenarioId: fixture.scenarioId, number };
}

/** A map-sheet view as the browser sends it for a PNG sheet (lib/exports/map-sheet/sheet-request.ts). */
const MATRIX_SHEET_VIEW = {
  paper: "a4",
  orientation: "landscape",
  format: "png",
  centre: [150.2, -30.1],
  zoom: 8,
  bounds: [149.4, -30.6, 151.0, -29.6],
  legend: [],
  overlays: { stations: true, sources: true },
};

const EXPORT_FILES = "map sheet, handout, GeoJSON, site CSV, scenario file, exercise CAP message" as const;
const EXPOSURE_CSV = "print the council view; download exposure CSV" as const;

/** The cases of a file export: a version shared for exercises (the trainer's) and a published one. */
const fileExportCases = (query?: string): RouteCase[] => [
  { name: "shared version", params: (f) => exportableVersion(f, "shared"), query, expect: fromBrief(EXPORT_FILES, 200) },
  { name: "published version", params: (f) => exportableVersion(f, "published"), query, expect: fromBrief(EXPORT_FILES, 200) },
];

/**
 * Exposure, its CSV and the threshold study of a version in each state: whoever may see a version
 * may see its exposure (and every role may download exposure CSV of what it may see).
 */
const exposureCases = (query?: string): RouteCase[] => [
  { name: "draft", params: () => computableVersion("draft"), query, expect: fromBrief("see draft scenarios", 200, { trainer: 403 }) },
  { name: "shared", params: () => computableVersion("shared"), query, expect: fromBrief("see draft scenarios", 200, { trainer: 200 }) },
  { name: "published", params: () => computableVersion("published"), query, expect: fromBrief("see published scenarios, their exposure and council view", 200) },
];

/** Comparisons of two versions in one state; the versions' ids go in the query. */
const compareCases = (table = ""): RouteCase[] => [
  { name: "draft versions", params: () => comparableVersions("draft"), query: (p) => `?a=${p.a}&b=${p.b}${table}`, expect: fromBrief("see draft scenarios", 200, { trainer: 403 }) },
  {
    name: "published versions",
    params: () => comparableVersions("published"),
    query: (p) => `?a=${p.a}&b=${p.b}${table}`,
    expect: fromBrief("see published scenarios, their exposure and council view", 200),
  },
];

const versionParams = (number: keyof Fixture["versions"]) => (fixture: Fixture) => ({ scenarioId: fixture.scenarioId, number: fixture.versions[number] });

/** Two population cells in the layer tests' invented region (tests/fixtures/layers), for the upload routes. */
const MATRIX_POPULATION_CSV = "lon,lat,population\n-126.22,-46.90,1200\n-126.21,-46.90,850\n";
const MATRIX_STATIONS_CSV = "id,lon,lat,operating\nMX01,-126.21,-46.89,true\nMX02,-126.12,-46.93,no\n";

/** A stations layer of its own, used by no scenario version (so it may be deleted), stored as the upload route stores it. */
async function matrixStationsLayer(fixture: Fixture) {
  const layer = await readLayerFile("stations", "csv", MATRIX_STATIONS_CSV);
  const stored = await storeLayerVersion({ layer, target: { name: "Matrix stations" }, sourceFile: "matrix-stations.csv", actorId: fixture.people.planner.id });
  return { layerId: stored.layerId, number: stored.number };
}
const matrixLayerId = async (fixture: Fixture) => ({ layerId: (await matrixStationsLayer(fixture)).layerId });

const EDIT = "edit scenarios, stations, layers; upload" as const;
/** Reading layers has no row in the brief: lib/auth/permissions.ts "layer:view" (admin, planner, trainer; PERMISSION_ROWS in the test says why). */
const LAYER_VIEW: Expectation = { none: 401, admin: 200, planner: 200, trainer: 200, council: 403 };

export const ROUTE_MATRIX: Record<string, MatrixRow<RouteCase>> = {
  "GET /api/auth/[...nextauth]": {
    notCalledHere: "next-auth's own handler needs Next's request scope; sign-in for every role is covered by tests/e2e and tests/unit/auth/sign-in-limit.test.ts",
  },
  "POST /api/auth/[...nextauth]": {
    notCalledHere: "next-auth's own handler needs Next's request scope; sign-in for every role is covered by tests/e2e and tests/unit/auth/sign-in-limit.test.ts",
  },
  "GET /api/health": { cases: [{ expect: everyone(200) }] },
  "GET /api/stations": { cases: [{ expect: signedIn(200) }] },
  "GET /api/scenarios": { cases: [{ expect: signedIn(200) }] },
  "GET /api/scenarios/[scenarioId]": {
    cases: [
      { name: "with a published version", params: (f) => ({ scenarioId: f.scenarioId }), expect: signedIn(200) },
      {
        name: "draft only",
        params: async (f) => ({ scenarioId: await draftOnlyScenario(f) }),
        expect: fromBrief("see draft scenarios", 200, { trainer: 403 }),
      },
    ],
  },
  "GET /api/scenarios/[scenarioId]/versions/[number]": {
    cases: [
      { name: "draft", params: versionParams("draft"), expect: fromBrief("see draft scenarios", 200, { trainer: 403 }) },
      { name: "shared", params: versionParams("shared"), expect: fromBrief("see draft scenarios", 200, { trainer: 200 }) },
      { name: "published", params: versionParams("published"), expect: fromBrief("see published scenarios, their exposure and council view", 200) },
    ],
  },
  "POST /api/scenarios": {
    cases: [{ body: () => ({ name: "Matrix scenario", scenario: MATRIX_SCENARIO_FILE }), expect: fromBrief("edit scenarios, stations, layers; upload", 201) }],
  },
  "POST /api/scenarios/[scenarioId]/versions": {
    cases: [
      {
        params: (f) => ({ scenarioId: f.scenarioId }),
        body: (f) => ({ scenario: MATRIX_SCENARIO_FILE, basedOn: f.versions.published, note: "Matrix" }),
        expect: fromBrief("edit scenarios, stations, layers; upload", 201),
      },
    ],
  },
  "POST /api/scenarios/[scenarioId]/versions/[number]/publish": {
    cases: [{ params: async (f) => (await makeFixtureComputable(f), versionParams("draft")(f)), body: () => ({ note: "Matrix" }), expect: fromBrief("publish / unpublish to council (e-mails council members)", 200) }],
  },
  "DELETE /api/scenarios/[scenarioId]/versions/[number]/publish": {
    cases: [{ params: versionParams("published"), body: () => ({ reason: "Matrix" }), expect: fromBrief("publish / unpublish to council (e-mails council members)", 200) }],
  },
  "POST /api/scenarios/[scenarioId]/versions/[number]/share": {
    cases: [{ params: versionParams("draft"), expect: fromBrief("share a scenario for exercises (no e-mail to council)", 200) }],
  },
  "DELETE /api/scenarios/[scenarioId]/versions/[number]/share": {
    cases: [{ params: versionParams("shared"), expect: fromBrief("share a scenario for exercises (no e-mail to council)", 200) }],
  },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exposure": { cases: exposureCases() },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exposure/csv": { cases: exposureCases("?table=class-band") },
  "GET /api/scenarios/[scenarioId]/versions/[number]/threshold-study": { cases: exposureCases() },
  "GET /api/scenarios/[scenarioId]/versions/[number]/threshold-study/csv": { cases: exposureCases() },
  "GET /api/compare": { cases: compareCases() },
  "GET /api/compare/csv": { cases: compareCases("&table=transitions") },
  "GET /api/compare/seconds-gained": {
    cases: [
      { name: "draft versions", params: () => comparableVersions("draft"), query: (p) => `?a=${p.a}&b=${p.b}`, expect: fromBrief(EXPORT_FILES, 200, { trainer: 403 }) },
      { name: "published versions", params: () => comparableVersions("published"), query: (p) => `?a=${p.a}&b=${p.b}`, expect: fromBrief(EXPORT_FILES, 200) },
    ],
  },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/cap": { cases: fileExportCases("?exercise=Matrix%20drill") },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/contours": { cases: fileExportCases() },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/sites": { cases: fileExportCases("?point=150.2,-30.0") },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/scenario-file": { cases: fileExportCases() },
  "POST /api/scenarios/[scenarioId]/versions/[number]/exports/map-sheet": {
    // A PNG sheet needs no image on the server: the composed marks come back as JSON.
    cases: fileExportCases().map((c) => ({ ...c, body: () => ({ view: MATRIX_SHEET_VIEW }) })),
  },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/facilities": { cases: fileExportCases() },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/handout": { cases: fileExportCases("?lon=150.4&lat=-30.0&name=Matrix%20school") },
  "GET /api/scenarios/[scenarioId]/versions/[number]/exports/exposure": {
    cases: [
      // Council may download exposure CSV, but only of versions they may see (published).
      { name: "shared version", params: (f) => exportableVersion(f, "shared"), expect: fromBrief(EXPOSURE_CSV, 200, { council: 403 }) },
      { name: "published version", params: (f) => exportableVersion(f, "published"), query: "?table=districts", expect: fromBrief(EXPOSURE_CSV, 200) },
    ],
  },
  "GET /api/exports/[scenarioId]": { cases: [{ params: (f) => ({ scenarioId: f.scenarioId }), expect: signedIn(200) }] },
  "GET /api/layers": { cases: [{ expect: LAYER_VIEW }] },
  "POST /api/layers": {
    cases: [{ query: "?kind=population&format=csv&name=Matrix%20population&fileName=matrix-population.csv", file: MATRIX_POPULATION_CSV, expect: fromBrief(EDIT, 201) }],
  },
  // The preview answers 200 for a refused file too; this is the CSV POST /api/layers stores (201), so it is accepted.
  "POST /api/layers/preview": { cases: [{ query: "?kind=population&format=csv", file: MATRIX_POPULATION_CSV, expect: fromBrief(EDIT, 200) }] },
  "GET /api/layers/[layerId]": { cases: [{ params: matrixLayerId, expect: LAYER_VIEW }] },
  "PATCH /api/layers/[layerId]": { cases: [{ params: matrixLayerId, body: () => ({ name: "Matrix stations, renamed" }), expect: fromBrief(EDIT, 200) }] },
  "DELETE /api/layers/[layerId]": { cases: [{ params: matrixLayerId, expect: fromBrief(EDIT, 204) }] },
  "POST /api/layers/[layerId]/versions": {
    cases: [{ params: matrixLayerId, query: "?format=csv&fileName=matrix-stations-v2.csv", file: MATRIX_STATIONS_CSV, expect: fromBrief(EDIT, 201) }],
  },
  "GET /api/layers/[layerId]/versions/[number]/features": { cases: [{ params: matrixStationsLayer, expect: LAYER_VIEW }] },
};

const PEOPLE = "people, roles, invitations, outbox, audit trail" as const;

export const ACTION_MATRIX: Record<string, MatrixRow<ActionCase>> = {
  "app/(workspace)/admin/people/actions.ts#invitePersonAction": {
    cases: [{ form: () => ({ name: "Matrix Person", email: "matrix@fixture.example", role: "council" }), expect: fromBrief(PEOPLE, 200) }],
  },
  "app/(workspace)/admin/people/actions.ts#reinvitePersonAction": {
    cases: [
      {
        form: async () => ({ userId: (await newPersonWithLink("invite")).person.id }),
        expect: fromBrief(PEOPLE, 200),
      },
    ],
  },
  "app/(workspace)/admin/people/actions.ts#changeRoleAction": {
    cases: [{ form: (f) => ({ userId: f.people.trainer.id, role: "planner" }), expect: fromBrief(PEOPLE, 200) }],
  },
  "app/(workspace)/admin/people/actions.ts#setActiveAction": {
    cases: [{ form: (f) => ({ userId: f.people.trainer.id, active: "false" }), expect: fromBrief(PEOPLE, 200) }],
  },
  "app/(workspace)/admin/people/actions.ts#sendResetLinkAction": {
    cases: [{ form: (f) => ({ userId: f.people.trainer.id }), expect: fromBrief(PEOPLE, 200) }],
  },
  // Links from e-mails are used before signing in: the link itself is the credential.
  "app/(auth)/invite/actions.ts#acceptInvitationAction": {
    cases: [{ form: () => newPasswordForm("invite"), expect: everyone(200) }],
  },
  "app/(auth)/reset-password/actions.ts#requestPasswordResetAction": {
    cases: [{ form: (f) => ({ email: f.people.council.email }), expect: everyone(200) }],
  },
  "app/(auth)/reset-password/actions.ts#resetPasswordAction": {
    cases: [{ form: () => newPasswordForm("reset"), expect: everyone(200) }],
  },
};
