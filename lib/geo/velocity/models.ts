/**
 * 1-D velocity models for local and regional first arrivals (METHODS.md §1, flat layers; fine
 * within about 500 km). A model is a stack of homogeneous layers; the last is a half-space.
 * Linear mantle gradients are represented by 5 km sub-layers at their mid-depth velocity.
 */
import type { ModelStatus } from "../ground-motion/types";

/** One homogeneous layer from `topKm` down to the next layer's top. */
export interface VelocityLayer {
  topKm: number;
  vpKms: number;
  vsKms: number;
}

/** A flat-layered velocity model (layers ordered by depth; the last one is a half-space). */
export interface VelocityModel {
  id: string;
  title: string;
  citation: string;
  status: ModelStatus;
  deviations: readonly string[];
  layers: readonly VelocityLayer[];
}

/** Names of the built-in layered models. */
export const LAYERED_MODEL_NAMES = ["iasp91", "ak135"] as const;
export type LayeredModelName = (typeof LAYERED_MODEL_NAMES)[number];

interface Node {
  depthKm: number;
  vpKms: number;
  vsKms: number;
}

const GRADIENT_STEP_KM = 5;

/** Crustal layers, then a linear gradient between two mantle nodes in sub-layers, then a half-space. */
function buildLayers(crust: readonly VelocityLayer[], mantleTop: Node, mantleBottom: Node): VelocityLayer[] {
  const layers = [...crust];
  const span = mantleBottom.depthKm - mantleTop.depthKm;
  for (let top = mantleTop.depthKm; top < mantleBottom.depthKm; top += GRADIENT_STEP_KM) {
    const w = (Math.min(top + GRADIENT_STEP_KM, mantleBottom.depthKm) + top) / 2;
    const t = (w - mantleTop.depthKm) / span;
    layers.push({
      topKm: top,
      vpKms: mantleTop.vpKms + t * (mantleBottom.vpKms - mantleTop.vpKms),
      vsKms: mantleTop.vsKms + t * (mantleBottom.vsKms - mantleTop.vsKms),
    });
  }
  layers.push({ topKm: mantleBottom.depthKm, vpKms: mantleBottom.vpKms, vsKms: mantleBottom.vsKms });
  return layers;
}

/** IASP91 crust and upper mantle (Kennett & Engdahl 1991, GJI 105, 429–465). */
export const iasp91: VelocityModel = {
  id: "iasp91",
  title: "IASP91 crust and upper mantle",
  citation: "Kennett, B. L. N. & Engdahl, E. R. (1991), Geophysical Journal International 105, 429–465",
  status: "checked",
  deviations: [
    "mantle between 35 and 120 km linear in depth, in 5 km sub-layers",
    "velocities held at their 120 km values below 120 km",
  ],
  layers: buildLayers(
    [
      { topKm: 0, vpKms: 5.8, vsKms: 3.36 },
      { topKm: 20, vpKms: 6.5, vsKms: 3.75 },
    ],
    { depthKm: 35, vpKms: 8.04, vsKms: 4.47 },
    { depthKm: 120, vpKms: 8.05, vsKms: 4.5 },
  ),
};

/** AK135 crust and upper mantle (Kennett, Engdahl & Buland 1995, GJI 122, 108–124). */
export const ak135: VelocityModel = {
  id: "ak135",
  title: "AK135 crust and upper mantle",
  citation: "Kennett, B. L. N., Engdahl, E. R. & Buland, R. (1995), Geophysical Journal International 122, 108–124",
  status: "checked",
  deviations: [
    "the 120 km node (8.05, 4.50 km/s) is from memory; mantle linear in depth between 35 and 120 km, in 5 km sub-layers",
    "velocities held at their 120 km values below 120 km",
  ],
  layers: buildLayers(
    [
      { topKm: 0, vpKms: 5.8, vsKms: 3.46 },
      { topKm: 20, vpKms: 6.5, vsKms: 3.85 },
    ],
    { depthKm: 35, vpKms: 8.04, vsKms: 4.48 },
    { depthKm: 120, vpKms: 8.05, vsKms: 4.5 },
  ),
};

/** A homogeneous half-space. */
export function homogeneousModel(vpKms: number, vsKms: number): VelocityModel {
  return {
    id: "homogeneous",
    title: `homogeneous (Vp ${vpKms} km/s, Vs ${vsKms} km/s)`,
    citation: "closed form: t = r / V",
    status: "checked",
    deviations: [],
    layers: [{ topKm: 0, vpKms, vsKms }],
  };
}

/** The built-in layered model with this name. */
export function layeredModel(name: LayeredModelName): VelocityModel {
  return name === "iasp91" ? iasp91 : ak135;
}

/** The layer that contains `depthKm` (a depth on an interface belongs to the layer below it). */
export function layerAt(model: VelocityModel, depthKm: number): VelocityLayer {
  let found = model.layers[0];
  for (const layer of model.layers) if (layer.topKm <= depthKm) found = layer;
  return found;
}
