import type { Role, ScenarioState } from "@/db/schema";

/**
 * The brief's role table as data. Every route handler and server action checks one of these
 * on the server; the navigation reads the same table so it never offers what the server refuses.
 */
export const PERMISSIONS = {
  /** Edit scenarios, stations and layers; upload. */
  "scenario:edit": ["admin", "planner"],
  "layer:edit": ["admin", "planner"],
  /** Publish / unpublish to council (e-mails council members). */
  "scenario:publish": ["admin", "planner"],
  /** Share a scenario version for exercises (no e-mail to council). */
  "scenario:share": ["admin", "planner"],
  /** Print the council view; download the exposure CSV. */
  "council:print": ["admin", "planner", "trainer", "council"],
  "exposure:csv": ["admin", "planner", "trainer", "council"],
  /** Map sheet, handout, GeoJSON, site CSV, scenario file, exercise CAP message. */
  "export:files": ["admin", "planner", "trainer"],
  /** People, roles, invitations, outbox, audit trail. */
  "admin:people": ["admin"],
  /** See layers and their versions (everyone who may see draft work). */
  "layer:view": ["admin", "planner", "trainer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

/**
 * Which scenario versions a role may see: drafts only for admin and planner; trainers also see
 * versions shared for exercises; everyone sees published versions.
 */
export function canViewScenarioState(role: Role, state: ScenarioState): boolean {
  switch (role) {
    case "admin":
    case "planner":
      return true;
    case "trainer":
      return state === "shared" || state === "published";
    case "council":
      return state === "published";
  }
}

/** The states a role may list, for queries that filter in SQL. */
export function visibleStates(role: Role): ScenarioState[] {
  return (["draft", "shared", "published"] as const).filter((state) => canViewScenarioState(role, state));
}
