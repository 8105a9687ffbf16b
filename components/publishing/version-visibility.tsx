"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import type { ScenarioState } from "@/db/schema";
import { Button } from "@/components/ui/button";
import { TextAreaField } from "@/components/ui/text-area-field";
import { fetchJson } from "@/lib/api/fetch-json";
import { visibilityResponseSchema, type VisibilityResponse } from "@/lib/publishing/contracts";

type Step = "publish" | "unpublish" | null;

interface Change {
  resource: "publish" | "share";
  method: "POST" | "DELETE";
  body?: Record<string, string>;
}

const DONE: Record<ScenarioState, string> = {
  published: "Published to council.",
  shared: "Shared with trainers for exercises. Council members were not e-mailed.",
  draft: "The version is a draft again.",
};

function describe(response: VisibilityResponse): string {
  const { sent, failed } = response.mail;
  const mailed = sent.length ? ` E-mail sent to ${sent.length} council member${sent.length === 1 ? "" : "s"}.` : "";
  const missed = failed.length ? ` Could not e-mail ${failed.map((f) => f.to).join(", ")}: ${failed[0].reason}` : "";
  return `${DONE[response.version.state]}${mailed}${missed}`;
}

/**
 * Publish, unpublish, share and stop sharing for one scenario version (planners and admins only;
 * the routes check the role again). Publishing and unpublishing e-mail council members, so each
 * asks for a note first and says how many people will be told.
 */
export function VersionVisibility({
  scenarioId,
  versionNumber,
  state,
  councilMembers,
}: {
  scenarioId: number;
  versionNumber: number;
  state: ScenarioState;
  councilMembers: number;
}) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [step, setStep] = useState<Step>(null);
  const [message, setMessage] = useState<string | null>(null);

  const mutation = useMutation({
    mutationFn: ({ resource, method, body }: Change) =>
      fetchJson(`/api/scenarios/${scenarioId}/versions/${versionNumber}/${resource}`, visibilityResponseSchema, {
        method,
        headers: { "content-type": "application/json" },
        body: body ? JSON.stringify(body) : undefined,
      }),
    onSuccess: (response) => {
      setStep(null);
      setMessage(describe(response));
      void queryClient.invalidateQueries({ queryKey: ["scenarios"] });
      router.refresh();
    },
    onError: () => setMessage(null),
  });

  function submitNote(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const text = String(new FormData(event.currentTarget).get("text") ?? "");
    if (step === "publish") mutation.mutate({ resource: "publish", method: "POST", body: { note: text } });
    if (step === "unpublish") mutation.mutate({ resource: "publish", method: "DELETE", body: { reason: text } });
  }

  const recipients = `${councilMembers} council member${councilMembers === 1 ? "" : "s"}`;

  return (
    <section aria-label="Who can see this version" className="space-y-3 rounded-card border border-line bg-surface p-4" data-testid="version-visibility">
      <div className="flex flex-wrap items-center gap-2">
        {state === "draft" && (
          <Button variant="secondary" disabled={mutation.isPending} onClick={() => mutation.mutate({ resource: "share", method: "POST" })}>
            Share for exercises
          </Button>
        )}
        {state === "shared" && (
          <Button variant="secondary" disabled={mutation.isPending} onClick={() => mutation.mutate({ resource: "share", method: "DELETE" })}>
            Stop sharing
          </Button>
        )}
        {state !== "published" && (
          <Button variant="secondary" disabled={mutation.isPending} onClick={() => setStep("publish")} aria-expanded={step === "publish"}>
            Publish to council…
          </Button>
        )}
        {state === "published" && (
          <Button variant="secondary" disabled={mutation.isPending} onClick={() => setStep("unpublish")} aria-expanded={step === "unpublish"}>
            Unpublish…
          </Button>
        )}
        <span className="text-sm text-ink-muted">
          {state === "draft" && "Only planners and administrators see this draft."}
          {state === "shared" && "Trainers see this version for exercises; council does not."}
          {state === "published" && "Council members, trainers, planners and administrators see this version. It is frozen: edits make a new version."}
        </span>
      </div>

      {step && (
        <form onSubmit={submitNote} className="space-y-2">
          <TextAreaField
            key={step}
            label={step === "publish" ? "Note for council" : "Why is this version withdrawn?"}
            name="text"
            required
            placeholder={step === "publish" ? "What this version is for, and what changed since the last one" : "The reason council members will read"}
          />
          <p className="text-sm text-ink-muted">
            {step === "publish"
              ? `${recipients} will get an e-mail with the headline figures, the caution, how the figures were made and a link to the council summary. The version is then frozen.`
              : `${recipients} will get an e-mail saying the version is withdrawn, with your reason.`}
          </p>
          <div className="flex gap-2">
            <Button type="submit" disabled={mutation.isPending}>
              {mutation.isPending ? "Working…" : step === "publish" ? "Publish and notify council" : "Unpublish and notify council"}
            </Button>
            <Button type="button" variant="quiet" onClick={() => setStep(null)}>
              Cancel
            </Button>
          </div>
        </form>
      )}

      {mutation.error && (
        <p role="alert" className="rounded-card bg-error-bg px-3 py-2 text-sm text-error-ink">
          {mutation.error.message}
        </p>
      )}
      {message && (
        <p role="status" data-testid="visibility-result" className="rounded-card bg-ok-bg px-3 py-2 text-sm text-ok-ink">
          {message}
        </p>
      )}
    </section>
  );
}
