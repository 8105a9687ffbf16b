"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { fetchJson } from "@/lib/api/fetch-json";

const renamedSchema = z.object({ layer: z.object({ id: z.number(), name: z.string() }) });

/** Renames a layer in place; versions keep their numbers. */
export function RenameLayerForm({ layerId, name }: { layerId: number; name: string }) {
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState(name);
  const rename = useMutation({
    mutationFn: (next: string) =>
      fetchJson(`/api/layers/${layerId}`, renamedSchema, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ name: next }) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["layers"] }),
  });
  return (
    <form
      className="flex flex-wrap items-end gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        rename.mutate(draft);
      }}
    >
      <div className="min-w-64 flex-1">
        <TextField label="Layer name" value={draft} maxLength={120} onChange={(event) => setDraft(event.target.value)} error={rename.error?.message} />
      </div>
      <Button type="submit" variant="secondary" disabled={rename.isPending || draft.trim() === name}>
        Rename
      </Button>
      {rename.isSuccess && <span className="text-sm text-ok-ink">Renamed.</span>}
    </form>
  );
}
