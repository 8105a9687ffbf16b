import Link from "next/link";

export default function ScenarioNotFound() {
  return (
    <div className="space-y-2">
      <h1 className="text-2xl font-bold">Scenario not found</h1>
      <p>This scenario does not exist, or your role may not see it.</p>
      <Link href="/scenarios" className="font-semibold text-tide hover:underline">
        Back to scenarios
      </Link>
    </div>
  );
}
