import type { ScenarioState } from "@/db/schema";

/** What a planner can do to a version's visibility. */
export const VISIBILITY_ACTIONS = ["publish", "unpublish", "share", "unshare"] as const;
export type VisibilityAction = (typeof VISIBILITY_ACTIONS)[number];

/**
 * The state a version moves to, or why it cannot: publish from a draft or a shared version;
 * share only a draft (a published version is already visible to trainers); unpublish and unshare
 * return the version to draft.
 */
export function nextVisibilityState(current: ScenarioState, action: VisibilityAction): { ok: true; state: ScenarioState } | { ok: false; reason: string } {
  switch (action) {
    case "publish":
      return current === "published" ? { ok: false, reason: "This version is already published to council." } : { ok: true, state: "published" };
    case "unpublish":
      return current === "published" ? { ok: true, state: "draft" } : { ok: false, reason: "This version is not published, so it cannot be unpublished." };
    case "share":
      if (current === "shared") return { ok: false, reason: "This version is already shared for exercises." };
      if (current === "published") return { ok: false, reason: "Published versions are already visible to trainers." };
      return { ok: true, state: "shared" };
    case "unshare":
      return current === "shared" ? { ok: true, state: "draft" } : { ok: false, reason: "This version is not shared for exercises." };
  }
}

/**
 * Whether a version may no longer be changed in place: shared and published versions are frozen,
 * and so is a version that was ever published, because council members were e-mailed its figures.
 * Saving over a frozen version must create a new draft version instead.
 */
export function isVersionFrozen(version: { state: ScenarioState; publishedAt: Date | null }): boolean {
  return version.state !== "draft" || version.publishedAt !== null;
}
