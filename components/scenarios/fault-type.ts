/** Planner's words for the scenario file's fault types. */
export const FAULT_TYPE_LABELS: Record<string, string> = {
  crustal: "Crustal fault",
  interplate: "Plate interface (offshore)",
  intraslab: "Deep, within the slab",
};
