"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { EXPOSURE_CSV_TABLES, type ExposureCsvTable } from "@/lib/exposure/csv-tables";
import { downloadExport } from "./download";

const EXPOSURE_LABELS: Record<ExposureCsvTable, string> = {
  "class-band": "Exposure: intensity × warning (CSV)",
  districts: "Exposure by district (CSV)",
  channels: "Exposure by channel (CSV)",
  actions: "Protective actions (CSV)",
  facilities: "Facilities (CSV)",
};

type Run = (what: string, action: () => Promise<void>) => Promise<void>;

/** Exposure tables as CSV: every role that may see the version may download them. */
export function ExposureFileControls({ exportsUrl, busy, run }: { exportsUrl: string; busy: string | null; run: Run }) {
  return (
    <div className="flex flex-wrap gap-2">
      {EXPOSURE_CSV_TABLES.map((table) => (
        <Button key={table} variant="secondary" disabled={busy !== null} onClick={() => run(`exposure-${table}`, () => downloadExport(`${exportsUrl}/exposure?table=${table}`))} data-testid={`export-exposure-${table}`}>
          {EXPOSURE_LABELS[table]}
        </Button>
      ))}
    </div>
  );
}

/** GeoJSON, site values, the scenario file and the exercise CAP message. */
export function DataFileControls({ exportsUrl, busy, run }: { exportsUrl: string; busy: string | null; run: Run }) {
  const [exercise, setExercise] = useState("");
  const file = (what: string, path: string) => (
    <Button variant="secondary" disabled={busy !== null} onClick={() => run(what, () => downloadExport(`${exportsUrl}/${path}`))} data-testid={`export-${what}`}>
      {what === "contours" ? "Contours and blind zone (GeoJSON)" : what === "sites" ? "Site values (CSV)" : "Scenario file (JSON)"}
    </Button>
  );
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        {file("contours", "contours")}
        {file("sites", "sites")}
        {file("scenario-file", "scenario-file")}
      </div>
      <fieldset className="space-y-2">
        <legend className="font-semibold">Exercise alert message (CAP 1.2)</legend>
        <p className="text-xs text-ink-muted">A file for drills, marked Exercise and restricted to participants. Leeway never sends alerts.</p>
        <TextField label="Exercise name" value={exercise} placeholder="e.g. Spring schools drill" onChange={(e) => setExercise(e.target.value)} />
        <Button
          variant="secondary"
          disabled={busy !== null}
          onClick={() => {
            const params = new URLSearchParams({ offsetMinutes: String(-new Date().getTimezoneOffset()) });
            if (exercise.trim()) params.set("exercise", exercise.trim());
            return run("cap", () => downloadExport(`${exportsUrl}/cap?${params}`));
          }}
          data-testid="export-cap"
        >
          {busy === "cap" ? "Writing message…" : "Exercise message (XML)"}
        </Button>
      </fieldset>
    </div>
  );
}
