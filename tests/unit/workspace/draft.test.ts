import { describe, expect, it } from "vitest";
import { parseScenario } from "@/lib/scenario/schema";
import { applyDraftAction, moveItem, nextStationId, type ScenarioDraft } from "@/lib/workspace/draft";

const DRAFT: ScenarioDraft = {
  version: 1,
  source: { lon: -126.2, lat: -46.9, depthKm: 10, mw: 6.5, faultType: "crustal" },
  stations: [
    { id: "A", lon: -126.1, lat: -46.9 },
    { id: "N1", lon: -126.3, lat: -46.8 },
  ],
  channels: [
    { id: "cell-broadcast", deliveryS: 5 },
    { id: "sirens", deliveryS: 10 },
  ],
  vs30: 400,
  area: { bbox: [-126.6, -47.2, -125.8, -46.6], cellKm: 5 },
};

describe("editing a scenario draft", () => {
  it("adds a station with a fresh id at the clicked point, kept to 4 decimals", () => {
    expect(nextStationId(DRAFT.stations)).toBe("N2");
    const next = applyDraftAction(DRAFT, { type: "add-station", at: { lon: -126.123456, lat: -46.987654 } });
    expect(next.stations.at(-1)).toEqual({ id: "N2", lon: -126.1235, lat: -46.9877 });
    expect(DRAFT.stations).toHaveLength(2);
  });

  it("makes the second channel primary by moving it up, and leaves the list alone at its ends", () => {
    expect(moveItem(DRAFT.channels!, 1, -1).map((c) => c.id)).toEqual(["sirens", "cell-broadcast"]);
    expect(moveItem(DRAFT.channels!, 0, -1).map((c) => c.id)).toEqual(["cell-broadcast", "sirens"]);
  });

  it("keeps a value typed as text as NaN, which the scenario schema then names", () => {
    const next = applyDraftAction(DRAFT, { type: "set-source", patch: { depthKm: Number.NaN } });
    const parsed = parseScenario(next);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues).toContainEqual({ path: "source.depthKm", message: "depth must be a number" });
  });

  it("leaves settings set back to their default out of the file", () => {
    const withModel = applyDraftAction(DRAFT, { type: "set-models", patch: { velocityModel: { kind: "homogeneous", vpKms: 6, vsKms: 3.5 } } });
    const back = applyDraftAction(withModel, { type: "set-models", patch: { velocityModel: undefined } });
    expect("velocityModel" in back).toBe(false);
  });

  it("ignores a drag of the rupture's end while the rupture has no length", () => {
    const withRupture = applyDraftAction(DRAFT, { type: "set-rupture", rupture: { strikeDeg: 30, dipDeg: 60 } });
    expect(applyDraftAction(withRupture, { type: "drag-rupture-end", which: "end", fixed: { lon: -126.3, lat: -46.9 }, to: { lon: -126, lat: -46.8 } })).toBe(withRupture);
  });
});
