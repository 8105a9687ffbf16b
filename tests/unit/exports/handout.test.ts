// The drill handout (issue 9): the timeline's events and their layout, and the PDF as a reader
// sees it — one or two A4 pages, real text with the site, the warning per channel, the actions,
// the exercise marking, the caution and the "how it was made" line.
import { app, type Fixture } from "../support/app";
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { facilities, protectiveActions, scenarioVersions, settings } from "@/db/schema";
import { CAUTION } from "@/lib/caution";
import { timelineEvents } from "@/lib/exports/handout/timeline-events";
import { layoutTimeline, tickStepS } from "@/lib/exports/handout/timeline-layout";
import { insertFacilitiesVersion } from "../exposure/fixture";
import { getExport } from "./export-routes";
import { readPdf } from "./read-pdf";

describe("the handout timeline", () => {
  const input = {
    detectionS: 3.1,
    triggerStations: 2,
    alertIssuedS: 7.6,
    channels: [
      { channel: "cell-broadcast", alertS: 12.6 },
      { channel: "sirens", alertS: 17.6 },
    ],
    sArrivalS: 21.4,
    alerted: true,
    reactionTimeS: 2,
    action: { name: "Drop, cover, hold", secondsNeeded: 5 },
  };

  it("orders the events and puts 'action done' at alert + reaction + the action's seconds", () => {
    const events = timelineEvents(input);
    expect(events.map((e) => e.id)).toEqual(["origin", "detection", "issued", "alert-cell-broadcast", "alert-sirens", "action-done", "s-arrival"]);
    // Worked by hand: 12.6 s (primary channel) + 2 s reaction + 5 s = 19.6 s.
    expect(events.find((e) => e.id === "action-done")?.atS).toBeCloseTo(19.6, 9);
  });

  it("shows no alert and no action for a site that is not alerted", () => {
    const ids = timelineEvents({ ...input, alerted: false }).map((e) => e.id);
    expect(ids).toEqual(["origin", "detection", "issued", "s-arrival"]);
  });

  it("places labels so that none overlaps another in its lane, inside the axis", () => {
    const measure = (text: string) => text.length * 4.5;
    const layout = layoutTimeline(timelineEvents(input), { leftPt: 40, rightPt: 340, measure });
    expect(layout.endS).toBeGreaterThanOrEqual(21.4);
    for (const a of layout.events) {
      expect(a.labelXPt).toBeGreaterThanOrEqual(40);
      expect(a.labelXPt + a.labelWidthPt).toBeLessThanOrEqual(340 + 1e-9);
      for (const b of layout.events) {
        if (a === b || a.lane !== b.lane) continue;
        const apart = a.labelXPt + a.labelWidthPt <= b.labelXPt || b.labelXPt + b.labelWidthPt <= a.labelXPt;
        expect(apart, `${a.event.id} and ${b.event.id}`).toBe(true);
      }
    }
    // Close events (12.6 s, 17.6 s, 19.6 s, 21.4 s on 300 pt) cannot share one lane.
    expect(layout.lanes).toBeGreaterThan(1);
  });

  it("picks round tick steps", () => {
    expect(tickStepS(22, 10)).toBe(5);
    expect(tickStepS(95, 10)).toBe(10);
    expect(tickStepS(4, 10)).toBe(1);
  });
});

const SCENARIO_FILE = {
  version: 1,
  name: "Handout test",
  source: { lon: 150.2, lat: -30.1, depthKm: 15, mw: 7.0, faultType: "crustal" },
  stations: [
    { id: "S1", lon: 150.0, lat: -30.0 },
    { id: "S2", lon: 150.4, lat: -30.2 },
    { id: "S3", lon: 150.1, lat: -30.3, operating: false },
  ],
  timing: { triggerStations: 2, pWindowS: 1, telemetryS: 0.5, processingS: 1.5 },
  channels: [
    { id: "cell-broadcast", deliveryS: 4 },
    { id: "sirens", deliveryS: 8 },
  ],
  vs30: 400,
  area: { bbox: [149.5, -30.6, 150.9, -29.6], cellKm: 5 },
};

describe("the handout PDF", () => {
  let fixture: Fixture;
  beforeEach(async () => {
    fixture = await app.reset();
    await app.db.insert(scenarioVersions).values({ scenarioId: fixture.scenarioId, number: 4, params: SCENARIO_FILE, state: "shared", authorId: fixture.people.planner.id });
    await app.db.insert(protectiveActions).values([
      { name: "Drop, cover, hold", secondsNeeded: 5, position: 0 },
      { name: "Slow and stop trains", secondsNeeded: 30, position: 1 },
    ]);
    await app.db.insert(settings).values({ key: "reactionTimeS", value: 2 });
  });

  it("is one or two A4 pages of real text naming the site, the channels, the actions, the caution and how it was made", async () => {
    app.signInAs("trainer");
    // 40 km east of the epicentre: outside the blind zone of a 7-s alert.
    const response = await getExport("handout", fixture.scenarioId, 4, "?lon=150.6&lat=-30.1&name=Eastbank%20primary%20school");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    const pages = await readPdf(new Uint8Array(await response.arrayBuffer()));
    expect(pages.length).toBeGreaterThanOrEqual(1);
    expect(pages.length).toBeLessThanOrEqual(2);
    for (const page of pages) {
      // A4 is 210 × 297 mm = 595.28 × 841.89 pt (ISO 216).
      expect(page.widthPt).toBeCloseTo(595.28, 1);
      expect(page.heightPt).toBeCloseTo(841.89, 1);
    }
    const text = pages.map((p) => p.text).join(" ").replace(/\s+/g, " ");
    expect(text).toContain("Drill handout: Eastbank primary school");
    expect(text).toContain("EXERCISE");
    for (const word of ["cell-broadcast (primary)", "sirens", "Drop, cover, hold", "Slow and stop trains", "Strong shaking (S wave)", "Alert issued", "Earthquake starts"]) expect(text).toContain(word);
    // The caution and the provenance line are on every page.
    for (const page of pages) {
      const pageText = page.text.replace(/\s+/g, " ");
      expect(pageText).toContain(CAUTION.slice(0, 60));
      expect(pageText).toContain("How it was made: Leeway");
    }
    expect(await app.count("export_log")).toBe(1);
  });

  it("for a facility lists only the actions meant for its kind; for a typed point, every action", async () => {
    await app.db.update(protectiveActions).set({ facilityKinds: ["rail"] }).where(eq(protectiveActions.name, "Slow and stop trains"));
    const facilitiesVersionId = await insertFacilitiesVersion([{ name: "Eastbank primary school", kind: "school", geometry: { type: "Point", coordinates: [150.6, -30.1] } }]);
    await app.db.update(scenarioVersions).set({ layerVersions: { facilities: facilitiesVersionId } }).where(eq(scenarioVersions.number, 4));
    const [school] = await app.db.select({ id: facilities.id }).from(facilities);
    app.signInAs("trainer");
    const textOf = async (query: string) => {
      const response = await getExport("handout", fixture.scenarioId, 4, query);
      expect(response.status).toBe(200);
      return (await readPdf(new Uint8Array(await response.arrayBuffer()))).map((p) => p.text).join(" ").replace(/\s+/g, " ");
    };
    const forSchool = await textOf(`?facility=${school.id}`);
    expect(forSchool).toContain("Drop, cover, hold");
    expect(forSchool).not.toContain("Slow and stop trains");
    expect(await textOf("?lon=150.6&lat=-30.1")).toContain("Slow and stop trains");
  });

  it("refuses a facility the version does not have (404), and a half-given point (400), writing nothing", async () => {
    app.signInAs("planner");
    expect((await getExport("handout", fixture.scenarioId, 4, "?facility=99")).status).toBe(404);
    const half = await getExport("handout", fixture.scenarioId, 4, "?lon=150.6");
    expect(half.status).toBe(400);
    expect(await app.count("export_log")).toBe(0);
  });
});
