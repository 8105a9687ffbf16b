import type { AlertStrategyId } from "@/lib/geo/strategy/ids";
import type { IntensityScaleId } from "@/lib/geo/intensity/scales";
import type { LayeredModelName } from "@/lib/geo/velocity/models";
import {
  DEFAULT_ALERT_THRESHOLDS,
  DEFAULT_CHANNELS,
  DEFAULT_MODELS,
  DEFAULT_TIMING,
  DEFAULT_WARNING_BREAKS_S,
  DEFAULT_WAVEFIELD_RADIUS_KM,
  defaultsUsedBy,
  type DefaultsUsed,
} from "./defaults";
import type { Scenario } from "./schema";

/** A delivery channel: its id and the delay from alert issue to reaching people (s). */
export interface Channel {
  id: string;
  deliveryS: number;
}

/** The alert system's rules with every default filled in. */
export interface ResolvedAlert {
  strategy: AlertStrategyId;
  issueAt: number;
  areaAt: number;
  target: number;
  /** The magnitude the system has at alert time, or "growing" (limited by the rupture broken so far). */
  magnitude: number | "growing";
  wavefieldRadiusKm: number;
}

/** A scenario with every optional setting resolved, plus the record of which defaults it uses. */
export interface ResolvedScenario {
  name: string | undefined;
  source: Scenario["source"] & { mechanism: NonNullable<Scenario["source"]["mechanism"]> };
  stations: { id: string; lon: number; lat: number; operating: boolean }[];
  velocityModel: { kind: "homogeneous"; vpKms: number; vsKms: number } | { kind: "layered"; name: LayeredModelName };
  timing: { triggerStations: number; pWindowS: number; telemetryS: number; processingS: number };
  /** Delivery channels in the scenario's order; the first is the primary channel. */
  channels: Channel[];
  alert: ResolvedAlert;
  vs30: number;
  vs30Grid: Scenario["vs30Grid"];
  area: Scenario["area"];
  groundMotionModel: string;
  intensityScale: IntensityScaleId;
  /** Breaks in seconds, always starting at 0. */
  warningBreaksS: number[];
  defaultsUsed: DefaultsUsed;
}

/** Fills every optional setting of a parsed scenario from lib/scenario/defaults.ts. */
export function resolveScenario(scenario: Scenario): ResolvedScenario {
  const intensityScale = scenario.intensityScale ?? DEFAULT_MODELS.intensityScale.value;
  const thresholds = DEFAULT_ALERT_THRESHOLDS[intensityScale];
  const breaks = [...(scenario.warningBreaksS ?? DEFAULT_WARNING_BREAKS_S.value)];
  if (breaks[0] !== 0) breaks.unshift(0);
  const timing = scenario.timing ?? {};
  return {
    name: scenario.name,
    source: { ...scenario.source, mechanism: scenario.source.mechanism ?? "unspecified" },
    stations: scenario.stations.map((s) => ({ id: s.id, lon: s.lon, lat: s.lat, operating: s.operating ?? true })),
    velocityModel: scenario.velocityModel ?? DEFAULT_MODELS.velocityModel.value,
    timing: {
      triggerStations: timing.triggerStations ?? DEFAULT_TIMING.triggerStations.value,
      pWindowS: timing.pWindowS ?? DEFAULT_TIMING.pWindowS.value,
      telemetryS: timing.telemetryS ?? DEFAULT_TIMING.telemetryS.value,
      processingS: timing.processingS ?? DEFAULT_TIMING.processingS.value,
    },
    channels: (scenario.channels ?? DEFAULT_CHANNELS.value).map((c) => ({ id: c.id, deliveryS: c.deliveryS })),
    alert: {
      strategy: scenario.alert?.strategy ?? "source",
      issueAt: scenario.alert?.issueAt ?? thresholds.issueAt.value,
      areaAt: scenario.alert?.areaAt ?? thresholds.areaAt.value,
      target: scenario.alert?.target ?? thresholds.target.value,
      magnitude: scenario.alert?.magnitude ?? scenario.source.mw,
      wavefieldRadiusKm: scenario.alert?.wavefieldRadiusKm ?? DEFAULT_WAVEFIELD_RADIUS_KM.value,
    },
    vs30: scenario.vs30,
    vs30Grid: scenario.vs30Grid,
    area: scenario.area,
    groundMotionModel: scenario.groundMotionModel ?? DEFAULT_MODELS.groundMotionModel.value,
    intensityScale,
    warningBreaksS: breaks,
    defaultsUsed: defaultsUsedBy(scenario),
  };
}
