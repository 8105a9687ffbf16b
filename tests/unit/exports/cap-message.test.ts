// The exercise alert message (issue 9): valid against the CAP 1.2 schema, and the CAP 1.2 data
// dictionary's rules that a schema cannot express checked one by one (OASIS CAP-v1.2-os §3.2).
import { describe, expect, it } from "vitest";
import { CAUTION } from "@/lib/caution";
import { alertAreaFigures } from "@/lib/exports/cap/alert-area-figures";
import { buildExerciseMessage, exerciseIdentifier, exerciseSender, FORBIDDEN_ID_CHARACTERS, type ExerciseMessageInput } from "@/lib/exports/cap/build-exercise-message";
import { CAP_CERTAINTIES, CAP_SEVERITIES, CAP_URGENCIES, mapCapCodes } from "@/lib/exports/cap/cap-mapping";
import { capPolygonsOf } from "@/lib/exports/cap/cap-polygons";
import { formatCapDateTime } from "@/lib/exports/cap/cap-time";
import { validateCap } from "./validate-cap";

// Two parts, GeoJSON order [lon, lat]; the first has a hole (a place inside that is not alerted).
const PART_A: [number, number][] = [
  [151.0, -33.0],
  [151.5, -33.0],
  [151.5, -32.5],
  [151.0, -32.5],
  [151.0, -33.0],
];
const HOLE_A: [number, number][] = [
  [151.2, -32.8],
  [151.2, -32.7],
  [151.3, -32.7],
  [151.2, -32.8],
];
const PART_B: [number, number][] = [
  [152.0, -34.0],
  [152.2, -34.0],
  [152.1, -33.8],
  [152.0, -34.0],
];

function input(overrides: Partial<ExerciseMessageInput> = {}): ExerciseMessageInput {
  return {
    identifier: exerciseIdentifier(7, 3, new Date("2026-05-04T03:02:01.500Z")),
    sender: exerciseSender("leeway.example"),
    sentAt: new Date("2026-05-04T03:02:01.500Z"),
    offsetMinutes: 600,
    expiresAfterMinutes: 60,
    exerciseName: "Harbour schools drill & review <May>",
    scenario: { name: "Test fault", versionNumber: 3, mw: 6.9, depthKm: 9, lon: 151.2, lat: -32.9, faultType: "crustal", alertIssuedS: 6.25, triggerStations: 2 },
    alertArea: [[PART_A, HOLE_A], [PART_B]],
    codes: mapCapCodes({ intensityScale: "jma", maxAlertAreaIntensity: 5.2, maxAlertAreaPExceedTarget: 0.8 }),
    caution: CAUTION,
    provenance: "Leeway test; computed 2026-05-04",
    leewayVersion: "0.1.0",
    ...overrides,
  };
}

const one = (xml: string, tag: string) => {
  const found = [...xml.matchAll(new RegExp(`<${tag}>([^<]*)</${tag}>`, "g"))].map((m) => m[1]);
  expect(found, `<${tag}> elements`).toHaveLength(1);
  return found[0];
};
const unescape = (text: string) => text.replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, "&");

describe("the exercise message against the CAP 1.2 XML schema", () => {
  it("is valid (xmllint with tests/fixtures/cap/CAP-v1.2.xsd)", async () => {
    const result = await validateCap(buildExerciseMessage(input()));
    expect(result.errors).toEqual([]);
    expect(result.valid).toBe(true);
  });

  // The validator must be able to fail: each broken copy breaks one rule the schema encodes.
  it.each([
    ["a sent time with Z (CAP 1.2 §3.3.2 forbids it)", (xml: string) => xml.replace(/<sent>([^<]*)\+10:00<\/sent>/, "<sent>$1Z</sent>")],
    ["a status outside the enumeration", (xml: string) => xml.replace("<status>Exercise</status>", "<status>Drill</status>")],
    ["a scope outside the enumeration", (xml: string) => xml.replace("<scope>Restricted</scope>", "<scope>Participants</scope>")],
    ["elements out of order", (xml: string) => xml.replace(/(<msgType>Alert<\/msgType>)\n(\s*)(<status>Exercise<\/status>)/, "$3\n$2$1").replace(/(<status>Exercise<\/status>)\n(\s*)(<msgType>Alert<\/msgType>)/, "$3\n$2$1")],
    ["a category outside the enumeration", (xml: string) => xml.replace("<category>Geo</category>", "<category>Quake</category>")],
  ])("refuses %s", async (_what, corrupt) => {
    const xml = buildExerciseMessage(input());
    const broken = corrupt(xml);
    expect(broken).not.toBe(xml);
    expect((await validateCap(broken)).valid).toBe(false);
  });
});

describe("the data-dictionary rules (CAP-v1.2-os §3.2)", () => {
  const xml = buildExerciseMessage(input());

  it("is an exercise alert for participants only, naming the exercise", () => {
    expect(one(xml, "status")).toBe("Exercise");
    expect(one(xml, "msgType")).toBe("Alert");
    expect(one(xml, "scope")).toBe("Restricted");
    // §3.2.1: restriction is used when scope is "Restricted".
    expect(unescape(one(xml, "restriction"))).toMatch(/exercise "Harbour schools drill & review <May>"/);
    expect(unescape(one(xml, "note"))).toContain("Harbour schools drill & review <May>");
    expect(one(xml, "category")).toBe("Geo");
  });

  it("has a headline starting EXERCISE, within the suggested 160 characters, and the caution in the description", () => {
    const headline = one(xml, "headline");
    expect(headline.startsWith("EXERCISE")).toBe(true);
    expect(headline.length).toBeLessThanOrEqual(160);
    expect(unescape(one(xml, "description"))).toContain(CAUTION);
    expect(one(xml, "description").startsWith("EXERCISE ONLY")).toBe(true);
  });

  it("escapes text, so '<' and '&' in a name cannot end an element", () => {
    expect(xml).toContain("Harbour schools drill &amp; review &lt;May&gt;");
    expect(xml).not.toContain("& review");
  });

  it("writes sent and expires with a numeric offset, never Z (§3.3.2)", () => {
    for (const tag of ["sent", "expires"]) {
      expect(one(xml, tag)).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d[+-]\d\d:\d\d$/);
    }
    // Worked by hand: 03:02:01.5 UTC at UTC+10:00 is 13:02:01 local, seconds truncated; expires one hour later.
    expect(one(xml, "sent")).toBe("2026-05-04T13:02:01+10:00");
    expect(one(xml, "expires")).toBe("2026-05-04T14:02:01+10:00");
  });

  it("has an identifier and sender without spaces, commas, '<' or '&' (§3.2.1)", () => {
    for (const tag of ["identifier", "sender"]) expect(one(xml, tag)).not.toMatch(/[\s,<&]/);
    expect(exerciseSender("bad host, name&<x>")).toBe("leeway-exercise@badhostnamex");
    expect(() => buildExerciseMessage(input({ identifier: "has space" }))).toThrow(/identifier/);
    expect(() => buildExerciseMessage(input({ sender: "a,b" }))).toThrow(/sender/);
    expect(FORBIDDEN_ID_CHARACTERS.test("tab\there")).toBe(true);
  });

  it("writes one polygon per part, as lat,lon pairs, closed, without holes", () => {
    const polygons = [...xml.matchAll(/<polygon>([^<]*)<\/polygon>/g)].map((m) => m[1].split(" ").map((pair) => pair.split(",").map(Number)));
    expect(polygons).toHaveLength(2);
    // Latitude first: the fixture's first position [151.0, -33.0] (lon, lat) becomes "-33,151".
    expect(polygons[0][0]).toEqual([-33, 151]);
    expect(polygons[1][0]).toEqual([-34, 152]);
    for (const pairs of polygons) {
      expect(pairs.length).toBeGreaterThanOrEqual(4);
      expect(pairs[pairs.length - 1]).toEqual(pairs[0]);
      for (const [lat, lon] of pairs) {
        expect(Math.abs(lat)).toBeLessThanOrEqual(90);
        expect(Math.abs(lon)).toBeLessThanOrEqual(180);
      }
    }
    // The hole's points appear in no polygon; the description says a gap was left out.
    expect(xml).not.toContain("-32.8,151.2");
    expect(unescape(one(xml, "description"))).toContain("1 gap that are not alerted");
  });

  it("refuses an empty alert area", () => {
    expect(() => buildExerciseMessage(input({ alertArea: [] }))).toThrow(/no alert area/);
  });
});

describe("CAP polygons from GeoJSON rings", () => {
  it("closes an open ring, drops repeated points and rings without area, and wraps longitudes past 180", () => {
    const { polygons, droppedHoles } = capPolygonsOf([
      [[[179.5, 10], [180.5, 10], [180.5, 10], [180.5, 11]]],
      [[[0, 0], [1, 1], [0, 0]]],
    ]);
    expect(droppedHoles).toBe(0);
    expect(polygons).toHaveLength(1);
    expect(polygons[0].text).toBe("10,179.5 10,-179.5 11,-179.5 10,179.5");
  });
});

describe("CAP date-times (§3.3.2), worked by hand", () => {
  const at = new Date("2026-03-05T12:34:56.789Z");
  it.each([
    [0, "2026-03-05T12:34:56+00:00"],
    [-300, "2026-03-05T07:34:56-05:00"],
    [330, "2026-03-05T18:04:56+05:30"],
    [720, "2026-03-06T00:34:56+12:00"],
    [-45, "2026-03-05T11:49:56-00:45"],
  ])("offset %i min gives %s", (offset, expected) => {
    expect(formatCapDateTime(at, offset)).toBe(expected);
  });
  it("refuses offsets that are not whole minutes within ±14 h", () => {
    expect(() => formatCapDateTime(at, 1.5)).toThrow(RangeError);
    expect(() => formatCapDateTime(at, 15 * 60)).toThrow(RangeError);
  });
});

describe("Leeway's urgency, severity and certainty mapping", () => {
  // Class lower bounds on the JMA scale: 4 from 3.5, 5-lower from 4.5, 6-lower from 5.5
  // (JMA's instrumental intensity table, METHODS.md §5); MMI classes by nearest-integer rounding.
  it.each([
    ["jma", 5.5, "Extreme"],
    ["jma", 5.49, "Severe"],
    ["jma", 4.5, "Severe"],
    ["jma", 3.5, "Moderate"],
    ["jma", 3.49, "Minor"],
    ["mmi", 7.5, "Extreme"],
    ["mmi", 5.5, "Severe"],
    ["mmi", 4.5, "Moderate"],
    ["mmi", 4.4, "Minor"],
  ] as const)("%s %f gives severity %s", (scale, intensity, severity) => {
    expect(mapCapCodes({ intensityScale: scale, maxAlertAreaIntensity: intensity, maxAlertAreaPExceedTarget: 0.9 }).severity).toBe(severity);
  });

  it("is always urgent, and Likely only where reaching the target is at least even odds", () => {
    const likely = mapCapCodes({ intensityScale: "jma", maxAlertAreaIntensity: 5, maxAlertAreaPExceedTarget: 0.5 });
    const possible = mapCapCodes({ intensityScale: "jma", maxAlertAreaIntensity: 5, maxAlertAreaPExceedTarget: 0.49 });
    expect(likely.urgency).toBe("Immediate");
    expect(likely.certainty).toBe("Likely");
    expect(possible.certainty).toBe("Possible");
    for (const codes of [likely, possible]) {
      expect(CAP_URGENCIES).toContain(codes.urgency);
      expect(CAP_SEVERITIES).toContain(codes.severity);
      expect(CAP_CERTAINTIES).toContain(codes.certainty);
    }
  });

  it("reads the alert area's figures from alerted cells only", () => {
    const figures = alertAreaFigures({
      alerted: Uint8Array.from([1, 0, 1, 0]),
      intensity: Float32Array.from([4, 6.5, 5, 7]),
      pExceedTarget: Float32Array.from([0.2, 0.99, 0.6, 1]),
    });
    expect(figures.alertedCells).toBe(2);
    expect(figures.maxIntensity).toBe(5);
    expect(figures.maxPExceedTarget).toBeCloseTo(0.6, 6);
  });
});
