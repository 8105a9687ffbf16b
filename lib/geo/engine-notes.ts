/**
 * What every output of a prepared scenario says about itself: notes on defaults, approximations and
 * statuses, and the "how it was made" record.
 */
import { DEFAULT_DELAYS_NOTE } from "@/lib/scenario/defaults";
import type { Engine } from "./engine";
import { LEEWAY_VERSION, type Provenance, type ProvenanceContext } from "./provenance";

/** The notes an output carries. */
export function describeNotes(engine: Omit<Engine, "notes" | "provenance">): string[] {
  const { scenario, model, scale, motion, vs30 } = engine;
  const notes: string[] = [];
  if (scenario.defaultsUsed.usesDefaultDelays) notes.push(`${DEFAULT_DELAYS_NOTE} (${scenario.defaultsUsed.delays.join(", ")})`);
  if (scenario.defaultsUsed.alert.length) notes.push(`default alert thresholds (${scenario.defaultsUsed.alert.join(", ")})`);
  if (engine.source.kind === "point" && scenario.source.mw >= 7) {
    notes.push("point-source approximation: shaking along the fault is underestimated");
  }
  const rupture = engine.rupture;
  const given = scenario.source.rupture;
  if (rupture && given) {
    const sized = given.lengthKm === undefined || given.widthKm === undefined ? " (sizes from Wells & Coppersmith 1994, subsurface length and down-dip width)" : "";
    notes.push(
      `finite rupture ${rupture.spec.lengthKm.toFixed(1)} km × ${rupture.widthKm.toFixed(1)} km, ${rupture.spec.mode}, top ${rupture.topDepthKm.toFixed(1)} km, bottom ${rupture.bottomDepthKm.toFixed(1)} km${sized}`,
    );
    if (given.ruptureVelocityKms === undefined) {
      notes.push(`rupture velocity ${rupture.spec.ruptureVelocityKms.toFixed(2)} km/s: 0.8 × Vs at the hypocentre (common practice, no source)`);
    }
  }
  if (scenario.velocityModel.kind === "homogeneous" && scenario.source.depthKm > 35) {
    notes.push("homogeneous velocity model for a source deeper than 35 km: travel times ignore the crust and mantle layers");
  }
  if (Number.isFinite(engine.sHeadWaveFromKm)) {
    notes.push(
      `beyond ${engine.sHeadWaveFromKm.toFixed(0)} km the first S is a head wave (Sn), weaker and earlier than the strong S: warning seconds there err on the short (safe) side`,
    );
  }
  if (scale.conversion.status !== "checked") {
    notes.push(`${scale.conversion.title}: status ${scale.conversion.status}; intensities below ${scale.publishedMinIntensity} are outside its published range`);
  }
  if (motion.magnitudeExtrapolated) notes.push(`Mw ${scenario.source.mw} is outside the data of ${model.title}`);
  if (vs30.clipped) notes.push("some Vs30 values were clipped to 100–1500 m/s, the range the models were fitted on");
  notes.push(`PGA: ${model.pgaNote}`);
  notes.push(...engine.strategy.notes);
  return notes;
}

/** The "how it was made" record. */
export function buildProvenance(engine: Omit<Engine, "notes" | "provenance">, context: ProvenanceContext): Provenance {
  const { model, scale, velocityModel, scenario, strategy } = engine;
  return {
    leewayVersion: LEEWAY_VERSION,
    groundMotionModel: { id: model.id, title: model.title, citation: model.citation, status: model.status },
    amplification: model.amplification ?? { id: "model-site-term", title: `the site term of ${model.title}` },
    conversion: scale.conversion,
    velocityModel: { id: velocityModel.id, title: velocityModel.title, citation: velocityModel.citation, status: velocityModel.status },
    alertStrategy: strategy.label,
    scenario: { name: scenario.name ?? null, version: context.scenarioVersion ?? null },
    layerVersions: { ...(context.layerVersions ?? {}) },
    computedAt: context.computedAt ?? null,
  };
}

