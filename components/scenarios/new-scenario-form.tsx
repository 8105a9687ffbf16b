"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { TextAreaField } from "@/components/ui/text-area-field";
import { TextField } from "@/components/ui/text-field";
import { scenarioVersionSchema, stationNetworkSchema } from "@/lib/api/contracts";
import { fetchJson } from "@/lib/api/fetch-json";
import { scenarioWrites } from "@/lib/api/scenario-writes";
import { LAND_BOUNDS } from "@/lib/map/style";
import { blankScenario } from "@/lib/workspace/blank-scenario";

/** A scenario whose newest visible version can be copied. */
export interface CopySource {
  id: number;
  name: string;
  versionNumber: number;
}

/** The first version's scenario file: blank on today's stations, or a copy of another scenario's file under the new name. */
async function startingFile(name: string, copyOf: CopySource | undefined): Promise<unknown> {
  if (!copyOf) {
    const network = await fetchJson("/api/stations", stationNetworkSchema);
    return blankScenario(name, LAND_BOUNDS, network.stations);
  }
  const { version } = await fetchJson(`/api/scenarios/${copyOf.id}/versions/${copyOf.versionNumber}`, scenarioVersionSchema);
  return { ...(version.params as Record<string, unknown>), name };
}

/** Name, description and starting point of a new scenario; creates it through the API and opens its map. */
export function NewScenarioForm({ sources }: { sources: CopySource[] }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [name, setName] = useState("");
  const [description, setDescription] = useState("");
  const [start, setStart] = useState<string>("blank");
  const [nameError, setNameError] = useState<string | undefined>();

  const create = useMutation({
    mutationFn: async () => {
      const copyOf = sources.find((s) => String(s.id) === start);
      const scenario = await startingFile(name.trim(), copyOf);
      return scenarioWrites.create({ name, ...(description.trim() ? { description } : {}), scenario });
    },
    onSuccess: async (saved) => {
      await queryClient.invalidateQueries({ queryKey: ["scenarios"] });
      router.push(`/scenarios/${saved.scenario.id}`);
    },
  });

  return (
    <form
      className="space-y-4 rounded-card border border-line bg-surface p-4"
      data-testid="new-scenario-form"
      onSubmit={(event) => {
        event.preventDefault();
        if (!name.trim()) {
          setNameError("Give the scenario a name");
          return;
        }
        setNameError(undefined);
        create.mutate();
      }}
    >
      <TextField label="Name" value={name} onChange={(event) => setName(event.target.value)} error={nameError} maxLength={120} required />
      <TextAreaField label="Description (optional)" value={description} onChange={(event) => setDescription(event.target.value)} maxLength={1000} />
      <SelectField
        label="Start from"
        value={start}
        onChange={(event) => setStart(event.target.value)}
        options={[
          { value: "blank", label: "Empty: a crustal Mw 6.5 in the middle of the region, today's stations, default delays" },
          ...sources.map((s) => ({ value: String(s.id), label: `A copy of “${s.name}” (version ${s.versionNumber})` })),
        ]}
      />
      <Button type="submit" disabled={create.isPending} data-testid="create-scenario">
        {create.isPending ? "Creating…" : "Create and open the map"}
      </Button>
      {create.error && (
        <p role="alert" className="text-sm text-error-ink">
          The scenario was not created: {create.error.message}
        </p>
      )}
    </form>
  );
}
