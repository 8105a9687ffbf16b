import { boore2014 } from "./boore-2014";
import { siMidorikawa1999 } from "./si-midorikawa-1999";
import type { GroundMotionModel } from "./types";

/** The model a scenario uses when it names none. */
export const DEFAULT_GROUND_MOTION_MODEL_ID = siMidorikawa1999.id;

// A new published model is one file under lib/geo/ground-motion/ plus one entry here.
const models = new Map<string, GroundMotionModel>([
  [siMidorikawa1999.id, siMidorikawa1999],
  [boore2014.id, boore2014],
]);

/**
 * Adds a ground-motion model so scenarios can name it in `groundMotionModel`.
 * Refuses an id that is already taken by another model object.
 */
export function registerGroundMotionModel(model: GroundMotionModel): void {
  const existing = models.get(model.id);
  if (existing && existing !== model) throw new Error(`a ground-motion model with id "${model.id}" is already registered`);
  models.set(model.id, model);
}

/** The registered model with this id, or `undefined`. */
export function findGroundMotionModel(id: string): GroundMotionModel | undefined {
  return models.get(id);
}

/** The registered model with this id; throws for an unknown id (scenarios are checked before this). */
export function getGroundMotionModel(id: string): GroundMotionModel {
  const model = models.get(id);
  if (!model) throw new Error(`unknown ground-motion model "${id}"`);
  return model;
}

/** Every registered model, in registration order (for pickers and status displays). */
export function listGroundMotionModels(): GroundMotionModel[] {
  return [...models.values()];
}
