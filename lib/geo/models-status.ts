/**
 * Every published relation Leeway can use, with its status (checked, from memory, open), so the
 * product can show how sure each one is.
 */
import { listGroundMotionModels } from "./ground-motion/registry";
import type { PublishedRelation } from "./ground-motion/types";
import { jmaScale, mmiScale } from "./intensity/scales";
import { ak135, iasp91 } from "./velocity/models";

/** A relation and the role it plays. */
export interface RelationStatus extends PublishedRelation {
  role: "ground motion" | "amplification" | "intensity conversion" | "velocity model";
}

/** The statuses of all registered ground-motion models, amplifications, conversions and velocity models. */
export function listRelationStatuses(): RelationStatus[] {
  const models = listGroundMotionModels();
  const amplifications = new Map(models.flatMap((m) => (m.amplification ? [[m.amplification.id, m.amplification] as const] : [])));
  const pick = ({ id, title, citation, status }: PublishedRelation) => ({ id, title, citation, status });
  return [
    ...models.map((m) => ({ ...pick(m), role: "ground motion" as const })),
    ...[...amplifications.values()].map((a) => ({ ...pick(a), role: "amplification" as const })),
    ...[jmaScale.conversion, mmiScale.conversion].map((c) => ({ ...pick(c), role: "intensity conversion" as const })),
    ...[iasp91, ak135].map((v) => ({ ...pick(v), role: "velocity model" as const })),
  ];
}
