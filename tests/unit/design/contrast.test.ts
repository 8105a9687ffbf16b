import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { contrastRatio } from "@/lib/design/contrast";

/** The colour tokens as the app really ships them: read from the @theme block of app/globals.css. */
function themeColours(): Record<string, string> {
  const css = readFileSync("app/globals.css", "utf8");
  const colours: Record<string, string> = {};
  for (const match of css.matchAll(/--color-([a-z-]+):\s*(#[0-9a-f]{6});/gi)) colours[match[1]] = match[2];
  return colours;
}

describe("contrastRatio (WCAG 2.2 definition)", () => {
  it("gives 21:1 for black on white and 1:1 for a colour on itself (WCAG 2.2 glossary: range 1 to 21)", () => {
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 6);
    expect(contrastRatio("#1d5c66", "#1d5c66")).toBeCloseTo(1, 6);
  });

  it("puts #767676 on white just above 4.5:1 and #777777 just below (widely quoted AA boundary, from memory)", () => {
    expect(contrastRatio("#767676", "#ffffff")).toBeGreaterThan(4.5);
    expect(contrastRatio("#777777", "#ffffff")).toBeLessThan(4.5);
  });
});

describe("Leeway's palette meets WCAG 2.2 SC 1.4.3 (AA, 4.5:1 for body text)", () => {
  const colours = themeColours();
  // Every text colour / background pair the interface uses.
  const pairs: [text: string, background: string][] = [
    ["ink", "paper"],
    ["ink", "surface"],
    ["ink-muted", "paper"],
    ["ink-muted", "surface"],
    ["on-tide", "tide"],
    ["on-tide", "tide-strong"],
    ["tide", "surface"],
    ["tide", "paper"],
    ["tide-strong", "tide-soft"],
    ["ink", "tide-soft"],
    ["caution-ink", "caution-bg"],
    ["error-ink", "error-bg"],
    ["error-ink", "surface"],
    ["ok-ink", "ok-bg"],
  ];

  it.each(pairs)("%s on %s", (text, background) => {
    expect(colours[text], `token --color-${text}`).toMatch(/^#/);
    expect(colours[background], `token --color-${background}`).toMatch(/^#/);
    expect(contrastRatio(colours[text], colours[background])).toBeGreaterThanOrEqual(4.5);
  });
});
