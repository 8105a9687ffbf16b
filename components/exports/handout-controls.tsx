"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { TextField } from "@/components/ui/text-field";
import { downloadExport } from "./download";
import { exportFacilitiesQuery } from "./export-queries";

const TYPED = "typed";

/** A drill handout for a facility of the version, or for a typed point. */
export function HandoutControls({ scenarioId, versionNumber, exportsUrl, busy, run }: { scenarioId: number; versionNumber: number; exportsUrl: string; busy: string | null; run: (what: string, action: () => Promise<void>) => Promise<void> }) {
  const { data } = useQuery(exportFacilitiesQuery(scenarioId, versionNumber));
  const [choice, setChoice] = useState<string>(TYPED);
  const [lon, setLon] = useState("");
  const [lat, setLat] = useState("");
  const [name, setName] = useState("");
  const options = [{ value: TYPED, label: "A point I type" }, ...(data?.facilities ?? []).map((f) => ({ value: String(f.id), label: `${f.name} (${f.kind})` }))];
  const query = () => {
    if (choice !== TYPED) return `?facility=${choice}`;
    const params = new URLSearchParams({ lon: lon.trim(), lat: lat.trim() });
    if (name.trim()) params.set("name", name.trim());
    return `?${params}`;
  };
  return (
    <fieldset className="space-y-2">
      <legend className="font-semibold">Drill handout</legend>
      <SelectField label="Site or facility" value={choice} onChange={(e) => setChoice(e.target.value)} options={options} data-testid="handout-site" />
      {choice === TYPED && (
        <div className="grid grid-cols-2 gap-2">
          <TextField label="Longitude (°)" inputMode="decimal" value={lon} onChange={(e) => setLon(e.target.value)} />
          <TextField label="Latitude (°)" inputMode="decimal" value={lat} onChange={(e) => setLat(e.target.value)} />
          <div className="col-span-2">
            <TextField label="Name on the handout" value={name} onChange={(e) => setName(e.target.value)} />
          </div>
        </div>
      )}
      <Button variant="secondary" disabled={busy !== null} onClick={() => run("handout", () => downloadExport(`${exportsUrl}/handout${query()}`))} data-testid="export-handout">
        {busy === "handout" ? "Making handout…" : "Handout (PDF)"}
      </Button>
    </fieldset>
  );
}
