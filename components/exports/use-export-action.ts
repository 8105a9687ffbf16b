"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";

/** Runs one export at a time, keeps its error message, and refreshes the export log when it succeeds. */
export function useExportAction(scenarioId: number) {
  const queryClient = useQueryClient();
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const run = async (what: string, action: () => Promise<void>) => {
    setBusy(what);
    setError(null);
    try {
      await action();
      await queryClient.invalidateQueries({ queryKey: ["exports", scenarioId, "log"] });
    } catch (failure) {
      setError(failure instanceof Error ? failure.message : String(failure));
    } finally {
      setBusy(null);
    }
  };
  return { busy, error, run };
}
