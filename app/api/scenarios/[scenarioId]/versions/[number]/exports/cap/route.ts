import { z } from "zod";
import { parseWith, route } from "@/lib/api/handler";
import { CAUTION } from "@/lib/caution";
import { LeewayError } from "@/lib/errors";
import { LEEWAY_VERSION } from "@/lib/geo";
import { alertAreaFigures } from "@/lib/exports/cap/alert-area-figures";
import { buildExerciseMessage, exerciseIdentifier, exerciseSender } from "@/lib/exports/cap/build-exercise-message";
import { mapCapCodes } from "@/lib/exports/cap/cap-mapping";
import { downloadName } from "@/lib/exports/download-name";
import { beginExport, type ExportRouteContext } from "@/lib/exports/server/begin-export";
import { computeScenario } from "@/lib/exports/server/computed-scenario";
import { recordExport } from "@/lib/exports/server/export-log";
import { loadVs30Cells } from "@/lib/exports/server/export-source";
import { downloadResponse } from "@/lib/exports/server/respond";

const querySchema = z.object({
  exercise: z.string().trim().min(1, "name the exercise").max(120, "an exercise name can be at most 120 characters").optional(),
  offsetMinutes: z.coerce
    .number({ error: "must be a number of minutes" })
    .int("must be whole minutes")
    .min(-840, "must be within ±14 h")
    .max(840, "must be within ±14 h")
    .optional(),
});

/** An exercise message stays in force this long (min): long enough for a drill. */
const EXPIRES_AFTER_MINUTES = 60;

/**
 * GET …/exports/cap?exercise=NAME&offsetMinutes=M — the exercise alert message (CAP 1.2, status
 * Exercise) for download. Leeway never transmits it. 409 when the scenario issues no alert.
 */
export const GET = route(async (request, context: ExportRouteContext) => {
  const { user, source, now } = await beginExport(context, "export:files");
  const url = new URL(request.url);
  const query = parseWith(querySchema, Object.fromEntries(url.searchParams), "The message settings");
  const computed = computeScenario(source, await loadVs30Cells(source));
  const area = computed.contours.alertArea.features[0];
  if (!computed.engine.strategy.issued || !area) {
    throw new LeewayError(
      "conflict",
      `In "${source.scenarioName}" version ${source.versionNumber} no alert is issued (the strongest predicted shaking stays below the "issue at" setting), so there is no alert area for an exercise message.`,
    );
  }
  const figures = alertAreaFigures(computed.grid);
  const scenario = computed.engine.scenario;
  const xml = buildExerciseMessage({
    identifier: exerciseIdentifier(source.scenarioId, source.versionNumber, now),
    sender: exerciseSender(url.hostname),
    sentAt: now,
    offsetMinutes: query.offsetMinutes ?? -now.getTimezoneOffset(),
    expiresAfterMinutes: EXPIRES_AFTER_MINUTES,
    exerciseName: query.exercise ?? `Leeway drill: ${source.scenarioName}`,
    scenario: {
      name: source.scenarioName,
      versionNumber: source.versionNumber,
      mw: scenario.source.mw,
      depthKm: scenario.source.depthKm,
      lon: scenario.source.lon,
      lat: scenario.source.lat,
      faultType: scenario.source.faultType,
      alertIssuedS: computed.engine.timeline.alertIssuedS,
      triggerStations: computed.engine.timeline.triggerStations,
    },
    alertArea: area.geometry.coordinates,
    codes: mapCapCodes({ intensityScale: scenario.intensityScale, maxAlertAreaIntensity: figures.maxIntensity, maxAlertAreaPExceedTarget: figures.maxPExceedTarget }),
    caution: CAUTION,
    provenance: computed.howItWasMade,
    leewayVersion: LEEWAY_VERSION,
  });
  await recordExport({ userId: user.id, kind: "cap-exercise", scenarioVersionId: source.versionId });
  return downloadResponse(xml, { contentType: "application/xml; charset=utf-8", filename: downloadName(source.scenarioName, source.versionNumber, "exercise-cap", "xml") });
});
