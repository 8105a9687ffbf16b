"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { errorBodySchema } from "@/lib/api/contracts";

async function deleteLayer(layerId: number): Promise<void> {
  const response = await fetch(`/api/layers/${layerId}`, { method: "DELETE", headers: { accept: "application/json" } });
  if (response.ok) return;
  const parsed = errorBodySchema.safeParse(await response.json().catch(() => undefined));
  throw new Error(parsed.success ? parsed.data.error.message : `The layer could not be deleted (${response.status}).`);
}

/**
 * Deletes a layer after a second click. The server refuses while a published or exercise-shared
 * scenario version uses the layer; `blockedBy` says so up front.
 */
export function DeleteLayerButton({ layerId, name, blockedBy }: { layerId: number; name: string; blockedBy: string | null }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [confirming, setConfirming] = useState(false);
  const remove = useMutation({
    mutationFn: () => deleteLayer(layerId),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ["layers"] });
      router.push("/layers");
    },
  });

  if (blockedBy) return <p className="text-sm text-ink-muted">This layer cannot be deleted: {blockedBy}.</p>;
  return (
    <div className="flex flex-wrap items-center gap-3">
      {confirming ? (
        <>
          <span className="text-sm">Delete “{name}” and all its versions?</span>
          <Button type="button" variant="secondary" onClick={() => remove.mutate()} disabled={remove.isPending}>
            Yes, delete
          </Button>
          <Button type="button" variant="quiet" onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </>
      ) : (
        <Button type="button" variant="secondary" onClick={() => setConfirming(true)}>
          Delete layer
        </Button>
      )}
      {remove.error && (
        <p role="alert" className="text-sm text-error-ink">
          {remove.error.message}
        </p>
      )}
    </div>
  );
}
