"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import type { Orientation, Paper } from "@/lib/exports/pdf/paper";
import { makeMapSheet, type SheetChoice } from "./make-map-sheet";

const PAPER_OPTIONS = [
  { value: "a4", label: "A4" },
  { value: "a3", label: "A3" },
] as const;
const ORIENTATION_OPTIONS = [
  { value: "landscape", label: "Landscape" },
  { value: "portrait", label: "Portrait" },
] as const;

/** Paper, orientation and format for a map sheet of the map as it is on screen. */
export function MapSheetControls({ exportsUrl, busy, run }: { exportsUrl: string; busy: string | null; run: (what: string, action: () => Promise<void>) => Promise<void> }) {
  const [paper, setPaper] = useState<Paper>("a4");
  const [orientation, setOrientation] = useState<Orientation>("landscape");
  const make = (format: SheetChoice["format"]) =>
    run(`map-sheet-${format}`, async () => {
      const live = window.__leewayMap;
      if (!live) throw new Error("Open the map first: the sheet shows the map as it is on screen.");
      await makeMapSheet(live, exportsUrl, { paper, orientation, format });
    });
  return (
    <fieldset className="space-y-2">
      <legend className="font-semibold">Map sheet</legend>
      <p className="text-xs text-ink-muted">The map as on screen (same layers, centre and scale), with title, legends, scale bar, north arrow and the caution.</p>
      <div className="grid grid-cols-2 gap-2">
        <SelectField label="Paper" value={paper} onChange={(e) => setPaper(e.target.value as Paper)} options={PAPER_OPTIONS} data-testid="sheet-paper" />
        <SelectField label="Orientation" value={orientation} onChange={(e) => setOrientation(e.target.value as Orientation)} options={ORIENTATION_OPTIONS} data-testid="sheet-orientation" />
      </div>
      <div className="flex gap-2">
        <Button variant="secondary" disabled={busy !== null} onClick={() => make("pdf")} data-testid="export-sheet-pdf">
          {busy === "map-sheet-pdf" ? "Making PDF…" : "PDF"}
        </Button>
        <Button variant="secondary" disabled={busy !== null} onClick={() => make("png")} data-testid="export-sheet-png">
          {busy === "map-sheet-png" ? "Making PNG…" : "PNG"}
        </Button>
      </div>
    </fieldset>
  );
}
