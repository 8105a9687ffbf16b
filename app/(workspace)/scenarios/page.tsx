import type { Metadata } from "next";
import { ScenarioList } from "@/components/scenarios/scenario-list";

export const metadata: Metadata = { title: "Scenarios" };

export default function ScenariosPage() {
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-2xl font-bold">Scenarios</h1>
        <p className="text-ink-muted">Hypothetical earthquakes for your region, with the network and delays each assumes.</p>
      </div>
      <ScenarioList />
    </div>
  );
}
