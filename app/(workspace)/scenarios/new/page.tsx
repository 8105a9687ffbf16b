import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { NewScenarioForm } from "@/components/scenarios/new-scenario-form";
import { listScenarios } from "@/db/queries/scenarios";
import { can, visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "New scenario" };

/** A new scenario from scratch or from an existing scenario's file (planners and admins only). */
export default async function NewScenarioPage() {
  const user = await requireUser();
  // Roles that may not edit are told no more than that the page does not exist for them.
  if (!can(user.role, "scenario:edit")) notFound();
  const scenarios = await listScenarios({ states: visibleStates(user.role) });
  return (
    <div className="max-w-2xl space-y-4">
      <div>
        <h1 className="text-2xl font-bold">New scenario</h1>
        <p className="text-ink-muted">Start empty on today&apos;s station network, or from a copy of another scenario&apos;s source, stations and settings.</p>
      </div>
      <NewScenarioForm sources={scenarios.map((s) => ({ id: s.id, name: s.name, versionNumber: s.versionNumber }))} />
    </div>
  );
}
