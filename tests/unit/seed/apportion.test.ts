import { describe, expect, it } from "vitest";
import { apportion } from "@/db/seed/region/apportion";

describe("apportion (largest remainder, Hamilton's method)", () => {
  it("matches a hand-worked example and adds up exactly", () => {
    // 11 shared 5 : 3 : 2 is 5.5, 3.3, 2.2: the floors 5, 3, 2 leave 1 unit, which goes to the largest remainder (0.5).
    expect([...apportion(Float64Array.from([5, 3, 2]), 11)]).toEqual([6, 3, 2]);
    // Equal remainders: the tie goes to the lower index.
    expect([...apportion(Float64Array.from([1, 1, 1]), 10)]).toEqual([4, 3, 3]);
  });

  it("refuses weights that add up to zero", () => {
    expect(() => apportion(new Float64Array(3), 5)).toThrow(/add up to zero/);
  });
});
