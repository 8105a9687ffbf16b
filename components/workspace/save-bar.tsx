"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { ScenarioState } from "@/db/schema";

/**
 * Saving: always as a new version (a draft); the version shown stays as it was. Published and
 * shared versions are frozen, so their edits can only become a new version too.
 */
export function SaveBar({
  dirty,
  valid,
  saving,
  error,
  versionNumber,
  latestNumber,
  versionState,
  onSave,
  onDiscard,
}: {
  dirty: boolean;
  valid: boolean;
  saving: boolean;
  error: string | null;
  versionNumber: number;
  latestNumber: number;
  versionState: ScenarioState;
  onSave: (note: string) => void;
  onDiscard: () => void;
}) {
  const [note, setNote] = useState("");
  const next = latestNumber + 1;
  return (
    <form
      className="space-y-2 rounded-card border border-line bg-surface p-3"
      data-testid="save-bar"
      onSubmit={(event) => {
        event.preventDefault();
        onSave(note);
      }}
    >
      <p className="text-sm" data-testid="save-state">
        {dirty ? `Unsaved changes to version ${versionNumber}.` : `Version ${versionNumber}, as saved.`}
        {versionState !== "draft" ? ` This version is ${versionState === "published" ? "published to council" : "shared for exercises"} and stays frozen.` : ""}
      </p>
      {dirty && (
        <>
          <label className="block space-y-0.5 text-xs">
            <span className="font-semibold">What changed (optional)</span>
            <input
              value={note}
              maxLength={500}
              onChange={(event) => setNote(event.target.value)}
              className="block w-full rounded-card border border-line-strong bg-surface px-2 py-1 text-sm"
              data-testid="save-note"
            />
          </label>
          <div className="flex flex-wrap gap-2">
            <Button type="submit" disabled={!valid || saving} data-testid="save-version">
              {saving ? "Saving…" : `Save as version ${next}`}
            </Button>
            <Button type="button" variant="secondary" onClick={onDiscard} disabled={saving}>
              Discard changes
            </Button>
          </div>
          {!valid && <p className="text-xs text-error-ink">Fix the fields marked in the forms before saving.</p>}
        </>
      )}
      {error && (
        <p role="alert" className="text-sm text-error-ink" data-testid="save-error">
          {error}
        </p>
      )}
    </form>
  );
}
