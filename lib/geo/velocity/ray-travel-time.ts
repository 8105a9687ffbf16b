/**
 * First-arrival times in a flat-layered model for a source at depth and a receiver at the
 * surface: the direct (upgoing) ray and the head wave along each interface below the source
 * (METHODS.md §1). This is the exact calculation; grids use the interpolated tables built from it.
 */
import type { VelocityModel } from "./models";

/** Which wave: P (compressional) or S (shear). */
export type Phase = "P" | "S";

function velocity(layer: { vpKms: number; vsKms: number }, phase: Phase): number {
  return phase === "P" ? layer.vpKms : layer.vsKms;
}

interface Leg {
  thicknessKm: number;
  vKms: number;
}

/** Layers crossed between the surface and `depthKm` (only those with positive thickness). */
function legsAbove(model: VelocityModel, phase: Phase, depthKm: number): Leg[] {
  const legs: Leg[] = [];
  const layers = model.layers;
  for (let i = 0; i < layers.length && layers[i].topKm < depthKm; i++) {
    const bottom = i + 1 < layers.length ? Math.min(layers[i + 1].topKm, depthKm) : depthKm;
    legs.push({ thicknessKm: bottom - layers[i].topKm, vKms: velocity(layers[i], phase) });
  }
  return legs;
}

/**
 * Direct-wave time (s) at epicentral distance `xKm`: solves Σ dᵢ·p·vᵢ/√(1 − p²vᵢ²) = x for the ray
 * parameter p by safeguarded Newton iteration, then t = Σ dᵢ/(vᵢ·√(1 − p²vᵢ²)).
 */
function directWaveS(legs: readonly Leg[], xKm: number): number {
  if (legs.length === 0) return Number.NaN;
  let vMax = 0;
  for (const leg of legs) vMax = Math.max(vMax, leg.vKms);
  let lo = 0;
  let hi = 1 / vMax;
  let p = Math.min(hi * 0.999, (xKm / Math.hypot(xKm, legs.reduce((s, l) => s + l.thicknessKm, 0))) / vMax);
  for (let iteration = 0; iteration < 100; iteration++) {
    let x = 0;
    let dxdp = 0;
    for (const leg of legs) {
      const pv = p * leg.vKms;
      const c = Math.sqrt(1 - pv * pv);
      x += (leg.thicknessKm * pv) / c;
      dxdp += (leg.thicknessKm * leg.vKms) / (c * c * c);
    }
    const miss = x - xKm;
    if (Math.abs(miss) < 1e-10) break;
    if (miss > 0) hi = p;
    else lo = p;
    const next = p - miss / dxdp;
    p = next > lo && next < hi ? next : (lo + hi) / 2;
    if (hi - lo < 1e-16) break;
  }
  let t = 0;
  for (const leg of legs) {
    const pv = p * leg.vKms;
    t += leg.thicknessKm / (leg.vKms * Math.sqrt(1 - pv * pv));
  }
  return t;
}

/**
 * Head-wave time (s) along the top of layer `layerIndex` for a source at `depthKm`:
 * t = x/V + Σ mᵢ·dᵢ·√(1/vᵢ² − 1/V²) with mᵢ = 2 for layers between source and interface and 1
 * above the source; `Infinity` when the wave does not exist or x is inside the critical distance.
 */
export function headWaveS(model: VelocityModel, phase: Phase, depthKm: number, layerIndex: number, xKm: number): number {
  const interfaceKm = model.layers[layerIndex].topKm;
  const vHead = velocity(model.layers[layerIndex], phase);
  let delay = 0;
  let criticalKm = 0;
  for (let i = 0; i < layerIndex; i++) {
    const top = model.layers[i].topKm;
    const bottom = model.layers[i + 1].topKm;
    const v = velocity(model.layers[i], phase);
    if (v >= vHead) return Infinity;
    const above = Math.max(0, Math.min(bottom, depthKm) - top);
    const between = Math.max(0, bottom - Math.max(top, depthKm));
    const crossings = above + 2 * between;
    const slowness = Math.sqrt(1 / (v * v) - 1 / (vHead * vHead));
    delay += crossings * slowness;
    criticalKm += (crossings * (v / vHead)) / Math.sqrt(1 - (v * v) / (vHead * vHead));
  }
  if (interfaceKm < depthKm || xKm < criticalKm) return Infinity;
  return xKm / vHead + delay;
}

/** A first arrival: its time and the interface it travelled along (`null` for the direct wave). */
export interface FirstArrival {
  timeS: number;
  headInterfaceKm: number | null;
}

/**
 * First arrival of `phase` at a surface receiver `epicentralKm` from a source at `depthKm`: the
 * earliest of the direct wave and every head wave below the source.
 */
export function firstArrival(model: VelocityModel, phase: Phase, epicentralKm: number, depthKm: number): FirstArrival {
  const layers = model.layers;
  if (layers.length === 1) return { timeS: Math.hypot(epicentralKm, depthKm) / velocity(layers[0], phase), headInterfaceKm: null };
  const best: FirstArrival = {
    timeS: depthKm === 0 ? epicentralKm / velocity(layers[0], phase) : directWaveS(legsAbove(model, phase, depthKm), epicentralKm),
    headInterfaceKm: null,
  };
  for (let j = 1; j < layers.length; j++) {
    if (layers[j].topKm < depthKm) continue;
    const head = headWaveS(model, phase, depthKm, j, epicentralKm);
    if (head < best.timeS) {
      best.timeS = head;
      best.headInterfaceKm = layers[j].topKm;
    }
  }
  return best;
}

/** First-arrival time (s); see `firstArrival`. */
export function firstArrivalS(model: VelocityModel, phase: Phase, epicentralKm: number, depthKm: number): number {
  return firstArrival(model, phase, epicentralKm, depthKm).timeS;
}
