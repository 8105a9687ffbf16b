import { describe, expect, it } from "vitest";
import type { ScenarioState } from "@/db/schema";
import { isVersionFrozen, nextVisibilityState, type VisibilityAction } from "@/lib/publishing/state";

// Every state × action, written out from the brief's "Publishing and e-mail" (publish from any unpublished
// version; share a draft for exercises; unpublish and unshare undo their own state only).
const EXPECTED: Record<ScenarioState, Record<VisibilityAction, ScenarioState | "refused">> = {
  draft: { publish: "published", unpublish: "refused", share: "shared", unshare: "refused" },
  shared: { publish: "published", unpublish: "refused", share: "refused", unshare: "draft" },
  published: { publish: "refused", unpublish: "draft", share: "refused", unshare: "refused" },
};

describe("version visibility", () => {
  for (const [state, actions] of Object.entries(EXPECTED) as [ScenarioState, Record<VisibilityAction, string>][]) {
    for (const [action, expected] of Object.entries(actions) as [VisibilityAction, string][]) {
      it(`${action} on a ${state} version → ${expected}`, () => {
        const next = nextVisibilityState(state, action);
        expect(next.ok ? next.state : "refused").toBe(expected);
        if (!next.ok) expect(next.reason).toMatch(/\.$/);
      });
    }
  }

  it("freezes shared, published and once-published versions; only a never-published draft is editable", () => {
    expect(isVersionFrozen({ state: "draft", publishedAt: null })).toBe(false);
    expect(isVersionFrozen({ state: "shared", publishedAt: null })).toBe(true);
    expect(isVersionFrozen({ state: "published", publishedAt: new Date() })).toBe(true);
    expect(isVersionFrozen({ state: "draft", publishedAt: new Date() })).toBe(true);
  });
});
