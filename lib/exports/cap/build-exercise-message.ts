/**
 * The exercise alert message: a Common Alerting Protocol 1.2 document (OASIS Standard, 1 July 2010)
 * for drills. Leeway only writes it for download; it never transmits alerts and has no setting for
 * an alert endpoint. Element order follows the CAP 1.2 XML schema (§3.4); the rules of the data
 * dictionary (§3.2) that the schema does not check are checked here and in the tests.
 */
import { escapeXml } from "../xml";
import type { CapCodes } from "./cap-mapping";
import { capPolygonsOf } from "./cap-polygons";
import { formatCapDateTime } from "./cap-time";

/** CAP 1.2's XML namespace (§3.3.1). */
export const CAP_NAMESPACE = "urn:oasis:names:tc:emergency:cap:1.2";

/** Characters CAP 1.2 forbids in `identifier` and `sender` (§3.2.1): whitespace, comma, "<", "&". */
export const FORBIDDEN_ID_CHARACTERS = /[\s,<&]/;

/** The scenario as the message describes it. */
export interface ExerciseScenario {
  name: string;
  versionNumber: number;
  mw: number;
  depthKm: number;
  lon: number;
  lat: number;
  /** Words for the fault type, e.g. "crustal". */
  faultType: string;
  /** When the simulated system issues the alert, s after origin. */
  alertIssuedS: number;
  /** Stations whose P pick triggers the alert. */
  triggerStations: number;
}

/** Everything the message is built from. */
export interface ExerciseMessageInput {
  identifier: string;
  sender: string;
  sentAt: Date;
  /** Offset of the `sent` time zone east of UTC, minutes. */
  offsetMinutes: number;
  /** How long the message stays in force for the exercise, minutes. */
  expiresAfterMinutes: number;
  /** The exercise the message belongs to, as named by the trainer. */
  exerciseName: string;
  scenario: ExerciseScenario;
  /** The alert area: GeoJSON MultiPolygon coordinates ([lon, lat] positions). */
  alertArea: readonly (readonly (readonly [number, number][])[])[];
  codes: CapCodes;
  caution: string;
  /** The "how it was made" line. */
  provenance: string;
  leewayVersion: string;
}

/** Throws when `value` breaks the CAP 1.2 rule for identifier and sender. */
function checkIdentifierText(field: "identifier" | "sender", value: string): void {
  if (value.length === 0) throw new Error(`CAP ${field} must not be empty`);
  const bad = FORBIDDEN_ID_CHARACTERS.exec(value);
  if (bad) throw new Error(`CAP ${field} "${value}" contains ${JSON.stringify(bad[0])}, which CAP 1.2 forbids (spaces, commas, "<" and "&")`);
}

const element = (name: string, text: string, indent: string) => `${indent}<${name}>${escapeXml(text)}</${name}>`;

const parameter = (name: string, value: string, indent: string) =>
  [`${indent}<parameter>`, element("valueName", name, `${indent}  `), element("value", value, `${indent}  `), `${indent}</parameter>`].join("\n");

/** The message's headline: CAP suggests 160 characters at most (§3.2.2), and it must start "EXERCISE". */
function headlineOf(input: ExerciseMessageInput): string {
  const text = `EXERCISE: earthquake scenario Mw ${input.scenario.mw.toFixed(1)}, ${input.scenario.name}`;
  return text.length <= 160 ? text : `${text.slice(0, 159)}…`;
}

function descriptionOf(input: ExerciseMessageInput, droppedHoles: number): string {
  const s = input.scenario;
  const lat = `${Math.abs(s.lat).toFixed(3)}° ${s.lat < 0 ? "S" : "N"}`;
  const lon = `${Math.abs(s.lon).toFixed(3)}° ${s.lon < 0 ? "W" : "E"}`;
  const parts = [
    `EXERCISE ONLY, part of "${input.exerciseName}". This is not a real alert and no earthquake has happened.`,
    `Hypothetical ${s.faultType} earthquake of Mw ${s.mw.toFixed(1)} at ${s.depthKm} km depth near ${lat}, ${lon}, from Leeway scenario "${s.name}" version ${s.versionNumber}.`,
    `In the scenario the alert is issued ${s.alertIssuedS.toFixed(1)} s after the earthquake starts, once ${s.triggerStations} station${s.triggerStations === 1 ? " has" : "s have"} recorded the P wave.`,
    `The area below is where the scenario's alert goes.${droppedHoles > 0 ? ` It has ${droppedHoles} gap${droppedHoles === 1 ? "" : "s"} that are not alerted, which this format cannot show.` : ""}`,
    input.caution,
  ];
  return parts.join(" ");
}

const INSTRUCTION =
  "EXERCISE: participants practise the protective action their plan assigns for the seconds they have (for example drop, cover and hold on, or moving away from windows), then follow the exercise controller.";

/** Builds the CAP 1.2 exercise message as an XML document (UTF-8, ending with a line break). */
export function buildExerciseMessage(input: ExerciseMessageInput): string {
  checkIdentifierText("identifier", input.identifier);
  checkIdentifierText("sender", input.sender);
  const { polygons, droppedHoles } = capPolygonsOf(input.alertArea);
  if (polygons.length === 0) throw new Error("the scenario has no alert area, so there is nothing to put in a CAP <area>");
  const sent = formatCapDateTime(input.sentAt, input.offsetMinutes);
  const expires = formatCapDateTime(new Date(input.sentAt.getTime() + input.expiresAfterMinutes * 60_000), input.offsetMinutes);
  const s = input.scenario;
  const codes = input.codes;
  const i1 = "  ";
  const i2 = "    ";
  const i3 = "      ";
  const lines = [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<alert xmlns="${CAP_NAMESPACE}">`,
    element("identifier", input.identifier, i1),
    element("sender", input.sender, i1),
    element("sent", sent, i1),
    element("status", "Exercise", i1),
    element("msgType", "Alert", i1),
    element("source", `Leeway ${input.leewayVersion}, scenario "${s.name}" version ${s.versionNumber}`, i1),
    element("scope", "Restricted", i1),
    element("restriction", `For participants of the exercise "${input.exerciseName}" only. A drill message from a planning scenario: do not relay it to the public.`, i1),
    element("note", `Exercise "${input.exerciseName}": generated by Leeway from a planning scenario for a drill. Leeway does not transmit alerts.`, i1),
    `${i1}<info>`,
    element("language", "en", i2),
    element("category", "Geo", i2),
    element("event", "Earthquake (exercise scenario)", i2),
    element("responseType", "Shelter", i2),
    element("urgency", codes.urgency, i2),
    element("severity", codes.severity, i2),
    element("certainty", codes.certainty, i2),
    element("audience", "exercise participants", i2),
    element("expires", expires, i2),
    element("senderName", "Leeway exercise message", i2),
    element("headline", headlineOf(input), i2),
    element("description", descriptionOf(input, droppedHoles), i2),
    element("instruction", INSTRUCTION, i2),
    parameter("LeewayScenario", `${s.name} v${s.versionNumber}`, i2),
    parameter("LeewayHowItWasMade", input.provenance, i2),
    parameter("LeewayUrgencyReason", codes.reasons.urgency, i2),
    parameter("LeewaySeverityReason", codes.reasons.severity, i2),
    parameter("LeewayCertaintyReason", codes.reasons.certainty, i2),
    `${i2}<area>`,
    element("areaDesc", `Alert area of the exercise scenario "${s.name}" (version ${s.versionNumber})`, i3),
    ...polygons.map((p) => element("polygon", p.text, i3)),
    `${i2}</area>`,
    `${i1}</info>`,
    `</alert>`,
  ];
  return `${lines.join("\n")}\n`;
}

/** A CAP identifier for an export: Leeway, the scenario version and the second it was made (no forbidden characters). */
export function exerciseIdentifier(scenarioId: number, versionNumber: number, sentAt: Date): string {
  const stamp = sentAt.toISOString().slice(0, 19).replace(/[-:]/g, "");
  return `leeway-exercise-${scenarioId}-v${versionNumber}-${stamp}`;
}

/** The sender for a host name: `leeway-exercise@host`, with any character CAP forbids removed. */
export function exerciseSender(hostname: string): string {
  const host = hostname.replace(/[^A-Za-z0-9.-]/g, "") || "localhost";
  return `leeway-exercise@${host}`;
}
