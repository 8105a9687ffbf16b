import { ROLES, type Role } from "@/db/schema";

/** How roles are named in the interface, with what each may do (the brief's role table in a phrase). */
export const ROLE_DESCRIPTIONS: Record<Role, { label: string; does: string }> = {
  admin: { label: "Administrator", does: "people, outbox, audit trail, and everything a planner does" },
  planner: { label: "Planner", does: "edits scenarios and layers, publishes and shares" },
  trainer: { label: "Trainer", does: "scenarios shared for exercises, drill exports" },
  council: { label: "Council member", does: "published scenarios and the council summary" },
};

export const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_DESCRIPTIONS[role].label }));
