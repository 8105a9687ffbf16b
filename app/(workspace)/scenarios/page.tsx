import type { Metadata } from "next";
import Link from "next/link";
import { ScenarioList } from "@/components/scenarios/scenario-list";
import { can } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Scenarios" };

export default async function ScenariosPage() {
  const user = await requireUser();
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-4">
        <div>
          <h1 className="text-2xl font-bold">Scenarios</h1>
          <p className="text-ink-muted">Hypothetical earthquakes for your region, with the network and delays each assumes.</p>
        </div>
        {can(user.role, "scenario:edit") && (
          <Link href="/scenarios/new" className="ml-auto rounded-card bg-tide px-4 py-2 text-sm font-semibold text-on-tide hover:bg-tide-strong" data-testid="new-scenario">
            New scenario
          </Link>
        )}
      </div>
      <ScenarioList />
    </div>
  );
}
