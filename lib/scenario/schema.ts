/**
 * The scenario file (JSON, version 1): one hypothetical earthquake, the station network, the alert
 * system's timing and rules, site conditions and the area to compute. Objects are strict: an
 * unknown field is refused with its JSON path. Optional settings are left out of the parsed
 * scenario so `lib/scenario/defaults.ts` can say which defaults a scenario relies on.
 */
import { z } from "zod";
import { findGroundMotionModel } from "@/lib/geo/ground-motion/registry";
import { FAULT_TYPES, MECHANISMS } from "@/lib/geo/ground-motion/types";
import { INTENSITY_SCALE_IDS } from "@/lib/geo/intensity/scales";
import { LAYERED_MODEL_NAMES } from "@/lib/geo/velocity/models";
import { gridGeometry, type GridGeometry } from "@/lib/geo/grid-geometry";
import { wellsCoppersmithCovers } from "@/lib/geo/source/wells-coppersmith-1994";
import { ALERT_STRATEGY_IDS } from "@/lib/geo/strategy/ids";

/** Largest grid Leeway computes (cells). */
export const MAX_GRID_CELLS = 16_000_000;

const finite = (what: string) => z.number({ error: (issue) => (issue.input === undefined ? `${what} is required` : `${what} must be a number`) });
const lonDeg = finite("longitude").min(-180, "longitude must be between −180 and 180°").max(180, "longitude must be between −180 and 180°");
const latDeg = finite("latitude").min(-90, "latitude must be between −90 and 90°").max(90, "latitude must be between −90 and 90°");
const delayS = finite("delay").min(0, "a delay cannot be negative (s)");

const ruptureSchema = z.strictObject({
  strikeDeg: finite("strike").min(0, "strike must be between 0 and 360°").max(360, "strike must be between 0 and 360°"),
  dipDeg: finite("dip").gt(0, "dip must be above 0°").max(90, "dip must be at most 90°"),
  lengthKm: finite("rupture length").positive("rupture length must be positive (km)").max(2000, "rupture length must be at most 2,000 km").optional(),
  widthKm: finite("rupture width").positive("rupture width must be positive (km)").max(500, "rupture width must be at most 500 km").optional(),
  mode: z.enum(["unilateral", "bilateral"]).optional(),
  ruptureVelocityKms: finite("rupture velocity").positive("rupture velocity must be positive (km/s)").max(10, "rupture velocity must be at most 10 km/s").optional(),
});

const sourceSchema = z.strictObject({
  lon: lonDeg,
  lat: latDeg,
  depthKm: finite("depth").min(0, "depth must be between 0 and 200 km").max(200, "depth must be between 0 and 200 km"),
  mw: finite("magnitude").min(4, "Mw must be between 4.0 and 9.5").max(9.5, "Mw must be between 4.0 and 9.5"),
  faultType: z.enum(FAULT_TYPES),
  mechanism: z.enum(MECHANISMS).optional(),
  rupture: ruptureSchema.optional(),
});

const stationSchema = z.strictObject({
  id: z.string().trim().min(1, "station id must not be empty"),
  lon: lonDeg,
  lat: latDeg,
  operating: z.boolean().optional(),
});

const velocityModelSchema = z.discriminatedUnion("kind", [
  z.strictObject({
    kind: z.literal("homogeneous"),
    vpKms: finite("Vp").positive("Vp must be positive (km/s)"),
    vsKms: finite("Vs").positive("Vs must be positive (km/s)"),
  }),
  z.strictObject({ kind: z.literal("layered"), name: z.enum(LAYERED_MODEL_NAMES) }),
]);

const timingSchema = z.strictObject({
  triggerStations: finite("trigger stations").int("trigger stations must be a whole number").min(1, "at least one trigger station is needed").optional(),
  pWindowS: delayS.optional(),
  telemetryS: delayS.optional(),
  processingS: delayS.optional(),
});

const channelSchema = z.strictObject({
  id: z.string().trim().min(1, "channel id must not be empty"),
  deliveryS: delayS,
});

const intensityValue = finite("intensity").min(0, "intensity must be between 0 and 12").max(12, "intensity must be between 0 and 12");

const alertSchema = z.strictObject({
  strategy: z.enum(ALERT_STRATEGY_IDS).optional(),
  issueAt: intensityValue.optional(),
  areaAt: intensityValue.optional(),
  target: intensityValue.optional(),
  magnitude: z.union([finite("alert magnitude").min(3, "alert magnitude must be between 3 and 9.5").max(9.5, "alert magnitude must be between 3 and 9.5"), z.literal("growing")]).optional(),
  wavefieldRadiusKm: finite("wavefield radius").positive("wavefield radius must be positive (km)").max(200, "wavefield radius must be at most 200 km").optional(),
});

const vs30Ms = finite("Vs30").min(100, "Vs30 must be between 100 and 1500 m/s").max(1500, "Vs30 must be between 100 and 1500 m/s");

// Same range as site-condition uploads; values outside the models' 100–1500 m/s are clipped when computing.
const vs30CellSchema = z.strictObject({
  lon: lonDeg,
  lat: latDeg,
  vs30: finite("Vs30").min(50, "Vs30 must be between 50 and 4000 m/s").max(4000, "Vs30 must be between 50 and 4000 m/s"),
});

const areaSchema = z.strictObject({
  bbox: z.tuple([
    finite("west").min(-180, "west must be between −180 and 180°").max(180, "west must be between −180 and 180°"),
    latDeg,
    finite("east").min(-180, "east must be between −180 and 360°").max(360, "east must be between −180 and 360° (past 180 to cross the antimeridian)"),
    latDeg,
  ]),
  cellKm: finite("cell size").min(0.1, "cell size must be between 0.1 and 20 km").max(20, "cell size must be between 0.1 and 20 km"),
});

const scenarioObject = z.strictObject({
  version: z.literal(1, "version must be 1"),
  name: z.string().trim().min(1).max(200).optional(),
  source: sourceSchema,
  stations: z.array(stationSchema).min(1, "at least one station is needed"),
  velocityModel: velocityModelSchema.optional(),
  timing: timingSchema.optional(),
  channels: z.array(channelSchema).min(1, "at least one channel is needed").optional(),
  alert: alertSchema.optional(),
  vs30: vs30Ms,
  vs30Grid: z.array(vs30CellSchema).min(1, "a Vs30 grid needs at least one cell").optional(),
  area: areaSchema,
  groundMotionModel: z.string().min(1).optional(),
  intensityScale: z.enum(INTENSITY_SCALE_IDS).optional(),
  warningBreaksS: z.array(finite("warning break").min(0, "warning breaks must be ≥ 0 s")).min(1).max(20).optional(),
});

type ScenarioObject = z.output<typeof scenarioObject>;

const cellCount = (g: GridGeometry) => g.width * g.height;

function checkCrossFields(scenario: ScenarioObject, ctx: z.RefinementCtx): void {
  const seen = new Map<string, number>();
  scenario.stations.forEach((station, index) => {
    const first = seen.get(station.id);
    if (first !== undefined) ctx.addIssue({ code: "custom", path: ["stations", index, "id"], message: `duplicate station id "${station.id}" (also stations[${first}])` });
    else seen.set(station.id, index);
  });
  const operating = scenario.stations.filter((s) => s.operating !== false).length;
  if (operating === 0) ctx.addIssue({ code: "custom", path: ["stations"], message: "no station is operating" });
  const trigger = scenario.timing?.triggerStations ?? 2;
  if (operating > 0 && trigger > operating) {
    const given = scenario.timing?.triggerStations !== undefined;
    ctx.addIssue({
      code: "custom",
      path: ["timing", "triggerStations"],
      message: `${trigger} trigger stations${given ? "" : " (the default)"} but only ${operating} operating station${operating === 1 ? "" : "s"}`,
    });
  }
  const channelIds = new Set<string>();
  scenario.channels?.forEach((channel, index) => {
    if (channelIds.has(channel.id)) ctx.addIssue({ code: "custom", path: ["channels", index, "id"], message: `duplicate channel id "${channel.id}"` });
    channelIds.add(channel.id);
  });
  const vm = scenario.velocityModel;
  if (vm?.kind === "homogeneous" && !(vm.vpKms > vm.vsKms)) {
    ctx.addIssue({ code: "custom", path: ["velocityModel", "vsKms"], message: "Vs must be smaller than Vp" });
  }
  const [w, s, e, n] = scenario.area.bbox;
  if (!(e > w)) ctx.addIssue({ code: "custom", path: ["area", "bbox", 2], message: "east must be greater than west (run past 180 to cross the antimeridian)" });
  else if (e - w > 360) ctx.addIssue({ code: "custom", path: ["area", "bbox", 2], message: "the area spans more than 360° of longitude" });
  if (!(n > s)) ctx.addIssue({ code: "custom", path: ["area", "bbox", 3], message: "north must be greater than south" });
  if (e > w && n > s && cellCount(gridGeometry(scenario.area.bbox, scenario.area.cellKm)) > MAX_GRID_CELLS) {
    ctx.addIssue({ code: "custom", path: ["area", "cellKm"], message: `the area at this cell size exceeds ${MAX_GRID_CELLS.toLocaleString("en")} cells: use larger cells` });
  }
  const breaks = scenario.warningBreaksS;
  breaks?.forEach((value, index) => {
    if (index > 0 && !(value > breaks[index - 1])) ctx.addIssue({ code: "custom", path: ["warningBreaksS", index], message: "warning breaks must increase" });
  });
  const modelId = scenario.groundMotionModel;
  if (modelId !== undefined) {
    const model = findGroundMotionModel(modelId);
    if (!model) ctx.addIssue({ code: "custom", path: ["groundMotionModel"], message: `unknown ground-motion model "${modelId}"` });
    else if (!model.faultTypes.includes(scenario.source.faultType)) {
      ctx.addIssue({
        code: "custom",
        path: ["groundMotionModel"],
        message: `${model.id} is for ${model.faultTypes.join("/")} sources only; this source is ${scenario.source.faultType}`,
      });
    }
  }
  const rupture = scenario.source.rupture;
  if (rupture && !wellsCoppersmithCovers(scenario.source.mw)) {
    for (const key of ["lengthKm", "widthKm"] as const) {
      if (rupture[key] === undefined) {
        ctx.addIssue({
          code: "custom",
          path: ["source", "rupture", key],
          message: `rupture ${key === "lengthKm" ? "length" : "width"} is required for Mw ${scenario.source.mw}: Wells & Coppersmith (1994) cover M 4.8–8.1 only`,
        });
      }
    }
  }
  if (scenario.alert?.magnitude === "growing" && !scenario.source.rupture) {
    ctx.addIssue({ code: "custom", path: ["alert", "magnitude"], message: `a growing magnitude needs a finite rupture (source.rupture)` });
  }
}

/** The scenario file schema (zod). */
export const scenarioSchema = scenarioObject.superRefine(checkCrossFields);

/** A parsed scenario file; optional settings stay absent (see `resolveScenario`). */
export type Scenario = z.output<typeof scenarioSchema>;

/** One problem in a scenario file: the JSON path (e.g. `stations[3].lon`) and what is wrong. */
export interface ScenarioIssue {
  path: string;
  message: string;
}

/** Result of `parseScenario`. */
export type ParseScenarioResult = { ok: true; scenario: Scenario } | { ok: false; issues: ScenarioIssue[] };

/** Formats a zod path as `source.rupture.dipDeg` / `stations[3].lon`. */
export function formatJsonPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const key of path) {
    if (typeof key === "number") out += `[${key}]`;
    else out += out === "" ? String(key) : `.${String(key)}`;
  }
  return out === "" ? "(scenario)" : out;
}

/** Validates an unknown value (usually parsed JSON) as a scenario file. */
export function parseScenario(input: unknown): ParseScenarioResult {
  const result = scenarioSchema.safeParse(input);
  if (result.success) return { ok: true, scenario: result.data };
  const issues: ScenarioIssue[] = [];
  for (const issue of result.error.issues) {
    if (issue.code === "unrecognized_keys") {
      for (const key of issue.keys) issues.push({ path: formatJsonPath([...issue.path, key]), message: "unknown field" });
    } else {
      issues.push({ path: formatJsonPath(issue.path), message: issue.message });
    }
  }
  return { ok: false, issues };
}
