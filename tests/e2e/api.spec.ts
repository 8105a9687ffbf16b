import { expect, test } from "@playwright/test";
import { signIn } from "./support/session";

test("API calls without a session get 401 and a JSON message", async ({ request }) => {
  for (const path of ["/api/scenarios", "/api/scenarios/1", "/api/scenarios/1/versions/1", "/api/stations"]) {
    const response = await request.get(path);
    expect(response.status(), path).toBe(401);
    const body = await response.json();
    expect(body.error.message, path).toContain("Sign in");
  }
});

test("an unknown scenario id is 404 and a malformed one is 400, each naming the problem", async ({ page }) => {
  await signIn(page, "planner");
  const unknown = await page.request.get("/api/scenarios/999999/versions/1");
  expect(unknown.status()).toBe(404);
  expect((await unknown.json()).error.message).toContain("999999");

  const malformed = await page.request.get("/api/scenarios/abc");
  expect(malformed.status()).toBe(400);
  expect((await malformed.json()).error.message).toContain("scenarioId");
});

test("scenario list, one version and the station network come from the API", async ({ page }) => {
  await signIn(page, "planner");
  const list = await (await page.request.get("/api/scenarios")).json();
  expect(list.scenarios.length).toBeGreaterThanOrEqual(3);
  const first = list.scenarios[0];
  const version = await (await page.request.get(`/api/scenarios/${first.id}/versions/${first.latest.number}`)).json();
  expect(version.version.params.source.mw).toBeGreaterThan(0);
  const stations = await (await page.request.get("/api/stations")).json();
  expect(stations.stations.length).toBeGreaterThanOrEqual(24);
});

test("pages carry a Content-Security-Policy that names only this server (plus a nonce for Next's scripts)", async ({ page }) => {
  const response = await page.goto("/sign-in");
  const csp = response?.headers()["content-security-policy"] ?? "";
  const directives = new Map(csp.split(";").map((d) => d.trim().split(/\s+/)).map(([name, ...sources]) => [name, sources]));
  for (const name of ["style-src", "img-src", "font-src", "worker-src", "connect-src"]) {
    expect(directives.get(name), name).toEqual(["'self'"]);
  }
  const scripts = directives.get("script-src") ?? [];
  expect(scripts.filter((s) => !s.startsWith("'nonce-"))).toEqual(["'self'", "'strict-dynamic'"]);
  expect(scripts.some((s) => s.startsWith("'nonce-"))).toBe(true);
  expect(directives.get("default-src")).toEqual(["'self'"]);
});
